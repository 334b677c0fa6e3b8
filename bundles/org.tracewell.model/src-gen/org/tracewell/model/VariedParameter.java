/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Varied Parameter</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One numeric attribute of the machine that varies in a study. Every value is in the SI unit of that attribute.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.VariedParameter#getPath <em>Path</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getShape <em>Shape</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getSigma <em>Sigma</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getHalfWidth <em>Half Width</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getMinimum <em>Minimum</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getMaximum <em>Maximum</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getFrom <em>From</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getTo <em>To</em>}</li>
 *   <li>{@link org.tracewell.model.VariedParameter#getSteps <em>Steps</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getVariedParameter()
 * @model
 * @generated
 */
public interface VariedParameter extends Identified {
	/**
	 * Returns the value of the '<em><b>Path</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Where the attribute sits in the machine, e.g. axis[X1].plant.loadMass, axis[Y].controller.positionGain, contour[lm3020-line-45].feed.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Path</em>' attribute.
	 * @see #setPath(String)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_Path()
	 * @model
	 * @generated
	 */
	String getPath();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getPath <em>Path</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Path</em>' attribute.
	 * @see #getPath()
	 * @generated
	 */
	void setPath(String value);

	/**
	 * Returns the value of the '<em><b>Shape</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.ToleranceShape}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Shape</em>' attribute.
	 * @see org.tracewell.model.ToleranceShape
	 * @see #setShape(ToleranceShape)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_Shape()
	 * @model
	 * @generated
	 */
	ToleranceShape getShape();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getShape <em>Shape</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Shape</em>' attribute.
	 * @see org.tracewell.model.ToleranceShape
	 * @see #getShape()
	 * @generated
	 */
	void setShape(ToleranceShape value);

	/**
	 * Returns the value of the '<em><b>Sigma</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Standard deviation of a normal spread (SI unit of the attribute).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sigma</em>' attribute.
	 * @see #setSigma(double)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_Sigma()
	 * @model
	 * @generated
	 */
	double getSigma();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getSigma <em>Sigma</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sigma</em>' attribute.
	 * @see #getSigma()
	 * @generated
	 */
	void setSigma(double value);

	/**
	 * Returns the value of the '<em><b>Half Width</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Half-width a of a uniform (nominal ± a) or triangular (nominal ± a, peak at nominal) spread (SI unit of the attribute).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Half Width</em>' attribute.
	 * @see #setHalfWidth(double)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_HalfWidth()
	 * @model
	 * @generated
	 */
	double getHalfWidth();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getHalfWidth <em>Half Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Half Width</em>' attribute.
	 * @see #getHalfWidth()
	 * @generated
	 */
	void setHalfWidth(double value);

	/**
	 * Returns the value of the '<em><b>Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Lower end of the physical range the spread is truncated to; unset: 0 for a positive nominal, otherwise unbounded.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Minimum</em>' attribute.
	 * @see #isSetMinimum()
	 * @see #unsetMinimum()
	 * @see #setMinimum(double)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_Minimum()
	 * @model unsettable="true"
	 * @generated
	 */
	double getMinimum();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getMinimum <em>Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Minimum</em>' attribute.
	 * @see #isSetMinimum()
	 * @see #unsetMinimum()
	 * @see #getMinimum()
	 * @generated
	 */
	void setMinimum(double value);

	/**
	 * Unsets the value of the '{@link org.tracewell.model.VariedParameter#getMinimum <em>Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMinimum()
	 * @see #getMinimum()
	 * @see #setMinimum(double)
	 * @generated
	 */
	void unsetMinimum();

	/**
	 * Returns whether the value of the '{@link org.tracewell.model.VariedParameter#getMinimum <em>Minimum</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Minimum</em>' attribute is set.
	 * @see #unsetMinimum()
	 * @see #getMinimum()
	 * @see #setMinimum(double)
	 * @generated
	 */
	boolean isSetMinimum();

	/**
	 * Returns the value of the '<em><b>Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Upper end of the physical range the spread is truncated to; unset: unbounded.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Maximum</em>' attribute.
	 * @see #isSetMaximum()
	 * @see #unsetMaximum()
	 * @see #setMaximum(double)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_Maximum()
	 * @model unsettable="true"
	 * @generated
	 */
	double getMaximum();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getMaximum <em>Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Maximum</em>' attribute.
	 * @see #isSetMaximum()
	 * @see #unsetMaximum()
	 * @see #getMaximum()
	 * @generated
	 */
	void setMaximum(double value);

	/**
	 * Unsets the value of the '{@link org.tracewell.model.VariedParameter#getMaximum <em>Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #isSetMaximum()
	 * @see #getMaximum()
	 * @see #setMaximum(double)
	 * @generated
	 */
	void unsetMaximum();

	/**
	 * Returns whether the value of the '{@link org.tracewell.model.VariedParameter#getMaximum <em>Maximum</em>}' attribute is set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return whether the value of the '<em>Maximum</em>' attribute is set.
	 * @see #unsetMaximum()
	 * @see #getMaximum()
	 * @see #setMaximum(double)
	 * @generated
	 */
	boolean isSetMaximum();

	/**
	 * Returns the value of the '<em><b>From</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * First grid value of a sweep (SI unit of the attribute).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>From</em>' attribute.
	 * @see #setFrom(double)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_From()
	 * @model
	 * @generated
	 */
	double getFrom();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getFrom <em>From</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>From</em>' attribute.
	 * @see #getFrom()
	 * @generated
	 */
	void setFrom(double value);

	/**
	 * Returns the value of the '<em><b>To</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Last grid value of a sweep (SI unit of the attribute).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>To</em>' attribute.
	 * @see #setTo(double)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_To()
	 * @model
	 * @generated
	 */
	double getTo();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getTo <em>To</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>To</em>' attribute.
	 * @see #getTo()
	 * @generated
	 */
	void setTo(double value);

	/**
	 * Returns the value of the '<em><b>Steps</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Grid points of a sweep, both ends included, at least 2.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Steps</em>' attribute.
	 * @see #setSteps(int)
	 * @see org.tracewell.model.TracewellPackage#getVariedParameter_Steps()
	 * @model
	 * @generated
	 */
	int getSteps();

	/**
	 * Sets the value of the '{@link org.tracewell.model.VariedParameter#getSteps <em>Steps</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Steps</em>' attribute.
	 * @see #getSteps()
	 * @generated
	 */
	void setSteps(int value);

} // VariedParameter
