/**
 */
package org.tracewell.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracewell.model.CascadeController;
import org.tracewell.model.FilterStage;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Cascade Controller</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getPositionGain <em>Position Gain</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getVelocityGain <em>Velocity Gain</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getVelocityIntegralTime <em>Velocity Integral Time</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getVelocityFeedforward <em>Velocity Feedforward</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getAccelerationFeedforward <em>Acceleration Feedforward</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getFilterStages <em>Filter Stages</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getPositionSamplePeriod <em>Position Sample Period</em>}</li>
 *   <li>{@link org.tracewell.model.impl.CascadeControllerImpl#getVelocitySamplePeriod <em>Velocity Sample Period</em>}</li>
 * </ul>
 *
 * @generated
 */
public class CascadeControllerImpl extends ControllerImpl implements CascadeController {
	/**
	 * The default value of the '{@link #getPositionGain() <em>Position Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPositionGain()
	 * @generated
	 * @ordered
	 */
	protected static final double POSITION_GAIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPositionGain() <em>Position Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPositionGain()
	 * @generated
	 * @ordered
	 */
	protected double positionGain = POSITION_GAIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getVelocityGain() <em>Velocity Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocityGain()
	 * @generated
	 * @ordered
	 */
	protected static final double VELOCITY_GAIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVelocityGain() <em>Velocity Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocityGain()
	 * @generated
	 * @ordered
	 */
	protected double velocityGain = VELOCITY_GAIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getVelocityIntegralTime() <em>Velocity Integral Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocityIntegralTime()
	 * @generated
	 * @ordered
	 */
	protected static final double VELOCITY_INTEGRAL_TIME_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVelocityIntegralTime() <em>Velocity Integral Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocityIntegralTime()
	 * @generated
	 * @ordered
	 */
	protected double velocityIntegralTime = VELOCITY_INTEGRAL_TIME_EDEFAULT;

	/**
	 * The default value of the '{@link #getVelocityFeedforward() <em>Velocity Feedforward</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocityFeedforward()
	 * @generated
	 * @ordered
	 */
	protected static final double VELOCITY_FEEDFORWARD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVelocityFeedforward() <em>Velocity Feedforward</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocityFeedforward()
	 * @generated
	 * @ordered
	 */
	protected double velocityFeedforward = VELOCITY_FEEDFORWARD_EDEFAULT;

	/**
	 * The default value of the '{@link #getAccelerationFeedforward() <em>Acceleration Feedforward</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccelerationFeedforward()
	 * @generated
	 * @ordered
	 */
	protected static final double ACCELERATION_FEEDFORWARD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getAccelerationFeedforward() <em>Acceleration Feedforward</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAccelerationFeedforward()
	 * @generated
	 * @ordered
	 */
	protected double accelerationFeedforward = ACCELERATION_FEEDFORWARD_EDEFAULT;

	/**
	 * The cached value of the '{@link #getFilterStages() <em>Filter Stages</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFilterStages()
	 * @generated
	 * @ordered
	 */
	protected EList<FilterStage> filterStages;

	/**
	 * The default value of the '{@link #getPositionSamplePeriod() <em>Position Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPositionSamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected static final double POSITION_SAMPLE_PERIOD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPositionSamplePeriod() <em>Position Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPositionSamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected double positionSamplePeriod = POSITION_SAMPLE_PERIOD_EDEFAULT;

	/**
	 * The default value of the '{@link #getVelocitySamplePeriod() <em>Velocity Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocitySamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected static final double VELOCITY_SAMPLE_PERIOD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getVelocitySamplePeriod() <em>Velocity Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVelocitySamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected double velocitySamplePeriod = VELOCITY_SAMPLE_PERIOD_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected CascadeControllerImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.CASCADE_CONTROLLER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPositionGain() {
		return positionGain;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPositionGain(double newPositionGain) {
		double oldPositionGain = positionGain;
		positionGain = newPositionGain;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__POSITION_GAIN, oldPositionGain, positionGain));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVelocityGain() {
		return velocityGain;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVelocityGain(double newVelocityGain) {
		double oldVelocityGain = velocityGain;
		velocityGain = newVelocityGain;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__VELOCITY_GAIN, oldVelocityGain, velocityGain));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVelocityIntegralTime() {
		return velocityIntegralTime;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVelocityIntegralTime(double newVelocityIntegralTime) {
		double oldVelocityIntegralTime = velocityIntegralTime;
		velocityIntegralTime = newVelocityIntegralTime;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME, oldVelocityIntegralTime, velocityIntegralTime));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVelocityFeedforward() {
		return velocityFeedforward;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVelocityFeedforward(double newVelocityFeedforward) {
		double oldVelocityFeedforward = velocityFeedforward;
		velocityFeedforward = newVelocityFeedforward;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD, oldVelocityFeedforward, velocityFeedforward));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getAccelerationFeedforward() {
		return accelerationFeedforward;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAccelerationFeedforward(double newAccelerationFeedforward) {
		double oldAccelerationFeedforward = accelerationFeedforward;
		accelerationFeedforward = newAccelerationFeedforward;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD, oldAccelerationFeedforward, accelerationFeedforward));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<FilterStage> getFilterStages() {
		if (filterStages == null) {
			filterStages = new EObjectContainmentEList<FilterStage>(FilterStage.class, this, TracewellPackage.CASCADE_CONTROLLER__FILTER_STAGES);
		}
		return filterStages;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPositionSamplePeriod() {
		return positionSamplePeriod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPositionSamplePeriod(double newPositionSamplePeriod) {
		double oldPositionSamplePeriod = positionSamplePeriod;
		positionSamplePeriod = newPositionSamplePeriod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD, oldPositionSamplePeriod, positionSamplePeriod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getVelocitySamplePeriod() {
		return velocitySamplePeriod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVelocitySamplePeriod(double newVelocitySamplePeriod) {
		double oldVelocitySamplePeriod = velocitySamplePeriod;
		velocitySamplePeriod = newVelocitySamplePeriod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD, oldVelocitySamplePeriod, velocitySamplePeriod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TracewellPackage.CASCADE_CONTROLLER__FILTER_STAGES:
				return ((InternalEList<?>)getFilterStages()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_GAIN:
				return getPositionGain();
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_GAIN:
				return getVelocityGain();
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME:
				return getVelocityIntegralTime();
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD:
				return getVelocityFeedforward();
			case TracewellPackage.CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD:
				return getAccelerationFeedforward();
			case TracewellPackage.CASCADE_CONTROLLER__FILTER_STAGES:
				return getFilterStages();
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD:
				return getPositionSamplePeriod();
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD:
				return getVelocitySamplePeriod();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_GAIN:
				setPositionGain((Double)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_GAIN:
				setVelocityGain((Double)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME:
				setVelocityIntegralTime((Double)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD:
				setVelocityFeedforward((Double)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD:
				setAccelerationFeedforward((Double)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__FILTER_STAGES:
				getFilterStages().clear();
				getFilterStages().addAll((Collection<? extends FilterStage>)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD:
				setPositionSamplePeriod((Double)newValue);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD:
				setVelocitySamplePeriod((Double)newValue);
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
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_GAIN:
				setPositionGain(POSITION_GAIN_EDEFAULT);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_GAIN:
				setVelocityGain(VELOCITY_GAIN_EDEFAULT);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME:
				setVelocityIntegralTime(VELOCITY_INTEGRAL_TIME_EDEFAULT);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD:
				setVelocityFeedforward(VELOCITY_FEEDFORWARD_EDEFAULT);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD:
				setAccelerationFeedforward(ACCELERATION_FEEDFORWARD_EDEFAULT);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__FILTER_STAGES:
				getFilterStages().clear();
				return;
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD:
				setPositionSamplePeriod(POSITION_SAMPLE_PERIOD_EDEFAULT);
				return;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD:
				setVelocitySamplePeriod(VELOCITY_SAMPLE_PERIOD_EDEFAULT);
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
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_GAIN:
				return positionGain != POSITION_GAIN_EDEFAULT;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_GAIN:
				return velocityGain != VELOCITY_GAIN_EDEFAULT;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME:
				return velocityIntegralTime != VELOCITY_INTEGRAL_TIME_EDEFAULT;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD:
				return velocityFeedforward != VELOCITY_FEEDFORWARD_EDEFAULT;
			case TracewellPackage.CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD:
				return accelerationFeedforward != ACCELERATION_FEEDFORWARD_EDEFAULT;
			case TracewellPackage.CASCADE_CONTROLLER__FILTER_STAGES:
				return filterStages != null && !filterStages.isEmpty();
			case TracewellPackage.CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD:
				return positionSamplePeriod != POSITION_SAMPLE_PERIOD_EDEFAULT;
			case TracewellPackage.CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD:
				return velocitySamplePeriod != VELOCITY_SAMPLE_PERIOD_EDEFAULT;
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
		result.append(" (positionGain: "); //$NON-NLS-1$
		result.append(positionGain);
		result.append(", velocityGain: "); //$NON-NLS-1$
		result.append(velocityGain);
		result.append(", velocityIntegralTime: "); //$NON-NLS-1$
		result.append(velocityIntegralTime);
		result.append(", velocityFeedforward: "); //$NON-NLS-1$
		result.append(velocityFeedforward);
		result.append(", accelerationFeedforward: "); //$NON-NLS-1$
		result.append(accelerationFeedforward);
		result.append(", positionSamplePeriod: "); //$NON-NLS-1$
		result.append(positionSamplePeriod);
		result.append(", velocitySamplePeriod: "); //$NON-NLS-1$
		result.append(velocitySamplePeriod);
		result.append(')');
		return result.toString();
	}

} //CascadeControllerImpl
