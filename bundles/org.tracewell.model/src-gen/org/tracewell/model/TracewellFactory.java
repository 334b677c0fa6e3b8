/**
 */
package org.tracewell.model;

import org.eclipse.emf.ecore.EFactory;

/**
 * <!-- begin-user-doc -->
 * The <b>Factory</b> for the model.
 * It provides a create method for each non-abstract class of the model.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage
 * @generated
 */
public interface TracewellFactory extends EFactory {
	/**
	 * The singleton instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	TracewellFactory eINSTANCE = org.tracewell.model.impl.TracewellFactoryImpl.init();

	/**
	 * Returns a new object of class '<em>Machine</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Machine</em>'.
	 * @generated
	 */
	Machine createMachine();

	/**
	 * Returns a new object of class '<em>Axis</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Axis</em>'.
	 * @generated
	 */
	Axis createAxis();

	/**
	 * Returns a new object of class '<em>Rigid Screw Drive</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Rigid Screw Drive</em>'.
	 * @generated
	 */
	RigidScrewDrive createRigidScrewDrive();

	/**
	 * Returns a new object of class '<em>Two Mass Drive</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Two Mass Drive</em>'.
	 * @generated
	 */
	TwoMassDrive createTwoMassDrive();

	/**
	 * Returns a new object of class '<em>Rack Pinion Drive</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Rack Pinion Drive</em>'.
	 * @generated
	 */
	RackPinionDrive createRackPinionDrive();

	/**
	 * Returns a new object of class '<em>Direct Drive</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Direct Drive</em>'.
	 * @generated
	 */
	DirectDrive createDirectDrive();

	/**
	 * Returns a new object of class '<em>Rotary Table</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Rotary Table</em>'.
	 * @generated
	 */
	RotaryTable createRotaryTable();

	/**
	 * Returns a new object of class '<em>Transfer Function Plant</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Transfer Function Plant</em>'.
	 * @generated
	 */
	TransferFunctionPlant createTransferFunctionPlant();

	/**
	 * Returns a new object of class '<em>Cascade Controller</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Cascade Controller</em>'.
	 * @generated
	 */
	CascadeController createCascadeController();

	/**
	 * Returns a new object of class '<em>Pid Controller</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Pid Controller</em>'.
	 * @generated
	 */
	PidController createPidController();

	/**
	 * Returns a new object of class '<em>Transfer Function Controller</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Transfer Function Controller</em>'.
	 * @generated
	 */
	TransferFunctionController createTransferFunctionController();

	/**
	 * Returns a new object of class '<em>Low Pass Filter</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Low Pass Filter</em>'.
	 * @generated
	 */
	LowPassFilter createLowPassFilter();

	/**
	 * Returns a new object of class '<em>Notch Filter</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Notch Filter</em>'.
	 * @generated
	 */
	NotchFilter createNotchFilter();

	/**
	 * Returns a new object of class '<em>Lead Lag Filter</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Lead Lag Filter</em>'.
	 * @generated
	 */
	LeadLagFilter createLeadLagFilter();

	/**
	 * Returns a new object of class '<em>Encoder</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Encoder</em>'.
	 * @generated
	 */
	Encoder createEncoder();

	/**
	 * Returns a new object of class '<em>Contour</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Contour</em>'.
	 * @generated
	 */
	Contour createContour();

	/**
	 * Returns a new object of class '<em>Line</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Line</em>'.
	 * @generated
	 */
	Line createLine();

	/**
	 * Returns a new object of class '<em>Arc</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Arc</em>'.
	 * @generated
	 */
	Arc createArc();

	/**
	 * Returns a new object of class '<em>Full Circle</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Full Circle</em>'.
	 * @generated
	 */
	FullCircle createFullCircle();

	/**
	 * Returns a new object of class '<em>Corner</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Corner</em>'.
	 * @generated
	 */
	Corner createCorner();

	/**
	 * Returns a new object of class '<em>Requirement</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Requirement</em>'.
	 * @generated
	 */
	Requirement createRequirement();

	/**
	 * Returns a new object of class '<em>Budget Line</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Budget Line</em>'.
	 * @generated
	 */
	BudgetLine createBudgetLine();

	/**
	 * Returns a new object of class '<em>Variation Study</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Variation Study</em>'.
	 * @generated
	 */
	VariationStudy createVariationStudy();

	/**
	 * Returns a new object of class '<em>Varied Parameter</em>'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return a new object of class '<em>Varied Parameter</em>'.
	 * @generated
	 */
	VariedParameter createVariedParameter();

	/**
	 * Returns the package supported by this factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the package supported by this factory.
	 * @generated
	 */
	TracewellPackage getTracewellPackage();

} //TracewellFactory
