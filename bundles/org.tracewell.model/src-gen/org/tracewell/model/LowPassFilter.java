/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Low Pass Filter</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.LowPassFilter#getOrder <em>Order</em>}</li>
 *   <li>{@link org.tracewell.model.LowPassFilter#getCutoffFrequency <em>Cutoff Frequency</em>}</li>
 *   <li>{@link org.tracewell.model.LowPassFilter#getDampingRatio <em>Damping Ratio</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getLowPassFilter()
 * @model
 * @generated
 */
public interface LowPassFilter extends FilterStage {
	/**
	 * Returns the value of the '<em><b>Order</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.LowPassOrder}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Order</em>' attribute.
	 * @see org.tracewell.model.LowPassOrder
	 * @see #setOrder(LowPassOrder)
	 * @see org.tracewell.model.TracewellPackage#getLowPassFilter_Order()
	 * @model
	 * @generated
	 */
	LowPassOrder getOrder();

	/**
	 * Sets the value of the '{@link org.tracewell.model.LowPassFilter#getOrder <em>Order</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Order</em>' attribute.
	 * @see org.tracewell.model.LowPassOrder
	 * @see #getOrder()
	 * @generated
	 */
	void setOrder(LowPassOrder value);

	/**
	 * Returns the value of the '<em><b>Cutoff Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Cutoff Frequency</em>' attribute.
	 * @see #setCutoffFrequency(double)
	 * @see org.tracewell.model.TracewellPackage#getLowPassFilter_CutoffFrequency()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getCutoffFrequency();

	/**
	 * Sets the value of the '{@link org.tracewell.model.LowPassFilter#getCutoffFrequency <em>Cutoff Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Cutoff Frequency</em>' attribute.
	 * @see #getCutoffFrequency()
	 * @generated
	 */
	void setCutoffFrequency(double value);

	/**
	 * Returns the value of the '<em><b>Damping Ratio</b></em>' attribute.
	 * The default value is <code>"0.707"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Damping of the second-order low-pass.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Damping Ratio</em>' attribute.
	 * @see #setDampingRatio(double)
	 * @see org.tracewell.model.TracewellPackage#getLowPassFilter_DampingRatio()
	 * @model default="0.707"
	 *        annotation="http://tracewell.org/units unit='1' displayUnit='1'"
	 * @generated
	 */
	double getDampingRatio();

	/**
	 * Sets the value of the '{@link org.tracewell.model.LowPassFilter#getDampingRatio <em>Damping Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Damping Ratio</em>' attribute.
	 * @see #getDampingRatio()
	 * @generated
	 */
	void setDampingRatio(double value);

} // LowPassFilter
