/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Rigid Screw Drive</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.RigidScrewDriveImpl#getMotorInertia <em>Motor Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RigidScrewDriveImpl#getScrewInertia <em>Screw Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RigidScrewDriveImpl#getLoadMass <em>Load Mass</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RigidScrewDriveImpl#getLead <em>Lead</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RigidScrewDriveImpl#getGearRatio <em>Gear Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RigidScrewDriveImpl#getTorqueConstant <em>Torque Constant</em>}</li>
 * </ul>
 *
 * @generated
 */
public class RigidScrewDriveImpl extends MotorDrivenPlantImpl implements RigidScrewDrive {
	/**
	 * The default value of the '{@link #getMotorInertia() <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMotorInertia()
	 * @generated
	 * @ordered
	 */
	protected static final double MOTOR_INERTIA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMotorInertia() <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMotorInertia()
	 * @generated
	 * @ordered
	 */
	protected double motorInertia = MOTOR_INERTIA_EDEFAULT;

	/**
	 * The default value of the '{@link #getScrewInertia() <em>Screw Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScrewInertia()
	 * @generated
	 * @ordered
	 */
	protected static final double SCREW_INERTIA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getScrewInertia() <em>Screw Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScrewInertia()
	 * @generated
	 * @ordered
	 */
	protected double screwInertia = SCREW_INERTIA_EDEFAULT;

	/**
	 * The default value of the '{@link #getLoadMass() <em>Load Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLoadMass()
	 * @generated
	 * @ordered
	 */
	protected static final double LOAD_MASS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLoadMass() <em>Load Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLoadMass()
	 * @generated
	 * @ordered
	 */
	protected double loadMass = LOAD_MASS_EDEFAULT;

	/**
	 * The default value of the '{@link #getLead() <em>Lead</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLead()
	 * @generated
	 * @ordered
	 */
	protected static final double LEAD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLead() <em>Lead</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLead()
	 * @generated
	 * @ordered
	 */
	protected double lead = LEAD_EDEFAULT;

	/**
	 * The default value of the '{@link #getGearRatio() <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearRatio()
	 * @generated
	 * @ordered
	 */
	protected static final double GEAR_RATIO_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getGearRatio() <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearRatio()
	 * @generated
	 * @ordered
	 */
	protected double gearRatio = GEAR_RATIO_EDEFAULT;

