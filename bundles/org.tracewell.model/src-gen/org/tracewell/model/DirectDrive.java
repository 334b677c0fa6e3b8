/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Direct Drive</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Linear motor driving the load directly.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.DirectDrive#getMovingMass <em>Moving Mass</em>}</li>
 *   <li>{@link org.tracewell.model.DirectDrive#getForceConstant <em>Force Constant</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getDirectDrive()
 * @model
 * @generated
 */
public interface DirectDrive extends MotorDrivenPlant {
	/**
	 * Returns the value of the '<em><b>Moving Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Moving mass of the linear motor axis.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Moving Mass</em>' attribute.
	 * @see #setMovingMass(double)
	 * @see org.tracewell.model.TracewellPackage#getDirectDrive_MovingMass()
	 * @model annotation="http://tracewell.org/units unit='kg' displayUnit='kg'"
	 * @generated
	 */
	double getMovingMass();

	/**
	 * Sets the value of the '{@link org.tracewell.model.DirectDrive#getMovingMass <em>Moving Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Moving Mass</em>' attribute.
	 * @see #getMovingMass()
	 * @generated
	 */
	void setMovingMass(double value);

	/**
	 * Returns the value of the '<em><b>Force Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Force Constant</em>' attribute.
	 * @see #setForceConstant(double)
	 * @see org.tracewell.model.TracewellPackage#getDirectDrive_ForceConstant()
	 * @model annotation="http://tracewell.org/units unit='N/A' displayUnit='N/A'"
	 * @generated
	 */
	double getForceConstant();

	/**
	 * Sets the value of the '{@link org.tracewell.model.DirectDrive#getForceConstant <em>Force Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Force Constant</em>' attribute.
	 * @see #getForceConstant()
	 * @generated
	 */
	void setForceConstant(double value);

} // DirectDrive
