/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.PidController;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Pid Controller</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.PidControllerImpl#getProportionalGain <em>Proportional Gain</em>}</li>
 *   <li>{@link org.tracewell.model.impl.PidControllerImpl#getIntegralGain <em>Integral Gain</em>}</li>
 *   <li>{@link org.tracewell.model.impl.PidControllerImpl#getDerivativeGain <em>Derivative Gain</em>}</li>
 *   <li>{@link org.tracewell.model.impl.PidControllerImpl#getDerivativeFilterTime <em>Derivative Filter Time</em>}</li>
 *   <li>{@link org.tracewell.model.impl.PidControllerImpl#getSamplePeriod <em>Sample Period</em>}</li>
 * </ul>
 *
 * @generated
 */
public class PidControllerImpl extends ControllerImpl implements PidController {
	/**
	 * The default value of the '{@link #getProportionalGain() <em>Proportional Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProportionalGain()
	 * @generated
	 * @ordered
	 */
	protected static final double PROPORTIONAL_GAIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getProportionalGain() <em>Proportional Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getProportionalGain()
	 * @generated
	 * @ordered
	 */
	protected double proportionalGain = PROPORTIONAL_GAIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getIntegralGain() <em>Integral Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIntegralGain()
	 * @generated
	 * @ordered
	 */
	protected static final double INTEGRAL_GAIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getIntegralGain() <em>Integral Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getIntegralGain()
	 * @generated
	 * @ordered
	 */
	protected double integralGain = INTEGRAL_GAIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getDerivativeGain() <em>Derivative Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDerivativeGain()
	 * @generated
	 * @ordered
	 */
	protected static final double DERIVATIVE_GAIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDerivativeGain() <em>Derivative Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDerivativeGain()
	 * @generated
	 * @ordered
	 */
	protected double derivativeGain = DERIVATIVE_GAIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getDerivativeFilterTime() <em>Derivative Filter Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDerivativeFilterTime()
	 * @generated
	 * @ordered
	 */
	protected static final double DERIVATIVE_FILTER_TIME_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDerivativeFilterTime() <em>Derivative Filter Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDerivativeFilterTime()
	 * @generated
	 * @ordered
	 */
	protected double derivativeFilterTime = DERIVATIVE_FILTER_TIME_EDEFAULT;

	/**
	 * The default value of the '{@link #getSamplePeriod() <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected static final double SAMPLE_PERIOD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSamplePeriod() <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected double samplePeriod = SAMPLE_PERIOD_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected PidControllerImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.PID_CONTROLLER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getProportionalGain() {
		return proportionalGain;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setProportionalGain(double newProportionalGain) {
		double oldProportionalGain = proportionalGain;
		proportionalGain = newProportionalGain;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.PID_CONTROLLER__PROPORTIONAL_GAIN, oldProportionalGain, proportionalGain));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getIntegralGain() {
		return integralGain;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setIntegralGain(double newIntegralGain) {
		double oldIntegralGain = integralGain;
		integralGain = newIntegralGain;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.PID_CONTROLLER__INTEGRAL_GAIN, oldIntegralGain, integralGain));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDerivativeGain() {
		return derivativeGain;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDerivativeGain(double newDerivativeGain) {
		double oldDerivativeGain = derivativeGain;
		derivativeGain = newDerivativeGain;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.PID_CONTROLLER__DERIVATIVE_GAIN, oldDerivativeGain, derivativeGain));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDerivativeFilterTime() {
		return derivativeFilterTime;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDerivativeFilterTime(double newDerivativeFilterTime) {
		double oldDerivativeFilterTime = derivativeFilterTime;
		derivativeFilterTime = newDerivativeFilterTime;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.PID_CONTROLLER__DERIVATIVE_FILTER_TIME, oldDerivativeFilterTime, derivativeFilterTime));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSamplePeriod() {
		return samplePeriod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSamplePeriod(double newSamplePeriod) {
		double oldSamplePeriod = samplePeriod;
		samplePeriod = newSamplePeriod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.PID_CONTROLLER__SAMPLE_PERIOD, oldSamplePeriod, samplePeriod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.PID_CONTROLLER__PROPORTIONAL_GAIN:
				return getProportionalGain();
			case TracewellPackage.PID_CONTROLLER__INTEGRAL_GAIN:
				return getIntegralGain();
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_GAIN:
				return getDerivativeGain();
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_FILTER_TIME:
				return getDerivativeFilterTime();
			case TracewellPackage.PID_CONTROLLER__SAMPLE_PERIOD:
				return getSamplePeriod();
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
			case TracewellPackage.PID_CONTROLLER__PROPORTIONAL_GAIN:
				setProportionalGain((Double)newValue);
				return;
			case TracewellPackage.PID_CONTROLLER__INTEGRAL_GAIN:
				setIntegralGain((Double)newValue);
				return;
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_GAIN:
				setDerivativeGain((Double)newValue);
				return;
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_FILTER_TIME:
				setDerivativeFilterTime((Double)newValue);
				return;
			case TracewellPackage.PID_CONTROLLER__SAMPLE_PERIOD:
				setSamplePeriod((Double)newValue);
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
			case TracewellPackage.PID_CONTROLLER__PROPORTIONAL_GAIN:
				setProportionalGain(PROPORTIONAL_GAIN_EDEFAULT);
				return;
			case TracewellPackage.PID_CONTROLLER__INTEGRAL_GAIN:
				setIntegralGain(INTEGRAL_GAIN_EDEFAULT);
				return;
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_GAIN:
				setDerivativeGain(DERIVATIVE_GAIN_EDEFAULT);
				return;
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_FILTER_TIME:
				setDerivativeFilterTime(DERIVATIVE_FILTER_TIME_EDEFAULT);
				return;
			case TracewellPackage.PID_CONTROLLER__SAMPLE_PERIOD:
				setSamplePeriod(SAMPLE_PERIOD_EDEFAULT);
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
			case TracewellPackage.PID_CONTROLLER__PROPORTIONAL_GAIN:
				return proportionalGain != PROPORTIONAL_GAIN_EDEFAULT;
			case TracewellPackage.PID_CONTROLLER__INTEGRAL_GAIN:
				return integralGain != INTEGRAL_GAIN_EDEFAULT;
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_GAIN:
				return derivativeGain != DERIVATIVE_GAIN_EDEFAULT;
			case TracewellPackage.PID_CONTROLLER__DERIVATIVE_FILTER_TIME:
				return derivativeFilterTime != DERIVATIVE_FILTER_TIME_EDEFAULT;
			case TracewellPackage.PID_CONTROLLER__SAMPLE_PERIOD:
				return samplePeriod != SAMPLE_PERIOD_EDEFAULT;
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
		result.append(" (proportionalGain: "); //$NON-NLS-1$
		result.append(proportionalGain);
		result.append(", integralGain: "); //$NON-NLS-1$
		result.append(integralGain);
		result.append(", derivativeGain: "); //$NON-NLS-1$
		result.append(derivativeGain);
		result.append(", derivativeFilterTime: "); //$NON-NLS-1$
		result.append(derivativeFilterTime);
		result.append(", samplePeriod: "); //$NON-NLS-1$
		result.append(samplePeriod);
		result.append(')');
		return result.toString();
	}

} //PidControllerImpl
