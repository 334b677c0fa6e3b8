/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.NotchFilter;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Notch Filter</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.NotchFilterImpl#getCentreFrequency <em>Centre Frequency</em>}</li>
 *   <li>{@link org.tracewell.model.impl.NotchFilterImpl#getWidth <em>Width</em>}</li>
 *   <li>{@link org.tracewell.model.impl.NotchFilterImpl#getDepth <em>Depth</em>}</li>
 * </ul>
 *
 * @generated
 */
public class NotchFilterImpl extends FilterStageImpl implements NotchFilter {
	/**
	 * The default value of the '{@link #getCentreFrequency() <em>Centre Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCentreFrequency()
	 * @generated
	 * @ordered
	 */
	protected static final double CENTRE_FREQUENCY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCentreFrequency() <em>Centre Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCentreFrequency()
	 * @generated
	 * @ordered
	 */
	protected double centreFrequency = CENTRE_FREQUENCY_EDEFAULT;

	/**
	 * The default value of the '{@link #getWidth() <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWidth()
	 * @generated
	 * @ordered
	 */
	protected static final double WIDTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getWidth() <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWidth()
	 * @generated
	 * @ordered
	 */
	protected double width = WIDTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getDepth() <em>Depth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDepth()
	 * @generated
	 * @ordered
	 */
	protected static final double DEPTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDepth() <em>Depth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDepth()
	 * @generated
	 * @ordered
	 */
	protected double depth = DEPTH_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected NotchFilterImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.NOTCH_FILTER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCentreFrequency() {
		return centreFrequency;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCentreFrequency(double newCentreFrequency) {
		double oldCentreFrequency = centreFrequency;
		centreFrequency = newCentreFrequency;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.NOTCH_FILTER__CENTRE_FREQUENCY, oldCentreFrequency, centreFrequency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getWidth() {
		return width;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWidth(double newWidth) {
		double oldWidth = width;
		width = newWidth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.NOTCH_FILTER__WIDTH, oldWidth, width));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDepth() {
		return depth;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDepth(double newDepth) {
		double oldDepth = depth;
		depth = newDepth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.NOTCH_FILTER__DEPTH, oldDepth, depth));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.NOTCH_FILTER__CENTRE_FREQUENCY:
				return getCentreFrequency();
			case TracewellPackage.NOTCH_FILTER__WIDTH:
				return getWidth();
			case TracewellPackage.NOTCH_FILTER__DEPTH:
				return getDepth();
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
			case TracewellPackage.NOTCH_FILTER__CENTRE_FREQUENCY:
				setCentreFrequency((Double)newValue);
				return;
			case TracewellPackage.NOTCH_FILTER__WIDTH:
				setWidth((Double)newValue);
				return;
			case TracewellPackage.NOTCH_FILTER__DEPTH:
				setDepth((Double)newValue);
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
			case TracewellPackage.NOTCH_FILTER__CENTRE_FREQUENCY:
				setCentreFrequency(CENTRE_FREQUENCY_EDEFAULT);
				return;
			case TracewellPackage.NOTCH_FILTER__WIDTH:
				setWidth(WIDTH_EDEFAULT);
				return;
			case TracewellPackage.NOTCH_FILTER__DEPTH:
				setDepth(DEPTH_EDEFAULT);
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
			case TracewellPackage.NOTCH_FILTER__CENTRE_FREQUENCY:
				return centreFrequency != CENTRE_FREQUENCY_EDEFAULT;
			case TracewellPackage.NOTCH_FILTER__WIDTH:
				return width != WIDTH_EDEFAULT;
			case TracewellPackage.NOTCH_FILTER__DEPTH:
				return depth != DEPTH_EDEFAULT;
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
		result.append(" (centreFrequency: "); //$NON-NLS-1$
		result.append(centreFrequency);
		result.append(", width: "); //$NON-NLS-1$
		result.append(width);
		result.append(", depth: "); //$NON-NLS-1$
		result.append(depth);
		result.append(')');
		return result.toString();
	}

} //NotchFilterImpl
