/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Line</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Line#getEndX <em>End X</em>}</li>
 *   <li>{@link org.tracewell.model.Line#getEndY <em>End Y</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getLine()
 * @model
 * @generated
 */
public interface Line extends Segment {
	/**
	 * Returns the value of the '<em><b>End X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>End X</em>' attribute.
	 * @see #setEndX(double)
	 * @see org.tracewell.model.TracewellPackage#getLine_EndX()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getEndX();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Line#getEndX <em>End X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>End X</em>' attribute.
	 * @see #getEndX()
	 * @generated
	 */
	void setEndX(double value);

	/**
	 * Returns the value of the '<em><b>End Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>End Y</em>' attribute.
	 * @see #setEndY(double)
	 * @see org.tracewell.model.TracewellPackage#getLine_EndY()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getEndY();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Line#getEndY <em>End Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>End Y</em>' attribute.
	 * @see #getEndY()
	 * @generated
	 */
	void setEndY(double value);

} // Line
