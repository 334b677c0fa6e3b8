/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.MotorDrivenPlant;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Motor Driven Plant</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.MotorDrivenPlantImpl#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MotorDrivenPlantImpl#getViscousFriction <em>Viscous Friction</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MotorDrivenPlantImpl#getCoulombFriction <em>Coulomb Friction</em>}</li>
 * </ul>
 *
 * @generated
 */
public abstract class MotorDrivenPlantImpl extends PlantImpl implements MotorDrivenPlant {
	/**
	 * The default value of the '{@link #getCurrentLoopBandwidth() <em>Current Loop Bandwidth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCurrentLoopBandwidth()
	 * @generated
	 * @ordered
	 */
	protected static final double CURRENT_LOOP_BANDWIDTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCurrentLoopBandwidth() <em>Current Loop Bandwidth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCurrentLoopBandwidth()
	 * @generated
	 * @ordered
	 */
	protected double currentLoopBandwidth = CURRENT_LOOP_BANDWIDTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getViscousFriction() <em>Viscous Friction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getViscousFriction()
	 * @generated
	 * @ordered
	 */
	protected static final double VISCOUS_FRICTION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getViscousFriction() <em>Viscous Friction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getViscousFriction()
	 * @generated
	 * @ordered
	 */
	protected double viscousFriction = VISCOUS_FRICTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getCoulombFriction() <em>Coulomb Friction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCoulombFriction()
	 * @generated
	 * @ordered
	 */
	protected static final double COULOMB_FRICTION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCoulombFriction() <em>Coulomb Friction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCoulombFriction()
	 * @generated
	 * @ordered
	 */
	protected double coulombFriction = COULOMB_FRICTION_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected MotorDrivenPlantImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.MOTOR_DRIVEN_PLANT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCurrentLoopBandwidth() {
		return currentLoopBandwidth;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCurrentLoopBandwidth(double newCurrentLoopBandwidth) {
		double oldCurrentLoopBandwidth = currentLoopBandwidth;
		currentLoopBandwidth = newCurrentLoopBandwidth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH, oldCurrentLoopBandwidth, currentLoopBandwidth));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getViscousFriction() {
		return viscousFriction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setViscousFriction(double newViscousFriction) {
		double oldViscousFriction = viscousFriction;
		viscousFriction = newViscousFriction;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION, oldViscousFriction, viscousFriction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCoulombFriction() {
		return coulombFriction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCoulombFriction(double newCoulombFriction) {
		double oldCoulombFriction = coulombFriction;
		coulombFriction = newCoulombFriction;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.MOTOR_DRIVEN_PLANT__COULOMB_FRICTION, oldCoulombFriction, coulombFriction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH:
				return getCurrentLoopBandwidth();
			case TracewellPackage.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION:
				return getViscousFriction();
			case TracewellPackage.MOTOR_DRIVEN_PLANT__COULOMB_FRICTION:
				return getCoulombFriction();
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
			case TracewellPackage.MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH:
				setCurrentLoopBandwidth((Double)newValue);
				return;
			case TracewellPackage.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION:
				setViscousFriction((Double)newValue);
				return;
			case TracewellPackage.MOTOR_DRIVEN_PLANT__COULOMB_FRICTION:
				setCoulombFriction((Double)newValue);
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
			case TracewellPackage.MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH:
				setCurrentLoopBandwidth(CURRENT_LOOP_BANDWIDTH_EDEFAULT);
				return;
			case TracewellPackage.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION:
				setViscousFriction(VISCOUS_FRICTION_EDEFAULT);
				return;
			case TracewellPackage.MOTOR_DRIVEN_PLANT__COULOMB_FRICTION:
				setCoulombFriction(COULOMB_FRICTION_EDEFAULT);
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
			case TracewellPackage.MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH:
				return currentLoopBandwidth != CURRENT_LOOP_BANDWIDTH_EDEFAULT;
			case TracewellPackage.MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION:
				return viscousFriction != VISCOUS_FRICTION_EDEFAULT;
			case TracewellPackage.MOTOR_DRIVEN_PLANT__COULOMB_FRICTION:
				return coulombFriction != COULOMB_FRICTION_EDEFAULT;
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
		result.append(" (currentLoopBandwidth: "); //$NON-NLS-1$
		result.append(currentLoopBandwidth);
		result.append(", viscousFriction: "); //$NON-NLS-1$
		result.append(viscousFriction);
		result.append(", coulombFriction: "); //$NON-NLS-1$
		result.append(coulombFriction);
		result.append(')');
		return result.toString();
	}

} //MotorDrivenPlantImpl
