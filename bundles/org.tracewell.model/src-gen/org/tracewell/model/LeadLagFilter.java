/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Lead Lag Filter</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.LeadLagFilter#getZeroFrequency <em>Zero Frequency</em>}</li>
 *   <li>{@link org.tracewell.model.LeadLagFilter#getPoleFrequency <em>Pole Frequency</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getLeadLagFilter()
 * @model
 * @generated
 */
public interface LeadLagFilter extends FilterStage {
	/**
	 * Returns the value of the '<em><b>Zero Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Zero Frequency</em>' attribute.
	 * @see #setZeroFrequency(double)
	 * @see org.tracewell.model.TracewellPackage#getLeadLagFilter_ZeroFrequency()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getZeroFrequency();

	/**
	 * Sets the value of the '{@link org.tracewell.model.LeadLagFilter#getZeroFrequency <em>Zero Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Zero Frequency</em>' attribute.
	 * @see #getZeroFrequency()
	 * @generated
	 */
	void setZeroFrequency(double value);

	/**
	 * Returns the value of the '<em><b>Pole Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Pole Frequency</em>' attribute.
	 * @see #setPoleFrequency(double)
	 * @see org.tracewell.model.TracewellPackage#getLeadLagFilter_PoleFrequency()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getPoleFrequency();

	/**
	 * Sets the value of the '{@link org.tracewell.model.LeadLagFilter#getPoleFrequency <em>Pole Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Pole Frequency</em>' attribute.
	 * @see #getPoleFrequency()
	 * @generated
	 */
	void setPoleFrequency(double value);

} // LeadLagFilter
