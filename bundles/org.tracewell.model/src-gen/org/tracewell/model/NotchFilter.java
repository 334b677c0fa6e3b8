/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Notch Filter</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.NotchFilter#getCentreFrequency <em>Centre Frequency</em>}</li>
 *   <li>{@link org.tracewell.model.NotchFilter#getWidth <em>Width</em>}</li>
 *   <li>{@link org.tracewell.model.NotchFilter#getDepth <em>Depth</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getNotchFilter()
 * @model
 * @generated
 */
public interface NotchFilter extends FilterStage {
	/**
	 * Returns the value of the '<em><b>Centre Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Centre Frequency</em>' attribute.
	 * @see #setCentreFrequency(double)
	 * @see org.tracewell.model.TracewellPackage#getNotchFilter_CentreFrequency()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getCentreFrequency();

	/**
	 * Sets the value of the '{@link org.tracewell.model.NotchFilter#getCentreFrequency <em>Centre Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Centre Frequency</em>' attribute.
	 * @see #getCentreFrequency()
	 * @generated
	 */
	void setCentreFrequency(double value);

	/**
	 * Returns the value of the '<em><b>Width</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * -3 dB width of the notch.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Width</em>' attribute.
	 * @see #setWidth(double)
	 * @see org.tracewell.model.TracewellPackage#getNotchFilter_Width()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getWidth();

	/**
	 * Sets the value of the '{@link org.tracewell.model.NotchFilter#getWidth <em>Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Width</em>' attribute.
	 * @see #getWidth()
	 * @generated
	 */
	void setWidth(double value);

	/**
	 * Returns the value of the '<em><b>Depth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Gain at the centre frequency, 0 < depth < 1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Depth</em>' attribute.
	 * @see #setDepth(double)
	 * @see org.tracewell.model.TracewellPackage#getNotchFilter_Depth()
	 * @model annotation="http://tracewell.org/units unit='1' displayUnit='1'"
	 * @generated
	 */
	double getDepth();

	/**
	 * Sets the value of the '{@link org.tracewell.model.NotchFilter#getDepth <em>Depth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Depth</em>' attribute.
	 * @see #getDepth()
	 * @generated
	 */
	void setDepth(double value);

} // NotchFilter
