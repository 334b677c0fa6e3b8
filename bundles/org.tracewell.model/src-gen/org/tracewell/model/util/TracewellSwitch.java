/**
 */
package org.tracewell.model.util;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.util.Switch;

import org.tracewell.model.*;

/**
 * <!-- begin-user-doc -->
 * The <b>Switch</b> for the model's inheritance hierarchy.
 * It supports the call {@link #doSwitch(EObject) doSwitch(object)}
 * to invoke the <code>caseXXX</code> method for each class of the model,
 * starting with the actual class of the object
 * and proceeding up the inheritance hierarchy
 * until a non-null result is returned,
 * which is the result of the switch.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage
 * @generated
 */
public class TracewellSwitch<T> extends Switch<T> {
	/**
	 * The cached model package
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static TracewellPackage modelPackage;

	/**
	 * Creates an instance of the switch.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TracewellSwitch() {
		if (modelPackage == null) {
			modelPackage = TracewellPackage.eINSTANCE;
		}
	}

	/**
	 * Checks whether this is a switch for the given package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param ePackage the package in question.
	 * @return whether this is a switch for the given package.
	 * @generated
	 */
	@Override
	protected boolean isSwitchFor(EPackage ePackage) {
		return ePackage == modelPackage;
	}

	/**
	 * Calls <code>caseXXX</code> for each class of the model until one returns a non null result; it yields that result.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the first non-null result returned by a <code>caseXXX</code> call.
	 * @generated
	 */
	@Override
	protected T doSwitch(int classifierID, EObject theEObject) {
		switch (classifierID) {
			case TracewellPackage.IDENTIFIED: {
				Identified identified = (Identified)theEObject;
				T result = caseIdentified(identified);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.NAMED: {
				Named named = (Named)theEObject;
				T result = caseNamed(named);
				if (result == null) result = caseIdentified(named);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.MACHINE: {
				Machine machine = (Machine)theEObject;
				T result = caseMachine(machine);
				if (result == null) result = caseNamed(machine);
				if (result == null) result = caseIdentified(machine);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.AXIS: {
				Axis axis = (Axis)theEObject;
				T result = caseAxis(axis);
				if (result == null) result = caseNamed(axis);
				if (result == null) result = caseIdentified(axis);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.PLANT: {
				Plant plant = (Plant)theEObject;
				T result = casePlant(plant);
				if (result == null) result = caseIdentified(plant);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.MOTOR_DRIVEN_PLANT: {
				MotorDrivenPlant motorDrivenPlant = (MotorDrivenPlant)theEObject;
				T result = caseMotorDrivenPlant(motorDrivenPlant);
				if (result == null) result = casePlant(motorDrivenPlant);
				if (result == null) result = caseIdentified(motorDrivenPlant);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.RIGID_SCREW_DRIVE: {
				RigidScrewDrive rigidScrewDrive = (RigidScrewDrive)theEObject;
				T result = caseRigidScrewDrive(rigidScrewDrive);
				if (result == null) result = caseMotorDrivenPlant(rigidScrewDrive);
				if (result == null) result = casePlant(rigidScrewDrive);
				if (result == null) result = caseIdentified(rigidScrewDrive);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.TWO_MASS_DRIVE: {
				TwoMassDrive twoMassDrive = (TwoMassDrive)theEObject;
				T result = caseTwoMassDrive(twoMassDrive);
				if (result == null) result = caseRigidScrewDrive(twoMassDrive);
				if (result == null) result = caseMotorDrivenPlant(twoMassDrive);
				if (result == null) result = casePlant(twoMassDrive);
				if (result == null) result = caseIdentified(twoMassDrive);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.RACK_PINION_DRIVE: {
				RackPinionDrive rackPinionDrive = (RackPinionDrive)theEObject;
				T result = caseRackPinionDrive(rackPinionDrive);
				if (result == null) result = caseMotorDrivenPlant(rackPinionDrive);
				if (result == null) result = casePlant(rackPinionDrive);
				if (result == null) result = caseIdentified(rackPinionDrive);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.DIRECT_DRIVE: {
				DirectDrive directDrive = (DirectDrive)theEObject;
				T result = caseDirectDrive(directDrive);
				if (result == null) result = caseMotorDrivenPlant(directDrive);
				if (result == null) result = casePlant(directDrive);
				if (result == null) result = caseIdentified(directDrive);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.ROTARY_TABLE: {
				RotaryTable rotaryTable = (RotaryTable)theEObject;
				T result = caseRotaryTable(rotaryTable);
				if (result == null) result = caseMotorDrivenPlant(rotaryTable);
				if (result == null) result = casePlant(rotaryTable);
				if (result == null) result = caseIdentified(rotaryTable);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.TRANSFER_FUNCTION_PLANT: {
				TransferFunctionPlant transferFunctionPlant = (TransferFunctionPlant)theEObject;
				T result = caseTransferFunctionPlant(transferFunctionPlant);
				if (result == null) result = casePlant(transferFunctionPlant);
				if (result == null) result = caseIdentified(transferFunctionPlant);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.CONTROLLER: {
				Controller controller = (Controller)theEObject;
				T result = caseController(controller);
				if (result == null) result = caseIdentified(controller);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.CASCADE_CONTROLLER: {
				CascadeController cascadeController = (CascadeController)theEObject;
				T result = caseCascadeController(cascadeController);
				if (result == null) result = caseController(cascadeController);
				if (result == null) result = caseIdentified(cascadeController);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.PID_CONTROLLER: {
				PidController pidController = (PidController)theEObject;
				T result = casePidController(pidController);
				if (result == null) result = caseController(pidController);
				if (result == null) result = caseIdentified(pidController);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER: {
				TransferFunctionController transferFunctionController = (TransferFunctionController)theEObject;
				T result = caseTransferFunctionController(transferFunctionController);
				if (result == null) result = caseController(transferFunctionController);
				if (result == null) result = caseIdentified(transferFunctionController);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.FILTER_STAGE: {
				FilterStage filterStage = (FilterStage)theEObject;
				T result = caseFilterStage(filterStage);
				if (result == null) result = caseIdentified(filterStage);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.LOW_PASS_FILTER: {
				LowPassFilter lowPassFilter = (LowPassFilter)theEObject;
				T result = caseLowPassFilter(lowPassFilter);
				if (result == null) result = caseFilterStage(lowPassFilter);
				if (result == null) result = caseIdentified(lowPassFilter);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.NOTCH_FILTER: {
				NotchFilter notchFilter = (NotchFilter)theEObject;
				T result = caseNotchFilter(notchFilter);
				if (result == null) result = caseFilterStage(notchFilter);
				if (result == null) result = caseIdentified(notchFilter);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.LEAD_LAG_FILTER: {
				LeadLagFilter leadLagFilter = (LeadLagFilter)theEObject;
				T result = caseLeadLagFilter(leadLagFilter);
				if (result == null) result = caseFilterStage(leadLagFilter);
				if (result == null) result = caseIdentified(leadLagFilter);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.ENCODER: {
				Encoder encoder = (Encoder)theEObject;
				T result = caseEncoder(encoder);
				if (result == null) result = caseIdentified(encoder);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.CONTOUR: {
				Contour contour = (Contour)theEObject;
				T result = caseContour(contour);
				if (result == null) result = caseNamed(contour);
				if (result == null) result = caseIdentified(contour);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.SEGMENT: {
				Segment segment = (Segment)theEObject;
				T result = caseSegment(segment);
				if (result == null) result = caseIdentified(segment);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.LINE: {
				Line line = (Line)theEObject;
				T result = caseLine(line);
				if (result == null) result = caseSegment(line);
				if (result == null) result = caseIdentified(line);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.ARC: {
				Arc arc = (Arc)theEObject;
				T result = caseArc(arc);
				if (result == null) result = caseSegment(arc);
				if (result == null) result = caseIdentified(arc);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.FULL_CIRCLE: {
				FullCircle fullCircle = (FullCircle)theEObject;
				T result = caseFullCircle(fullCircle);
				if (result == null) result = caseSegment(fullCircle);
				if (result == null) result = caseIdentified(fullCircle);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.CORNER: {
				Corner corner = (Corner)theEObject;
				T result = caseCorner(corner);
				if (result == null) result = caseSegment(corner);
				if (result == null) result = caseIdentified(corner);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.REQUIREMENT: {
				Requirement requirement = (Requirement)theEObject;
				T result = caseRequirement(requirement);
				if (result == null) result = caseIdentified(requirement);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.BUDGET_LINE: {
				BudgetLine budgetLine = (BudgetLine)theEObject;
				T result = caseBudgetLine(budgetLine);
				if (result == null) result = caseIdentified(budgetLine);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.VARIATION_STUDY: {
				VariationStudy variationStudy = (VariationStudy)theEObject;
				T result = caseVariationStudy(variationStudy);
				if (result == null) result = caseNamed(variationStudy);
				if (result == null) result = caseIdentified(variationStudy);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			case TracewellPackage.VARIED_PARAMETER: {
				VariedParameter variedParameter = (VariedParameter)theEObject;
				T result = caseVariedParameter(variedParameter);
				if (result == null) result = caseIdentified(variedParameter);
				if (result == null) result = defaultCase(theEObject);
				return result;
			}
			default: return defaultCase(theEObject);
		}
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Identified</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Identified</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseIdentified(Identified object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Named</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Named</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseNamed(Named object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Machine</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Machine</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseMachine(Machine object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Axis</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Axis</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseAxis(Axis object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Plant</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Plant</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T casePlant(Plant object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Motor Driven Plant</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Motor Driven Plant</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseMotorDrivenPlant(MotorDrivenPlant object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Rigid Screw Drive</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Rigid Screw Drive</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseRigidScrewDrive(RigidScrewDrive object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Two Mass Drive</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Two Mass Drive</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseTwoMassDrive(TwoMassDrive object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Rack Pinion Drive</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Rack Pinion Drive</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseRackPinionDrive(RackPinionDrive object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Direct Drive</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Direct Drive</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseDirectDrive(DirectDrive object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Rotary Table</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Rotary Table</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseRotaryTable(RotaryTable object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Transfer Function Plant</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Transfer Function Plant</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseTransferFunctionPlant(TransferFunctionPlant object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Controller</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Controller</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseController(Controller object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Cascade Controller</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Cascade Controller</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseCascadeController(CascadeController object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Pid Controller</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Pid Controller</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T casePidController(PidController object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Transfer Function Controller</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Transfer Function Controller</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseTransferFunctionController(TransferFunctionController object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Filter Stage</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Filter Stage</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseFilterStage(FilterStage object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Low Pass Filter</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Low Pass Filter</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseLowPassFilter(LowPassFilter object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Notch Filter</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Notch Filter</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseNotchFilter(NotchFilter object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Lead Lag Filter</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Lead Lag Filter</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseLeadLagFilter(LeadLagFilter object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Encoder</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Encoder</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseEncoder(Encoder object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Contour</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Contour</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseContour(Contour object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Segment</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Segment</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseSegment(Segment object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Line</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Line</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseLine(Line object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Arc</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Arc</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseArc(Arc object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Full Circle</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Full Circle</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseFullCircle(FullCircle object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Corner</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Corner</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseCorner(Corner object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Requirement</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Requirement</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseRequirement(Requirement object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Budget Line</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Budget Line</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseBudgetLine(BudgetLine object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Variation Study</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Variation Study</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseVariationStudy(VariationStudy object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>Varied Parameter</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>Varied Parameter</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject) doSwitch(EObject)
	 * @generated
	 */
	public T caseVariedParameter(VariedParameter object) {
		return null;
	}

	/**
	 * Returns the result of interpreting the object as an instance of '<em>EObject</em>'.
	 * <!-- begin-user-doc -->
	 * This implementation returns null;
	 * returning a non-null result will terminate the switch, but this is the last case anyway.
	 * <!-- end-user-doc -->
	 * @param object the target of the switch.
	 * @return the result of interpreting the object as an instance of '<em>EObject</em>'.
	 * @see #doSwitch(org.eclipse.emf.ecore.EObject)
	 * @generated
	 */
	@Override
	public T defaultCase(EObject object) {
		return null;
	}

} //TracewellSwitch
