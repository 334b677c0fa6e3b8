/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Budget Line</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.BudgetLine#getName <em>Name</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getAxis <em>Axis</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getSource <em>Source</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getValue <em>Value</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getOrigin <em>Origin</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getErrorClass <em>Error Class</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getDistribution <em>Distribution</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getSensitivity <em>Sensitivity</em>}</li>
 *   <li>{@link org.tracewell.model.BudgetLine#getEvidence <em>Evidence</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getBudgetLine()
 * @model
 * @generated
 */
public interface BudgetLine extends Identified {
	/**
	 * Returns the value of the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Name</em>' attribute.
	 * @see #setName(String)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Name()
	 * @model
	 * @generated
	 */
	String getName();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getName <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Name</em>' attribute.
	 * @see #getName()
	 * @generated
	 */
	void setName(String value);

	/**
	 * Returns the value of the '<em><b>Axis</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Axis</em>' reference.
	 * @see #setAxis(Axis)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Axis()
	 * @model
	 * @generated
	 */
	Axis getAxis();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getAxis <em>Axis</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Axis</em>' reference.
	 * @see #getAxis()
	 * @generated
	 */
	void setAxis(Axis value);

	/**
	 * Returns the value of the '<em><b>Source</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.BudgetSource}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Source</em>' attribute.
	 * @see org.tracewell.model.BudgetSource
	 * @see #setSource(BudgetSource)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Source()
	 * @model
	 * @generated
	 */
	BudgetSource getSource();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getSource <em>Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Source</em>' attribute.
	 * @see org.tracewell.model.BudgetSource
	 * @see #getSource()
	 * @generated
	 */
	void setSource(BudgetSource value);

	/**
	 * Returns the value of the '<em><b>Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Systematic: the error itself. Random: standard uncertainty (normal), half-width (uniform, U-shaped) or step (quantisation).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Value</em>' attribute.
	 * @see #setValue(double)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Value()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='\265m'"
	 * @generated
	 */
	double getValue();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getValue <em>Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Value</em>' attribute.
	 * @see #getValue()
	 * @generated
	 */
	void setValue(double value);

	/**
	 * Returns the value of the '<em><b>Origin</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.ValueOrigin}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Origin</em>' attribute.
	 * @see org.tracewell.model.ValueOrigin
	 * @see #setOrigin(ValueOrigin)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Origin()
	 * @model
	 * @generated
	 */
	ValueOrigin getOrigin();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getOrigin <em>Origin</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Origin</em>' attribute.
	 * @see org.tracewell.model.ValueOrigin
	 * @see #getOrigin()
	 * @generated
	 */
	void setOrigin(ValueOrigin value);

	/**
	 * Returns the value of the '<em><b>Error Class</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.ErrorClass}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Error Class</em>' attribute.
	 * @see org.tracewell.model.ErrorClass
	 * @see #setErrorClass(ErrorClass)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_ErrorClass()
	 * @model
	 * @generated
	 */
	ErrorClass getErrorClass();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getErrorClass <em>Error Class</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Error Class</em>' attribute.
	 * @see org.tracewell.model.ErrorClass
	 * @see #getErrorClass()
	 * @generated
	 */
	void setErrorClass(ErrorClass value);

	/**
	 * Returns the value of the '<em><b>Distribution</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.Distribution}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Distribution</em>' attribute.
	 * @see org.tracewell.model.Distribution
	 * @see #setDistribution(Distribution)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Distribution()
	 * @model
	 * @generated
	 */
	Distribution getDistribution();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getDistribution <em>Distribution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Distribution</em>' attribute.
	 * @see org.tracewell.model.Distribution
	 * @see #getDistribution()
	 * @generated
	 */
	void setDistribution(Distribution value);

	/**
	 * Returns the value of the '<em><b>Sensitivity</b></em>' attribute.
	 * The default value is <code>"1.0"</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Fraction of the value seen normal to the path, -1..1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sensitivity</em>' attribute.
	 * @see #setSensitivity(double)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Sensitivity()
	 * @model default="1.0"
	 *        annotation="http://tracewell.org/units unit='1' displayUnit='1'"
	 * @generated
	 */
	double getSensitivity();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getSensitivity <em>Sensitivity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sensitivity</em>' attribute.
	 * @see #getSensitivity()
	 * @generated
	 */
	void setSensitivity(double value);

	/**
	 * Returns the value of the '<em><b>Evidence</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Evidence</em>' attribute.
	 * @see #setEvidence(String)
	 * @see org.tracewell.model.TracewellPackage#getBudgetLine_Evidence()
	 * @model
	 * @generated
	 */
	String getEvidence();

	/**
	 * Sets the value of the '{@link org.tracewell.model.BudgetLine#getEvidence <em>Evidence</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Evidence</em>' attribute.
	 * @see #getEvidence()
	 * @generated
	 */
	void setEvidence(String value);

} // BudgetLine
