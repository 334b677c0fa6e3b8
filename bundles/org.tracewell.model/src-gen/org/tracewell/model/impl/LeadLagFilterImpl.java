/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.LeadLagFilter;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Lead Lag Filter</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.LeadLagFilterImpl#getZeroFrequency <em>Zero Frequency</em>}</li>
 *   <li>{@link org.tracewell.model.impl.LeadLagFilterImpl#getPoleFrequency <em>Pole Frequency</em>}</li>
 * </ul>
 *
 * @generated
 */
public class LeadLagFilterImpl extends FilterStageImpl implements LeadLagFilter {
	/**
	 * The default value of the '{@link #getZeroFrequency() <em>Zero Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getZeroFrequency()
	 * @generated
	 * @ordered
	 */
	protected static final double ZERO_FREQUENCY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getZeroFrequency() <em>Zero Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getZeroFrequency()
	 * @generated
	 * @ordered
	 */
	protected double zeroFrequency = ZERO_FREQUENCY_EDEFAULT;

	/**
	 * The default value of the '{@link #getPoleFrequency() <em>Pole Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoleFrequency()
	 * @generated
	 * @ordered
	 */
	protected static final double POLE_FREQUENCY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPoleFrequency() <em>Pole Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPoleFrequency()
	 * @generated
	 * @ordered
	 */
	protected double poleFrequency = POLE_FREQUENCY_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected LeadLagFilterImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.LEAD_LAG_FILTER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getZeroFrequency() {
		return zeroFrequency;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setZeroFrequency(double newZeroFrequency) {
		double oldZeroFrequency = zeroFrequency;
		zeroFrequency = newZeroFrequency;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.LEAD_LAG_FILTER__ZERO_FREQUENCY, oldZeroFrequency, zeroFrequency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPoleFrequency() {
		return poleFrequency;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPoleFrequency(double newPoleFrequency) {
		double oldPoleFrequency = poleFrequency;
		poleFrequency = newPoleFrequency;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.LEAD_LAG_FILTER__POLE_FREQUENCY, oldPoleFrequency, poleFrequency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.LEAD_LAG_FILTER__ZERO_FREQUENCY:
				return getZeroFrequency();
			case TracewellPackage.LEAD_LAG_FILTER__POLE_FREQUENCY:
				return getPoleFrequency();
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
			case TracewellPackage.LEAD_LAG_FILTER__ZERO_FREQUENCY:
				setZeroFrequency((Double)newValue);
				return;
			case TracewellPackage.LEAD_LAG_FILTER__POLE_FREQUENCY:
				setPoleFrequency((Double)newValue);
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
			case TracewellPackage.LEAD_LAG_FILTER__ZERO_FREQUENCY:
				setZeroFrequency(ZERO_FREQUENCY_EDEFAULT);
				return;
			case TracewellPackage.LEAD_LAG_FILTER__POLE_FREQUENCY:
				setPoleFrequency(POLE_FREQUENCY_EDEFAULT);
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
			case TracewellPackage.LEAD_LAG_FILTER__ZERO_FREQUENCY:
				return zeroFrequency != ZERO_FREQUENCY_EDEFAULT;
			case TracewellPackage.LEAD_LAG_FILTER__POLE_FREQUENCY:
				return poleFrequency != POLE_FREQUENCY_EDEFAULT;
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
		result.append(" (zeroFrequency: "); //$NON-NLS-1$
		result.append(zeroFrequency);
		result.append(", poleFrequency: "); //$NON-NLS-1$
		result.append(poleFrequency);
		result.append(')');
		return result.toString();
	}

} //LeadLagFilterImpl
