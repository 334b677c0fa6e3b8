/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.Corner;
import org.tracewell.model.CornerKind;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Corner</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.CornerImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CornerImpl#getRoundingTolerance <em>Rounding Tolerance</em>}</li>
 * </ul>
 *
 * @generated
 */
public class CornerImpl extends SegmentImpl implements Corner {
	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final CornerKind KIND_EDEFAULT = CornerKind.SHARP;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected CornerKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getRoundingTolerance() <em>Rounding Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRoundingTolerance()
	 * @generated
	 * @ordered
	 */
	protected static final double ROUNDING_TOLERANCE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRoundingTolerance() <em>Rounding Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRoundingTolerance()
	 * @generated
	 * @ordered
	 */
	protected double roundingTolerance = ROUNDING_TOLERANCE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected CornerImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.CORNER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public CornerKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(CornerKind newKind) {
		CornerKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CORNER__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRoundingTolerance() {
		return roundingTolerance;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRoundingTolerance(double newRoundingTolerance) {
		double oldRoundingTolerance = roundingTolerance;
		roundingTolerance = newRoundingTolerance;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CORNER__ROUNDING_TOLERANCE, oldRoundingTolerance, roundingTolerance));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.CORNER__KIND:
				return getKind();
			case TracewellPackage.CORNER__ROUNDING_TOLERANCE:
				return getRoundingTolerance();
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
			case TracewellPackage.CORNER__KIND:
				setKind((CornerKind)newValue);
				return;
			case TracewellPackage.CORNER__ROUNDING_TOLERANCE:
				setRoundingTolerance((Double)newValue);
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
			case TracewellPackage.CORNER__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case TracewellPackage.CORNER__ROUNDING_TOLERANCE:
				setRoundingTolerance(ROUNDING_TOLERANCE_EDEFAULT);
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
			case TracewellPackage.CORNER__KIND:
				return kind != KIND_EDEFAULT;
			case TracewellPackage.CORNER__ROUNDING_TOLERANCE:
				return roundingTolerance != ROUNDING_TOLERANCE_EDEFAULT;
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
		result.append(" (kind: "); //$NON-NLS-1$
		result.append(kind);
		result.append(", roundingTolerance: "); //$NON-NLS-1$
		result.append(roundingTolerance);
		result.append(')');
		return result.toString();
	}

} //CornerImpl
