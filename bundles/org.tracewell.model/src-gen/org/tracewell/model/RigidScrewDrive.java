/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Rigid Screw Drive</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Ball-screw drive treated as one rigid inertia.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.RigidScrewDrive#getMotorInertia <em>Motor Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.RigidScrewDrive#getScrewInertia <em>Screw Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.RigidScrewDrive#getLoadMass <em>Load Mass</em>}</li>
 *   <li>{@link org.tracewell.model.RigidScrewDrive#getLead <em>Lead</em>}</li>
 *   <li>{@link org.tracewell.model.RigidScrewDrive#getGearRatio <em>Gear Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.RigidScrewDrive#getTorqueConstant <em>Torque Constant</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive()
 * @model
 * @generated
 */
public interface RigidScrewDrive extends MotorDrivenPlant {
	/**
	 * Returns the value of the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Motor Inertia</em>' attribute.
	 * @see #setMotorInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive_MotorInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getMotorInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RigidScrewDrive#getMotorInertia <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Motor Inertia</em>' attribute.
	 * @see #getMotorInertia()
	 * @generated
	 */
	void setMotorInertia(double value);

	/**
	 * Returns the value of the '<em><b>Screw Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Screw Inertia</em>' attribute.
	 * @see #setScrewInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive_ScrewInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getScrewInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RigidScrewDrive#getScrewInertia <em>Screw Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Screw Inertia</em>' attribute.
	 * @see #getScrewInertia()
	 * @generated
	 */
	void setScrewInertia(double value);

	/**
	 * Returns the value of the '<em><b>Load Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Moving mass carried by the nut.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Load Mass</em>' attribute.
	 * @see #setLoadMass(double)
	 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive_LoadMass()
	 * @model annotation="http://tracewell.org/units unit='kg' displayUnit='kg'"
	 * @generated
	 */
	double getLoadMass();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RigidScrewDrive#getLoadMass <em>Load Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Load Mass</em>' attribute.
	 * @see #getLoadMass()
	 * @generated
	 */
	void setLoadMass(double value);

	/**
	 * Returns the value of the '<em><b>Lead</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Screw lead: travel per screw revolution.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Lead</em>' attribute.
	 * @see #setLead(double)
	 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive_Lead()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getLead();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RigidScrewDrive#getLead <em>Lead</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Lead</em>' attribute.
	 * @see #getLead()
	 * @generated
	 */
	void setLead(double value);

	/**
	 * Returns the value of the '<em><b>Gear Ratio</b></em>' attribute.
	 * The default value is <code>"1.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Motor revolutions per screw revolution (1 = direct coupling).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Gear Ratio</em>' attribute.
	 * @see #setGearRatio(double)
	 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive_GearRatio()
	 * @model default="1.0"
	 *        annotation="http://tracewell.org/units unit='1' displayUnit='1'"
	 * @generated
	 */
	double getGearRatio();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RigidScrewDrive#getGearRatio <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Gear Ratio</em>' attribute.
	 * @see #getGearRatio()
	 * @generated
	 */
	void setGearRatio(double value);

	/**
	 * Returns the value of the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Torque Constant</em>' attribute.
	 * @see #setTorqueConstant(double)
	 * @see org.tracewell.model.TracewellPackage#getRigidScrewDrive_TorqueConstant()
	 * @model annotation="http://tracewell.org/units unit='N\267m/A' displayUnit='N\267m/A'"
	 * @generated
	 */
	double getTorqueConstant();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RigidScrewDrive#getTorqueConstant <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Torque Constant</em>' attribute.
	 * @see #getTorqueConstant()
	 * @generated
	 */
	void setTorqueConstant(double value);

} // RigidScrewDrive
