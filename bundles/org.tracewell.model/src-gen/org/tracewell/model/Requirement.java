/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Requirement</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Requirement#getStatement <em>Statement</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getMetric <em>Metric</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getContours <em>Contours</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getBound <em>Bound</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getLimit <em>Limit</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getDisplayUnit <em>Display Unit</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getParent <em>Parent</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getAllocatedAxis <em>Allocated Axis</em>}</li>
 *   <li>{@link org.tracewell.model.Requirement#getRationale <em>Rationale</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getRequirement()
 * @model
 * @generated
 */
public interface Requirement extends Identified {
	/**
	 * Returns the value of the '<em><b>Statement</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Statement</em>' attribute.
	 * @see #setStatement(String)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Statement()
	 * @model
	 * @generated
	 */
	String getStatement();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getStatement <em>Statement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Statement</em>' attribute.
	 * @see #getStatement()
	 * @generated
	 */
	void setStatement(String value);

	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.RequirementKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.RequirementKind
	 * @see #setKind(RequirementKind)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Kind()
	 * @model
	 * @generated
	 */
	RequirementKind getKind();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.RequirementKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(RequirementKind value);

	/**
	 * Returns the value of the '<em><b>Metric</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.ContourMetric}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Metric</em>' attribute.
	 * @see org.tracewell.model.ContourMetric
	 * @see #setMetric(ContourMetric)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Metric()
	 * @model
	 * @generated
	 */
	ContourMetric getMetric();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getMetric <em>Metric</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Metric</em>' attribute.
	 * @see org.tracewell.model.ContourMetric
	 * @see #getMetric()
	 * @generated
	 */
	void setMetric(ContourMetric value);

	/**
	 * Returns the value of the '<em><b>Contours</b></em>' reference list.
	 * The list contents are of type {@link org.tracewell.model.Contour}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Contours a contour-deviation requirement is evaluated on (e.g. both directions of a circle).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Contours</em>' reference list.
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Contours()
	 * @model
	 * @generated
	 */
	EList<Contour> getContours();

	/**
	 * Returns the value of the '<em><b>Bound</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.LimitBound}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Bound</em>' attribute.
	 * @see org.tracewell.model.LimitBound
	 * @see #setBound(LimitBound)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Bound()
	 * @model
	 * @generated
	 */
	LimitBound getBound();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getBound <em>Bound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bound</em>' attribute.
	 * @see org.tracewell.model.LimitBound
	 * @see #getBound()
	 * @generated
	 */
	void setBound(LimitBound value);

	/**
	 * Returns the value of the '<em><b>Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Limit in the SI unit of the kind: m (deviations, errors), rad (phase margin), 1 (gain margin as a ratio), Hz, s, 1/s.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Limit</em>' attribute.
	 * @see #setLimit(double)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Limit()
	 * @model
	 * @generated
	 */
	double getLimit();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getLimit <em>Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Limit</em>' attribute.
	 * @see #getLimit()
	 * @generated
	 */
	void setLimit(double value);

	/**
	 * Returns the value of the '<em><b>Display Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Unit the limit is shown in, e.g. µm, deg, dB, Hz, ms, (m/min)/mm.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Display Unit</em>' attribute.
	 * @see #setDisplayUnit(String)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_DisplayUnit()
	 * @model
	 * @generated
	 */
	String getDisplayUnit();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getDisplayUnit <em>Display Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Display Unit</em>' attribute.
	 * @see #getDisplayUnit()
	 * @generated
	 */
	void setDisplayUnit(String value);

	/**
	 * Returns the value of the '<em><b>Parent</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The requirement this one is derived from.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Parent</em>' reference.
	 * @see #setParent(Requirement)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Parent()
	 * @model
	 * @generated
	 */
	Requirement getParent();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getParent <em>Parent</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Parent</em>' reference.
	 * @see #getParent()
	 * @generated
	 */
	void setParent(Requirement value);

	/**
	 * Returns the value of the '<em><b>Allocated Axis</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Allocated Axis</em>' reference.
	 * @see #setAllocatedAxis(Axis)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_AllocatedAxis()
	 * @model
	 * @generated
	 */
	Axis getAllocatedAxis();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getAllocatedAxis <em>Allocated Axis</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Allocated Axis</em>' reference.
	 * @see #getAllocatedAxis()
	 * @generated
	 */
	void setAllocatedAxis(Axis value);

	/**
	 * Returns the value of the '<em><b>Rationale</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Rationale</em>' attribute.
	 * @see #setRationale(String)
	 * @see org.tracewell.model.TracewellPackage#getRequirement_Rationale()
	 * @model
	 * @generated
	 */
	String getRationale();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Requirement#getRationale <em>Rationale</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Rationale</em>' attribute.
	 * @see #getRationale()
	 * @generated
	 */
	void setRationale(String value);

} // Requirement
