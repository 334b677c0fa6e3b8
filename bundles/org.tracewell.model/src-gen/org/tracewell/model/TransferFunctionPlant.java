/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Transfer Function Plant</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Plant given as a transfer function from motor torque to motor velocity, e.g. fitted to a measured frequency response.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getNumerator <em>Numerator</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getDenominator <em>Denominator</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getDeadTime <em>Dead Time</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getRatio <em>Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getEquivalentInertia <em>Equivalent Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getTorqueConstant <em>Torque Constant</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionPlant#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant()
 * @model
 * @generated
 */
public interface TransferFunctionPlant extends Plant {
	/**
	 * Returns the value of the '<em><b>Numerator</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.Double}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Coefficients in descending powers of s of motor velocity / motor torque, (rad/s)/(N·m).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Numerator</em>' attribute list.
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_Numerator()
	 * @model
	 * @generated
	 */
	EList<Double> getNumerator();

	/**
	 * Returns the value of the '<em><b>Denominator</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.Double}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Coefficients in descending powers of s; the function must be strictly proper.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Denominator</em>' attribute list.
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_Denominator()
	 * @model
	 * @generated
	 */
	EList<Double> getDenominator();

	/**
	 * Returns the value of the '<em><b>Dead Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Pure delay in front of the transfer function.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Dead Time</em>' attribute.
	 * @see #setDeadTime(double)
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_DeadTime()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getDeadTime();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TransferFunctionPlant#getDeadTime <em>Dead Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Dead Time</em>' attribute.
	 * @see #getDeadTime()
	 * @generated
	 */
	void setDeadTime(double value);

	/**
	 * Returns the value of the '<em><b>Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Load travel per motor radian (the load follows the motor rigidly).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Ratio</em>' attribute.
	 * @see #setRatio(double)
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_Ratio()
	 * @model annotation="http://tracewell.org/units unit='m/rad' displayUnit='mm/rev' rotaryUnit='1' rotaryDisplayUnit='1'"
	 * @generated
	 */
	double getRatio();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TransferFunctionPlant#getRatio <em>Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Ratio</em>' attribute.
	 * @see #getRatio()
	 * @generated
	 */
	void setRatio(double value);

	/**
	 * Returns the value of the '<em><b>Equivalent Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Total inertia seen by the motor, used by acceleration feedforward.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Equivalent Inertia</em>' attribute.
	 * @see #setEquivalentInertia(double)
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_EquivalentInertia()
	 * @model annotation="http://tracewell.org/units unit='kg\267m\262' displayUnit='kg\267cm\262'"
	 * @generated
	 */
	double getEquivalentInertia();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TransferFunctionPlant#getEquivalentInertia <em>Equivalent Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Equivalent Inertia</em>' attribute.
	 * @see #getEquivalentInertia()
	 * @generated
	 */
	void setEquivalentInertia(double value);

	/**
	 * Returns the value of the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Torque Constant</em>' attribute.
	 * @see #setTorqueConstant(double)
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_TorqueConstant()
	 * @model annotation="http://tracewell.org/units unit='N\267m/A' displayUnit='N\267m/A'"
	 * @generated
	 */
	double getTorqueConstant();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TransferFunctionPlant#getTorqueConstant <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Torque Constant</em>' attribute.
	 * @see #getTorqueConstant()
	 * @generated
	 */
	void setTorqueConstant(double value);

	/**
	 * Returns the value of the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Closed current-loop bandwidth to put in front of the function; leave unset (0) when the measured function already contains the current loop.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Current Loop Bandwidth</em>' attribute.
	 * @see #setCurrentLoopBandwidth(double)
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionPlant_CurrentLoopBandwidth()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getCurrentLoopBandwidth();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TransferFunctionPlant#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Current Loop Bandwidth</em>' attribute.
	 * @see #getCurrentLoopBandwidth()
	 * @generated
	 */
	void setCurrentLoopBandwidth(double value);

} // TransferFunctionPlant
