/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Machine</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A machine: its axes, test contours, requirements and error budget.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Machine#getInterpolationPeriod <em>Interpolation Period</em>}</li>
 *   <li>{@link org.tracewell.model.Machine#getAxes <em>Axes</em>}</li>
 *   <li>{@link org.tracewell.model.Machine#getLibraryAxes <em>Library Axes</em>}</li>
 *   <li>{@link org.tracewell.model.Machine#getContours <em>Contours</em>}</li>
 *   <li>{@link org.tracewell.model.Machine#getRequirements <em>Requirements</em>}</li>
 *   <li>{@link org.tracewell.model.Machine#getBudgetLines <em>Budget Lines</em>}</li>
 *   <li>{@link org.tracewell.model.Machine#getStudies <em>Studies</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getMachine()
 * @model
 * @generated
 */
public interface Machine extends Named {
	/**
	 * Returns the value of the '<em><b>Interpolation Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Period of the path interpolator that feeds all position loops.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Interpolation Period</em>' attribute.
	 * @see #setInterpolationPeriod(double)
	 * @see org.tracewell.model.TracewellPackage#getMachine_InterpolationPeriod()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getInterpolationPeriod();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Machine#getInterpolationPeriod <em>Interpolation Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Interpolation Period</em>' attribute.
	 * @see #getInterpolationPeriod()
	 * @generated
	 */
	void setInterpolationPeriod(double value);

	/**
	 * Returns the value of the '<em><b>Axes</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.Axis}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Axes stored inside this machine file.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Axes</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getMachine_Axes()
	 * @model containment="true"
	 * @generated
	 */
	EList<Axis> getAxes();

	/**
	 * Returns the value of the '<em><b>Library Axes</b></em>' reference list.
	 * The list contents are of type {@link org.tracewell.model.Axis}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Axes stored in shared library files (*.axis), referenced by relative path.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Library Axes</em>' reference list.
	 * @see org.tracewell.model.TracewellPackage#getMachine_LibraryAxes()
	 * @model
	 * @generated
	 */
	EList<Axis> getLibraryAxes();

	/**
	 * Returns the value of the '<em><b>Contours</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.Contour}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Contours</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getMachine_Contours()
	 * @model containment="true"
	 * @generated
	 */
	EList<Contour> getContours();

	/**
	 * Returns the value of the '<em><b>Requirements</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.Requirement}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Requirements</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getMachine_Requirements()
	 * @model containment="true"
	 * @generated
	 */
	EList<Requirement> getRequirements();

	/**
	 * Returns the value of the '<em><b>Budget Lines</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.BudgetLine}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Budget Lines</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getMachine_BudgetLines()
	 * @model containment="true"
	 * @generated
	 */
	EList<BudgetLine> getBudgetLines();

	/**
	 * Returns the value of the '<em><b>Studies</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.VariationStudy}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Sweeps and Monte-Carlo tolerance studies the machine asks for; run on request, never by a plain analysis.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Studies</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getMachine_Studies()
	 * @model containment="true"
	 * @generated
	 */
	EList<VariationStudy> getStudies();

} // Machine
