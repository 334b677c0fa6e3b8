/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Variation Study</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A tolerance study of the machine: which numeric attributes vary and how, and which results are collected (sweep over a 1-D or 2-D grid, or seeded Monte-Carlo run).
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.VariationStudy#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.VariationStudy#getVariantCount <em>Variant Count</em>}</li>
 *   <li>{@link org.tracewell.model.VariationStudy#getSeed <em>Seed</em>}</li>
 *   <li>{@link org.tracewell.model.VariationStudy#getWorstVariantCount <em>Worst Variant Count</em>}</li>
 *   <li>{@link org.tracewell.model.VariationStudy#getMetrics <em>Metrics</em>}</li>
 *   <li>{@link org.tracewell.model.VariationStudy#getParameters <em>Parameters</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getVariationStudy()
 * @model
 * @generated
 */
public interface VariationStudy extends Named {
	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.StudyKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.StudyKind
	 * @see #setKind(StudyKind)
	 * @see org.tracewell.model.TracewellPackage#getVariationStudy_Kind()
	 * @model
	 * @generated
	 */
	StudyKind getKind();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariationStudy#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.StudyKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(StudyKind value);

	/**
	 * Returns the value of the '<em><b>Variant Count</b></em>' attribute.
	 * The default value is <code>"1000"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Monte-Carlo variants N, 1..100000.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Variant Count</em>' attribute.
	 * @see #setVariantCount(int)
	 * @see org.tracewell.model.TracewellPackage#getVariationStudy_VariantCount()
	 * @model default="1000"
	 * @generated
	 */
	int getVariantCount();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariationStudy#getVariantCount <em>Variant Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Variant Count</em>' attribute.
	 * @see #getVariantCount()
	 * @generated
	 */
	void setVariantCount(int value);

	/**
	 * Returns the value of the '<em><b>Seed</b></em>' attribute.
	 * The default value is <code>"1"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Seed of the Monte-Carlo random streams: the same seed gives the same variants.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Seed</em>' attribute.
	 * @see #setSeed(long)
	 * @see org.tracewell.model.TracewellPackage#getVariationStudy_Seed()
	 * @model default="1"
	 * @generated
	 */
	long getSeed();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariationStudy#getSeed <em>Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Seed</em>' attribute.
	 * @see #getSeed()
	 * @generated
	 */
	void setSeed(long value);

	/**
	 * Returns the value of the '<em><b>Worst Variant Count</b></em>' attribute.
	 * The default value is <code>"5"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * How many of the worst variants are kept for inspection per metric.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Worst Variant Count</em>' attribute.
	 * @see #setWorstVariantCount(int)
	 * @see org.tracewell.model.TracewellPackage#getVariationStudy_WorstVariantCount()
	 * @model default="5"
	 * @generated
	 */
	int getWorstVariantCount();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariationStudy#getWorstVariantCount <em>Worst Variant Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Worst Variant Count</em>' attribute.
	 * @see #getWorstVariantCount()
	 * @generated
	 */
	void setWorstVariantCount(int value);

	/**
	 * Returns the value of the '<em><b>Metrics</b></em>' attribute list.
	 * The list contents are of type {@link java.lang.String}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Results collected per variant, e.g. requirement[lm3020-r1], contour[circle R100 F3 CCW].G, axis[Y].phaseMargin; none = every requirement of the machine.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Metrics</em>' attribute list.
	 * @see org.tracewell.model.TracewellPackage#getVariationStudy_Metrics()
	 * @model
	 * @generated
	 */
	EList<String> getMetrics();

	/**
	 * Returns the value of the '<em><b>Parameters</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.VariedParameter}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The varied attributes: any number for a Monte-Carlo study, one or two for a sweep.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Parameters</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getVariationStudy_Parameters()
	 * @model containment="true"
	 * @generated
	 */
	EList<VariedParameter> getParameters();

} // VariationStudy