	/**
	 * The default value of the '{@link #getTorqueConstant() <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTorqueConstant()
	 * @generated
	 * @ordered
	 */
	protected static final double TORQUE_CONSTANT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTorqueConstant() <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTorqueConstant()
	 * @generated
	 * @ordered
	 */
	protected double torqueConstant = TORQUE_CONSTANT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected RigidScrewDriveImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.RIGID_SCREW_DRIVE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMotorInertia() {
		return motorInertia;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMotorInertia(double newMotorInertia) {
		double oldMotorInertia = motorInertia;
		motorInertia = newMotorInertia;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RIGID_SCREW_DRIVE__MOTOR_INERTIA, oldMotorInertia, motorInertia));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getScrewInertia() {
		return screwInertia;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setScrewInertia(double newScrewInertia) {
		double oldScrewInertia = screwInertia;
		screwInertia = newScrewInertia;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RIGID_SCREW_DRIVE__SCREW_INERTIA, oldScrewInertia, screwInertia));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLoadMass() {
		return loadMass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLoadMass(double newLoadMass) {
		double oldLoadMass = loadMass;
		loadMass = newLoadMass;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RIGID_SCREW_DRIVE__LOAD_MASS, oldLoadMass, loadMass));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLead() {
		return lead;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLead(double newLead) {
		double oldLead = lead;
		lead = newLead;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RIGID_SCREW_DRIVE__LEAD, oldLead, lead));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGearRatio() {
		return gearRatio;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGearRatio(double newGearRatio) {
		double oldGearRatio = gearRatio;
		gearRatio = newGearRatio;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RIGID_SCREW_DRIVE__GEAR_RATIO, oldGearRatio, gearRatio));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTorqueConstant() {
		return torqueConstant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTorqueConstant(double newTorqueConstant) {
		double oldTorqueConstant = torqueConstant;
		torqueConstant = newTorqueConstant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RIGID_SCREW_DRIVE__TORQUE_CONSTANT, oldTorqueConstant, torqueConstant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.RIGID_SCREW_DRIVE__MOTOR_INERTIA:
				return getMotorInertia();
			case TracewellPackage.RIGID_SCREW_DRIVE__SCREW_INERTIA:
				return getScrewInertia();
			case TracewellPackage.RIGID_SCREW_DRIVE__LOAD_MASS:
				return getLoadMass();
			case TracewellPackage.RIGID_SCREW_DRIVE__LEAD:
				return getLead();
			case TracewellPackage.RIGID_SCREW_DRIVE__GEAR_RATIO:
				return getGearRatio();
			case TracewellPackage.RIGID_SCREW_DRIVE__TORQUE_CONSTANT:
				return getTorqueConstant();
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
			case TracewellPackage.RIGID_SCREW_DRIVE__MOTOR_INERTIA:
				setMotorInertia((Double)newValue);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__SCREW_INERTIA:
				setScrewInertia((Double)newValue);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__LOAD_MASS:
				setLoadMass((Double)newValue);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__LEAD:
				setLead((Double)newValue);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__GEAR_RATIO:
				setGearRatio((Double)newValue);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__TORQUE_CONSTANT:
				setTorqueConstant((Double)newValue);
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
			case TracewellPackage.RIGID_SCREW_DRIVE__MOTOR_INERTIA:
				setMotorInertia(MOTOR_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__SCREW_INERTIA:
				setScrewInertia(SCREW_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__LOAD_MASS:
				setLoadMass(LOAD_MASS_EDEFAULT);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__LEAD:
				setLead(LEAD_EDEFAULT);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__GEAR_RATIO:
				setGearRatio(GEAR_RATIO_EDEFAULT);
				return;
			case TracewellPackage.RIGID_SCREW_DRIVE__TORQUE_CONSTANT:
				setTorqueConstant(TORQUE_CONSTANT_EDEFAULT);
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
			case TracewellPackage.RIGID_SCREW_DRIVE__MOTOR_INERTIA:
				return motorInertia != MOTOR_INERTIA_EDEFAULT;
			case TracewellPackage.RIGID_SCREW_DRIVE__SCREW_INERTIA:
				return screwInertia != SCREW_INERTIA_EDEFAULT;
			case TracewellPackage.RIGID_SCREW_DRIVE__LOAD_MASS:
				return loadMass != LOAD_MASS_EDEFAULT;
			case TracewellPackage.RIGID_SCREW_DRIVE__LEAD:
				return lead != LEAD_EDEFAULT;
			case TracewellPackage.RIGID_SCREW_DRIVE__GEAR_RATIO:
				return gearRatio != GEAR_RATIO_EDEFAULT;
			case TracewellPackage.RIGID_SCREW_DRIVE__TORQUE_CONSTANT:
				return torqueConstant != TORQUE_CONSTANT_EDEFAULT;
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
		result.append(" (motorInertia: "); //$NON-NLS-1$
		result.append(motorInertia);
		result.append(", screwInertia: "); //$NON-NLS-1$
		result.append(screwInertia);
		result.append(", loadMass: "); //$NON-NLS-1$
		result.append(loadMass);
		result.append(", lead: "); //$NON-NLS-1$
		result.append(lead);
		result.append(", gearRatio: "); //$NON-NLS-1$
		result.append(gearRatio);
		result.append(", torqueConstant: "); //$NON-NLS-1$
		result.append(torqueConstant);
		result.append(')');
		return result.toString();
	}

} //RigidScrewDriveImpl
