/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.Encoder;
import org.tracewell.model.EncoderSide;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Encoder</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.EncoderImpl#getSide <em>Side</em>}</li>
 *   <li>{@link org.tracewell.model.impl.EncoderImpl#getLinearResolution <em>Linear Resolution</em>}</li>
 *   <li>{@link org.tracewell.model.impl.EncoderImpl#getCountsPerRevolution <em>Counts Per Revolution</em>}</li>
 * </ul>
 *
 * @generated
 */
public class EncoderImpl extends IdentifiedImpl implements Encoder {
	/**
	 * The default value of the '{@link #getSide() <em>Side</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSide()
	 * @generated
	 * @ordered
	 */
	protected static final EncoderSide SIDE_EDEFAULT = EncoderSide.MOTOR;

	/**
	 * The cached value of the '{@link #getSide() <em>Side</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSide()
	 * @generated
	 * @ordered
	 */
	protected EncoderSide side = SIDE_EDEFAULT;

	/**
	 * The default value of the '{@link #getLinearResolution() <em>Linear Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLinearResolution()
	 * @generated
	 * @ordered
	 */
	protected static final double LINEAR_RESOLUTION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLinearResolution() <em>Linear Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLinearResolution()
	 * @generated
	 * @ordered
	 */
	protected double linearResolution = LINEAR_RESOLUTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getCountsPerRevolution() <em>Counts Per Revolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCountsPerRevolution()
	 * @generated
	 * @ordered
	 */
	protected static final int COUNTS_PER_REVOLUTION_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getCountsPerRevolution() <em>Counts Per Revolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCountsPerRevolution()
	 * @generated
	 * @ordered
	 */
	protected int countsPerRevolution = COUNTS_PER_REVOLUTION_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected EncoderImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.ENCODER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EncoderSide getSide() {
		return side;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSide(EncoderSide newSide) {
		EncoderSide oldSide = side;
		side = newSide == null ? SIDE_EDEFAULT : newSide;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ENCODER__SIDE, oldSide, side));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLinearResolution() {
		return linearResolution;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLinearResolution(double newLinearResolution) {
		double oldLinearResolution = linearResolution;
		linearResolution = newLinearResolution;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ENCODER__LINEAR_RESOLUTION, oldLinearResolution, linearResolution));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getCountsPerRevolution() {
		return countsPerRevolution;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCountsPerRevolution(int newCountsPerRevolution) {
		int oldCountsPerRevolution = countsPerRevolution;
		countsPerRevolution = newCountsPerRevolution;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ENCODER__COUNTS_PER_REVOLUTION, oldCountsPerRevolution, countsPerRevolution));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.ENCODER__SIDE:
				return getSide();
			case TracewellPackage.ENCODER__LINEAR_RESOLUTION:
				return getLinearResolution();
			case TracewellPackage.ENCODER__COUNTS_PER_REVOLUTION:
				return getCountsPerRevolution();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case TracewellPackage.ENCODER__SIDE:
				setSide((EncoderSide)newValue);
				return;
			case TracewellPackage.ENCODER__LINEAR_RESOLUTION:
				setLinearResolution((Double)newValue);
				return;
			case TracewellPackage.ENCODER__COUNTS_PER_REVOLUTION:
				setCountsPerRevolution((Integer)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case TracewellPackage.ENCODER__SIDE:
				setSide(SIDE_EDEFAULT);
				return;
			case TracewellPackage.ENCODER__LINEAR_RESOLUTION:
				setLinearResolution(LINEAR_RESOLUTION_EDEFAULT);
				return;
			case TracewellPackage.ENCODER__COUNTS_PER_REVOLUTION:
				setCountsPerRevolution(COUNTS_PER_REVOLUTION_EDEFAULT);
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case TracewellPackage.ENCODER__SIDE:
				return side != SIDE_EDEFAULT;
			case TracewellPackage.ENCODER__LINEAR_RESOLUTION:
				return linearResolution != LINEAR_RESOLUTION_EDEFAULT;
			case TracewellPackage.ENCODER__COUNTS_PER_REVOLUTION:
				return countsPerRevolution != COUNTS_PER_REVOLUTION_EDEFAULT;
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (side: "); //$NON-NLS-1$
		result.append(side);
		result.append(", linearResolution: "); //$NON-NLS-1$
		result.append(linearResolution);
		result.append(", countsPerRevolution: "); //$NON-NLS-1$
		result.append(countsPerRevolution);
		result.append(')');
		return result.toString();
	}

} //EncoderImpl
