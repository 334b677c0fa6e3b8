/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Encoder</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Encoder#getSide <em>Side</em>}</li>
 *   <li>{@link org.tracewell.model.Encoder#getLinearResolution <em>Linear Resolution</em>}</li>
 *   <li>{@link org.tracewell.model.Encoder#getCountsPerRevolution <em>Counts Per Revolution</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getEncoder()
 * @model
 * @generated
 */
public interface Encoder extends Identified {
	/**
	 * Returns the value of the '<em><b>Side</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.EncoderSide}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Side</em>' attribute.
	 * @see org.tracewell.model.EncoderSide
	 * @see #setSide(EncoderSide)
	 * @see org.tracewell.model.TracewellPackage#getEncoder_Side()
	 * @model
	 * @generated
	 */
	EncoderSide getSide();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Encoder#getSide <em>Side</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Side</em>' attribute.
	 * @see org.tracewell.model.EncoderSide
	 * @see #getSide()
	 * @generated
	 */
	void setSide(EncoderSide value);

	/**
	 * Returns the value of the '<em><b>Linear Resolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Resolution of a linear scale (load side of a linear axis).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Linear Resolution</em>' attribute.
	 * @see #setLinearResolution(double)
	 * @see org.tracewell.model.TracewellPackage#getEncoder_LinearResolution()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='\265m'"
	 * @generated
	 */
	double getLinearResolution();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Encoder#getLinearResolution <em>Linear Resolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Linear Resolution</em>' attribute.
	 * @see #getLinearResolution()
	 * @generated
	 */
	void setLinearResolution(double value);

	/**
	 * Returns the value of the '<em><b>Counts Per Revolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Counts per revolution of a rotary encoder (motor side, or load side of a rotary axis).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Counts Per Revolution</em>' attribute.
	 * @see #setCountsPerRevolution(int)
	 * @see org.tracewell.model.TracewellPackage#getEncoder_CountsPerRevolution()
	 * @model annotation="http://tracewell.org/units unit='1/rev' displayUnit='1/rev'"
	 * @generated
	 */
	int getCountsPerRevolution();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Encoder#getCountsPerRevolution <em>Counts Per Revolution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Counts Per Revolution</em>' attribute.
	 * @see #getCountsPerRevolution()
	 * @generated
	 */
	void setCountsPerRevolution(int value);

} // Encoder
