/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Corner</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * How the path passes from the previous segment to the next.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Corner#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.Corner#getRoundingTolerance <em>Rounding Tolerance</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getCorner()
 * @model
 * @generated
 */
public interface Corner extends Segment {
	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.CornerKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.CornerKind
	 * @see #setKind(CornerKind)
	 * @see org.tracewell.model.TracewellPackage#getCorner_Kind()
	 * @model
	 * @generated
	 */
	CornerKind getKind();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Corner#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.CornerKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(CornerKind value);

	/**
	 * Returns the value of the '<em><b>Rounding Tolerance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Allowed deviation of a rounded corner.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Rounding Tolerance</em>' attribute.
	 * @see #setRoundingTolerance(double)
	 * @see org.tracewell.model.TracewellPackage#getCorner_RoundingTolerance()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='\265m'"
	 * @generated
	 */
	double getRoundingTolerance();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Corner#getRoundingTolerance <em>Rounding Tolerance</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Rounding Tolerance</em>' attribute.
	 * @see #getRoundingTolerance()
	 * @generated
	 */
	void setRoundingTolerance(double value);

} // Corner
