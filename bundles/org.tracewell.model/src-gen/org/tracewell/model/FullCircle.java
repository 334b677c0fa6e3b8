/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Full Circle</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A full circle starting and ending at the current point.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.FullCircle#getCentreX <em>Centre X</em>}</li>
 *   <li>{@link org.tracewell.model.FullCircle#getCentreY <em>Centre Y</em>}</li>
 *   <li>{@link org.tracewell.model.FullCircle#getDirection <em>Direction</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getFullCircle()
 * @model
 * @generated
 */
public interface FullCircle extends Segment {
	/**
	 * Returns the value of the '<em><b>Centre X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Centre X</em>' attribute.
	 * @see #setCentreX(double)
	 * @see org.tracewell.model.TracewellPackage#getFullCircle_CentreX()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getCentreX();

	/**
	 * Sets the value of the '{@link org.tracewell.model.FullCircle#getCentreX <em>Centre X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Centre X</em>' attribute.
	 * @see #getCentreX()
	 * @generated
	 */
	void setCentreX(double value);

	/**
	 * Returns the value of the '<em><b>Centre Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Centre Y</em>' attribute.
	 * @see #setCentreY(double)
	 * @see org.tracewell.model.TracewellPackage#getFullCircle_CentreY()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getCentreY();

	/**
	 * Sets the value of the '{@link org.tracewell.model.FullCircle#getCentreY <em>Centre Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Centre Y</em>' attribute.
	 * @see #getCentreY()
	 * @generated
	 */
	void setCentreY(double value);

	/**
	 * Returns the value of the '<em><b>Direction</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.Direction}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Direction</em>' attribute.
	 * @see org.tracewell.model.Direction
	 * @see #setDirection(Direction)
	 * @see org.tracewell.model.TracewellPackage#getFullCircle_Direction()
	 * @model
	 * @generated
	 */
	Direction getDirection();

	/**
	 * Sets the value of the '{@link org.tracewell.model.FullCircle#getDirection <em>Direction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Direction</em>' attribute.
	 * @see org.tracewell.model.Direction
	 * @see #getDirection()
	 * @generated
	 */
	void setDirection(Direction value);

} // FullCircle
