/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Rack Pinion Drive</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getMotorInertia <em>Motor Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getGearboxInertia <em>Gearbox Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getPinionRadius <em>Pinion Radius</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getGearRatio <em>Gear Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getLoadMass <em>Load Mass</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getTorqueConstant <em>Torque Constant</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RackPinionDriveImpl#getDrivetrainStiffness <em>Drivetrain Stiffness</em>}</li>
 * </ul>
 *
 * @generated
 */
public class RackPinionDriveImpl extends MotorDrivenPlantImpl implements RackPinionDrive {
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
	 * The default value of the '{@link #getGearboxInertia() <em>Gearbox Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearboxInertia()
	 * @generated
	 * @ordered
	 */
	protected static final double GEARBOX_INERTIA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getGearboxInertia() <em>Gearbox Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearboxInertia()
	 * @generated
	 * @ordered
	 */
	protected double gearboxInertia = GEARBOX_INERTIA_EDEFAULT;

	/**
	 * The default value of the '{@link #getPinionRadius() <em>Pinion Radius</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPinionRadius()
	 * @generated
	 * @ordered
	 */
	protected static final double PINION_RADIUS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPinionRadius() <em>Pinion Radius</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPinionRadius()
	 * @generated
	 * @ordered
	 */
	protected double pinionRadius = PINION_RADIUS_EDEFAULT;

	/**
	 * The default value of the '{@link #getGearRatio() <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearRatio()
	 * @generated
	 * @ordered
	 */
	protected static final double GEAR_RATIO_EDEFAULT = 0.0;

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
	 * The default value of the '{@link #getDrivetrainStiffness() <em>Drivetrain Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDrivetrainStiffness()
	 * @generated
	 * @ordered
	 */
	protected static final double DRIVETRAIN_STIFFNESS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDrivetrainStiffness() <em>Drivetrain Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDrivetrainStiffness()
	 * @generated
	 * @ordered
	 */
	protected double drivetrainStiffness = DRIVETRAIN_STIFFNESS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected RackPinionDriveImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.RACK_PINION_DRIVE;
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__MOTOR_INERTIA, oldMotorInertia, motorInertia));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGearboxInertia() {
		return gearboxInertia;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGearboxInertia(double newGearboxInertia) {
		double oldGearboxInertia = gearboxInertia;
		gearboxInertia = newGearboxInertia;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__GEARBOX_INERTIA, oldGearboxInertia, gearboxInertia));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPinionRadius() {
		return pinionRadius;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPinionRadius(double newPinionRadius) {
		double oldPinionRadius = pinionRadius;
		pinionRadius = newPinionRadius;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__PINION_RADIUS, oldPinionRadius, pinionRadius));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__GEAR_RATIO, oldGearRatio, gearRatio));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__LOAD_MASS, oldLoadMass, loadMass));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__TORQUE_CONSTANT, oldTorqueConstant, torqueConstant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDrivetrainStiffness() {
		return drivetrainStiffness;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDrivetrainStiffness(double newDrivetrainStiffness) {
		double oldDrivetrainStiffness = drivetrainStiffness;
		drivetrainStiffness = newDrivetrainStiffness;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS, oldDrivetrainStiffness, drivetrainStiffness));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.RACK_PINION_DRIVE__MOTOR_INERTIA:
				return getMotorInertia();
			case TracewellPackage.RACK_PINION_DRIVE__GEARBOX_INERTIA:
				return getGearboxInertia();
			case TracewellPackage.RACK_PINION_DRIVE__PINION_RADIUS:
				return getPinionRadius();
			case TracewellPackage.RACK_PINION_DRIVE__GEAR_RATIO:
				return getGearRatio();
			case TracewellPackage.RACK_PINION_DRIVE__LOAD_MASS:
				return getLoadMass();
			case TracewellPackage.RACK_PINION_DRIVE__TORQUE_CONSTANT:
				return getTorqueConstant();
			case TracewellPackage.RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS:
				return getDrivetrainStiffness();
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
			case TracewellPackage.RACK_PINION_DRIVE__MOTOR_INERTIA:
				setMotorInertia((Double)newValue);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__GEARBOX_INERTIA:
				setGearboxInertia((Double)newValue);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__PINION_RADIUS:
				setPinionRadius((Double)newValue);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__GEAR_RATIO:
				setGearRatio((Double)newValue);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__LOAD_MASS:
				setLoadMass((Double)newValue);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__TORQUE_CONSTANT:
				setTorqueConstant((Double)newValue);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS:
				setDrivetrainStiffness((Double)newValue);
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
			case TracewellPackage.RACK_PINION_DRIVE__MOTOR_INERTIA:
				setMotorInertia(MOTOR_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__GEARBOX_INERTIA:
				setGearboxInertia(GEARBOX_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__PINION_RADIUS:
				setPinionRadius(PINION_RADIUS_EDEFAULT);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__GEAR_RATIO:
				setGearRatio(GEAR_RATIO_EDEFAULT);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__LOAD_MASS:
				setLoadMass(LOAD_MASS_EDEFAULT);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__TORQUE_CONSTANT:
				setTorqueConstant(TORQUE_CONSTANT_EDEFAULT);
				return;
			case TracewellPackage.RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS:
				setDrivetrainStiffness(DRIVETRAIN_STIFFNESS_EDEFAULT);
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
			case TracewellPackage.RACK_PINION_DRIVE__MOTOR_INERTIA:
				return motorInertia != MOTOR_INERTIA_EDEFAULT;
			case TracewellPackage.RACK_PINION_DRIVE__GEARBOX_INERTIA:
				return gearboxInertia != GEARBOX_INERTIA_EDEFAULT;
			case TracewellPackage.RACK_PINION_DRIVE__PINION_RADIUS:
				return pinionRadius != PINION_RADIUS_EDEFAULT;
			case TracewellPackage.RACK_PINION_DRIVE__GEAR_RATIO:
				return gearRatio != GEAR_RATIO_EDEFAULT;
			case TracewellPackage.RACK_PINION_DRIVE__LOAD_MASS:
				return loadMass != LOAD_MASS_EDEFAULT;
			case TracewellPackage.RACK_PINION_DRIVE__TORQUE_CONSTANT:
				return torqueConstant != TORQUE_CONSTANT_EDEFAULT;
			case TracewellPackage.RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS:
				return drivetrainStiffness != DRIVETRAIN_STIFFNESS_EDEFAULT;
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
		result.append(", gearboxInertia: "); //$NON-NLS-1$
		result.append(gearboxInertia);
		result.append(", pinionRadius: "); //$NON-NLS-1$
		result.append(pinionRadius);
		result.append(", gearRatio: "); //$NON-NLS-1$
		result.append(gearRatio);
		result.append(", loadMass: "); //$NON-NLS-1$
		result.append(loadMass);
		result.append(", torqueConstant: "); //$NON-NLS-1$
		result.append(torqueConstant);
		result.append(", drivetrainStiffness: "); //$NON-NLS-1$
		result.append(drivetrainStiffness);
		result.append(')');
		return result.toString();
	}

} //RackPinionDriveImpl
