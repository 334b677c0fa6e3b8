/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Transfer Function Controller</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Controller from position error to force/torque command given as a transfer function.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.TransferFunctionController#getNumerator <em>Numerator</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionController#getDenominator <em>Denominator</em>}</li>
 *   <li>{@link org.tracewell.model.TransferFunctionController#getSamplePeriod <em>Sample Period</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getTransferFunctionController()
 * @model
 * @generated
 */
public interface TransferFunctionController extends Controller {
	/**
	 * Returns the value of the '<em><b>Numerator</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.Double}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Coefficients in descending powers of s.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Numerator</em>' attribute list.
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionController_Numerator()
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
	 * Coefficients in descending powers of s.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Denominator</em>' attribute list.
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionController_Denominator()
	 * @model
	 * @generated
	 */
	EList<Double> getDenominator();

	/**
	 * Returns the value of the '<em><b>Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Sample Period</em>' attribute.
	 * @see #setSamplePeriod(double)
	 * @see org.tracewell.model.TracewellPackage#getTransferFunctionController_SamplePeriod()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getSamplePeriod();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TransferFunctionController#getSamplePeriod <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sample Period</em>' attribute.
	 * @see #getSamplePeriod()
	 * @generated
	 */
	void setSamplePeriod(double value);

} // TransferFunctionController
