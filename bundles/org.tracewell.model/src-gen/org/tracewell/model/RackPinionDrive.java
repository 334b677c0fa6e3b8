/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Rack Pinion Drive</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getMotorInertia <em>Motor Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getGearboxInertia <em>Gearbox Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getPinionRadius <em>Pinion Radius</em>}</li>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getGearRatio <em>Gear Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getLoadMass <em>Load Mass</em>}</li>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getTorqueConstant <em>Torque Constant</em>}</li>
 *   <li>{@link org.tracewell.model.RackPinionDrive#getDrivetrainStiffness <em>Drivetrain Stiffness</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive()
 * @model
 * @generated
 */
public interface RackPinionDrive extends MotorDrivenPlant {
	/**
	 * Returns the value of the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Motor Inertia</em>' attribute.
	 * @see #setMotorInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_MotorInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getMotorInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getMotorInertia <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Motor Inertia</em>' attribute.
	 * @see #getMotorInertia()
	 * @generated
	 */
	void setMotorInertia(double value);

	/**
	 * Returns the value of the '<em><b>Gearbox Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Gearbox and pinion inertia referred to the motor.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Gearbox Inertia</em>' attribute.
	 * @see #setGearboxInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_GearboxInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getGearboxInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getGearboxInertia <em>Gearbox Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Gearbox Inertia</em>' attribute.
	 * @see #getGearboxInertia()
	 * @generated
	 */
	void setGearboxInertia(double value);

	/**
	 * Returns the value of the '<em><b>Pinion Radius</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Pitch radius of the pinion.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Pinion Radius</em>' attribute.
	 * @see #setPinionRadius(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_PinionRadius()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getPinionRadius();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getPinionRadius <em>Pinion Radius</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Pinion Radius</em>' attribute.
	 * @see #getPinionRadius()
	 * @generated
	 */
	void setPinionRadius(double value);

	/**
	 * Returns the value of the '<em><b>Gear Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Motor revolutions per pinion revolution.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Gear Ratio</em>' attribute.
	 * @see #setGearRatio(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_GearRatio()
	 * @model annotation="http://tracewell.org/units unit='1' displayUnit='1'"
	 * @generated
	 */
	double getGearRatio();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getGearRatio <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Gear Ratio</em>' attribute.
	 * @see #getGearRatio()
	 * @generated
	 */
	void setGearRatio(double value);

	/**
	 * Returns the value of the '<em><b>Load Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Load Mass</em>' attribute.
	 * @see #setLoadMass(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_LoadMass()
	 * @model annotation="http://tracewell.org/units unit='kg' displayUnit='kg'"
	 * @generated
	 */
	double getLoadMass();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getLoadMass <em>Load Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Load Mass</em>' attribute.
	 * @see #getLoadMass()
	 * @generated
	 */
	void setLoadMass(double value);

	/**
	 * Returns the value of the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Torque Constant</em>' attribute.
	 * @see #setTorqueConstant(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_TorqueConstant()
	 * @model annotation="http://tracewell.org/units unit='N\267m/A' displayUnit='N\267m/A'"
	 * @generated
	 */
	double getTorqueConstant();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getTorqueConstant <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Torque Constant</em>' attribute.
	 * @see #getTorqueConstant()
	 * @generated
	 */
	void setTorqueConstant(double value);

	/**
	 * Returns the value of the '<em><b>Drivetrain Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Linear stiffness of gearbox, pinion and rack at the load; 0 = rigid.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Drivetrain Stiffness</em>' attribute.
	 * @see #setDrivetrainStiffness(double)
	 * @see org.tracewell.model.TracewellPackage#getRackPinionDrive_DrivetrainStiffness()
	 * @model annotation="http://tracewell.org/units unit='N/m' displayUnit='N/\265m'"
	 * @generated
	 */
	double getDrivetrainStiffness();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RackPinionDrive#getDrivetrainStiffness <em>Drivetrain Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Drivetrain Stiffness</em>' attribute.
	 * @see #getDrivetrainStiffness()
	 * @generated
	 */
	void setDrivetrainStiffness(double value);

} // RackPinionDrive
