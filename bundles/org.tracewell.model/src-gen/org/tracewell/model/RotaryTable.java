/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Rotary Table</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.RotaryTable#getMotorInertia <em>Motor Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.RotaryTable#getTableInertia <em>Table Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.RotaryTable#getGearRatio <em>Gear Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.RotaryTable#getTorqueConstant <em>Torque Constant</em>}</li>
 *   <li>{@link org.tracewell.model.RotaryTable#getTorsionalStiffness <em>Torsional Stiffness</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getRotaryTable()
 * @model
 * @generated
 */
public interface RotaryTable extends MotorDrivenPlant {
	/**
	 * Returns the value of the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Motor Inertia</em>' attribute.
	 * @see #setMotorInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getRotaryTable_MotorInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getMotorInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RotaryTable#getMotorInertia <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Motor Inertia</em>' attribute.
	 * @see #getMotorInertia()
	 * @generated
	 */
	void setMotorInertia(double value);

	/**
	 * Returns the value of the '<em><b>Table Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Table (or trunnion) and workpiece inertia.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Table Inertia</em>' attribute.
	 * @see #setTableInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getRotaryTable_TableInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getTableInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RotaryTable#getTableInertia <em>Table Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Table Inertia</em>' attribute.
	 * @see #getTableInertia()
	 * @generated
	 */
	void setTableInertia(double value);

	/**
	 * Returns the value of the '<em><b>Gear Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Motor revolutions per table revolution (1 = torque motor).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Gear Ratio</em>' attribute.
	 * @see #setGearRatio(double)
	 * @see org.tracewell.model.TracewellPackage#getRotaryTable_GearRatio()
	 * @model annotation="http://tracewell.org/units unit='1' displayUnit='1'"
	 * @generated
	 */
	double getGearRatio();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RotaryTable#getGearRatio <em>Gear Ratio</em>}' attribute.
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
	 * @see org.tracewell.model.TracewellPackage#getRotaryTable_TorqueConstant()
	 * @model annotation="http://tracewell.org/units unit='N\267m/A' displayUnit='N\267m/A'"
	 * @generated
	 */
	double getTorqueConstant();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RotaryTable#getTorqueConstant <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Torque Constant</em>' attribute.
	 * @see #getTorqueConstant()
	 * @generated
	 */
	void setTorqueConstant(double value);

	/**
	 * Returns the value of the '<em><b>Torsional Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Stiffness of the drive train at the table; 0 = rigid.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Torsional Stiffness</em>' attribute.
	 * @see #setTorsionalStiffness(double)
	 * @see org.tracewell.model.TracewellPackage#getRotaryTable_TorsionalStiffness()
	 * @model annotation="http://tracewell.org/units unit='N\267m/rad' displayUnit='N\267m/arcmin'"
	 * @generated
	 */
	double getTorsionalStiffness();

	/**
	 * Sets the value of the '{@link org.tracewell.model.RotaryTable#getTorsionalStiffness <em>Torsional Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Torsional Stiffness</em>' attribute.
	 * @see #getTorsionalStiffness()
	 * @generated
	 */
	void setTorsionalStiffness(double value);

} // RotaryTable
