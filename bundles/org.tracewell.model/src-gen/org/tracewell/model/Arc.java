/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Arc</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Arc#getEndX <em>End X</em>}</li>
 *   <li>{@link org.tracewell.model.Arc#getEndY <em>End Y</em>}</li>
 *   <li>{@link org.tracewell.model.Arc#getCentreX <em>Centre X</em>}</li>
 *   <li>{@link org.tracewell.model.Arc#getCentreY <em>Centre Y</em>}</li>
 *   <li>{@link org.tracewell.model.Arc#getDirection <em>Direction</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getArc()
 * @model
 * @generated
 */
public interface Arc extends Segment {
	/**
	 * Returns the value of the '<em><b>End X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>End X</em>' attribute.
	 * @see #setEndX(double)
	 * @see org.tracewell.model.TracewellPackage#getArc_EndX()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getEndX();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Arc#getEndX <em>End X</em>}' attribute.
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
	 * @see org.tracewell.model.TracewellPackage#getArc_EndY()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getEndY();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Arc#getEndY <em>End Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>End Y</em>' attribute.
	 * @see #getEndY()
	 * @generated
	 */
	void setEndY(double value);

	/**
	 * Returns the value of the '<em><b>Centre X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Centre X</em>' attribute.
	 * @see #setCentreX(double)
	 * @see org.tracewell.model.TracewellPackage#getArc_CentreX()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getCentreX();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Arc#getCentreX <em>Centre X</em>}' attribute.
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
	 * @see org.tracewell.model.TracewellPackage#getArc_CentreY()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getCentreY();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Arc#getCentreY <em>Centre Y</em>}' attribute.
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
	 * @see org.tracewell.model.TracewellPackage#getArc_Direction()
	 * @model
	 * @generated
	 */
	Direction getDirection();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Arc#getDirection <em>Direction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Direction</em>' attribute.
	 * @see org.tracewell.model.Direction
	 * @see #getDirection()
	 * @generated
	 */
	void setDirection(Direction value);

} // Arc
