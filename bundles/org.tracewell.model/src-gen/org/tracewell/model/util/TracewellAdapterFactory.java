/**
 */
package org.tracewell.model.util;

import org.eclipse.emf.common.notify.Adapter;
import org.eclipse.emf.common.notify.Notifier;

import org.eclipse.emf.common.notify.impl.AdapterFactoryImpl;

import org.eclipse.emf.ecore.EObject;

import org.tracewell.model.*;

/**
 * <!-- begin-user-doc -->
 * The <b>Adapter Factory</b> for the model.
 * It provides an adapter <code>createXXX</code> method for each class of the model.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage
 * @generated
 */
public class TracewellAdapterFactory extends AdapterFactoryImpl {
	/**
	 * The cached model package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected static TracewellPackage modelPackage;

	/**
	 * Creates an instance of the adapter factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TracewellAdapterFactory() {
		if (modelPackage == null) {
			modelPackage = TracewellPackage.eINSTANCE;
		}
	}

	/**
	 * Returns whether this factory is applicable for the type of the object.
	 * <!-- begin-user-doc -->
	 * This implementation returns <code>true</code> if the object is either the model's package or is an instance object of the model.
	 * <!-- end-user-doc -->
	 * @return whether this factory is applicable for the type of the object.
	 * @generated
	 */
	@Override
	public boolean isFactoryForType(Object object) {
		if (object == modelPackage) {
			return true;
		}
		if (object instanceof EObject) {
			return ((EObject)object).eClass().getEPackage() == modelPackage;
		}
		return false;
	}

	/**
	 * The switch that delegates to the <code>createXXX</code> methods.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TracewellSwitch<Adapter> modelSwitch =
		new TracewellSwitch<Adapter>() {
			@Override
			public Adapter caseIdentified(Identified object) {
				return createIdentifiedAdapter();
			}
			@Override
			public Adapter caseNamed(Named object) {
				return createNamedAdapter();
			}
			@Override
			public Adapter caseMachine(Machine object) {
				return createMachineAdapter();
			}
			@Override
			public Adapter caseAxis(Axis object) {
				return createAxisAdapter();
			}
			@Override
			public Adapter casePlant(Plant object) {
				return createPlantAdapter();
			}
			@Override
			public Adapter caseMotorDrivenPlant(MotorDrivenPlant object) {
				return createMotorDrivenPlantAdapter();
			}
			@Override
			public Adapter caseRigidScrewDrive(RigidScrewDrive object) {
				return createRigidScrewDriveAdapter();
			}
			@Override
			public Adapter caseTwoMassDrive(TwoMassDrive object) {
				return createTwoMassDriveAdapter();
			}
			@Override
			public Adapter caseRackPinionDrive(RackPinionDrive object) {
				return createRackPinionDriveAdapter();
			}
			@Override
			public Adapter caseDirectDrive(DirectDrive object) {
				return createDirectDriveAdapter();
			}
			@Override
			public Adapter caseRotaryTable(RotaryTable object) {
				return createRotaryTableAdapter();
			}
			@Override
			public Adapter caseTransferFunctionPlant(TransferFunctionPlant object) {
				return createTransferFunctionPlantAdapter();
			}
			@Override
			public Adapter caseController(Controller object) {
				return createControllerAdapter();
			}
			@Override
			public Adapter caseCascadeController(CascadeController object) {
				return createCascadeControllerAdapter();
			}
			@Override
			public Adapter casePidController(PidController object) {
				return createPidControllerAdapter();
			}
			@Override
			public Adapter caseTransferFunctionController(TransferFunctionController object) {
				return createTransferFunctionControllerAdapter();
			}
			@Override
			public Adapter caseFilterStage(FilterStage object) {
				return createFilterStageAdapter();
			}
			@Override
			public Adapter caseLowPassFilter(LowPassFilter object) {
				return createLowPassFilterAdapter();
			}
			@Override
			public Adapter caseNotchFilter(NotchFilter object) {
				return createNotchFilterAdapter();
			}
			@Override
			public Adapter caseLeadLagFilter(LeadLagFilter object) {
				return createLeadLagFilterAdapter();
			}
			@Override
			public Adapter caseEncoder(Encoder object) {
				return createEncoderAdapter();
			}
			@Override
			public Adapter caseContour(Contour object) {
				return createContourAdapter();
			}
			@Override
			public Adapter caseSegment(Segment object) {
				return createSegmentAdapter();
			}
			@Override
			public Adapter caseLine(Line object) {
				return createLineAdapter();
			}
			@Override
			public Adapter caseArc(Arc object) {
				return createArcAdapter();
			}
			@Override
			public Adapter caseFullCircle(FullCircle object) {
				return createFullCircleAdapter();
			}
			@Override
			public Adapter caseCorner(Corner object) {
				return createCornerAdapter();
			}
			@Override
			public Adapter caseRequirement(Requirement object) {
				return createRequirementAdapter();
			}
			@Override
			public Adapter caseBudgetLine(BudgetLine object) {
				return createBudgetLineAdapter();
			}
			@Override
			public Adapter caseVariationStudy(VariationStudy object) {
				return createVariationStudyAdapter();
			}
			@Override
			public Adapter caseVariedParameter(VariedParameter object) {
				return createVariedParameterAdapter();
			}
			@Override
			public Adapter defaultCase(EObject object) {
				return createEObjectAdapter();
			}
		};

	/**
	 * Creates an adapter for the <code>target</code>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param target the object to adapt.
	 * @return the adapter for the <code>target</code>.
	 * @generated
	 */
	@Override
	public Adapter createAdapter(Notifier target) {
		return modelSwitch.doSwitch((EObject)target);
	}


	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Identified <em>Identified</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Identified
	 * @generated
	 */
	public Adapter createIdentifiedAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Named <em>Named</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Named
	 * @generated
	 */
	public Adapter createNamedAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Machine <em>Machine</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Machine
	 * @generated
	 */
	public Adapter createMachineAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Axis <em>Axis</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Axis
	 * @generated
	 */
	public Adapter createAxisAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Plant <em>Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Plant
	 * @generated
	 */
	public Adapter createPlantAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.MotorDrivenPlant <em>Motor Driven Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.MotorDrivenPlant
	 * @generated
	 */
	public Adapter createMotorDrivenPlantAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.RigidScrewDrive <em>Rigid Screw Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.RigidScrewDrive
	 * @generated
	 */
	public Adapter createRigidScrewDriveAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.TwoMassDrive <em>Two Mass Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.TwoMassDrive
	 * @generated
	 */
	public Adapter createTwoMassDriveAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.RackPinionDrive <em>Rack Pinion Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.RackPinionDrive
	 * @generated
	 */
	public Adapter createRackPinionDriveAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.DirectDrive <em>Direct Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.DirectDrive
	 * @generated
	 */
	public Adapter createDirectDriveAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.RotaryTable <em>Rotary Table</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.RotaryTable
	 * @generated
	 */
	public Adapter createRotaryTableAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.TransferFunctionPlant <em>Transfer Function Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.TransferFunctionPlant
	 * @generated
	 */
	public Adapter createTransferFunctionPlantAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Controller <em>Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Controller
	 * @generated
	 */
	public Adapter createControllerAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.CascadeController <em>Cascade Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.CascadeController
	 * @generated
	 */
	public Adapter createCascadeControllerAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.PidController <em>Pid Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.PidController
	 * @generated
	 */
	public Adapter createPidControllerAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.TransferFunctionController <em>Transfer Function Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.TransferFunctionController
	 * @generated
	 */
	public Adapter createTransferFunctionControllerAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.FilterStage <em>Filter Stage</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.FilterStage
	 * @generated
	 */
	public Adapter createFilterStageAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.LowPassFilter <em>Low Pass Filter</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.LowPassFilter
	 * @generated
	 */
	public Adapter createLowPassFilterAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.NotchFilter <em>Notch Filter</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.NotchFilter
	 * @generated
	 */
	public Adapter createNotchFilterAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.LeadLagFilter <em>Lead Lag Filter</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.LeadLagFilter
	 * @generated
	 */
	public Adapter createLeadLagFilterAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Encoder <em>Encoder</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Encoder
	 * @generated
	 */
	public Adapter createEncoderAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Contour <em>Contour</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Contour
	 * @generated
	 */
	public Adapter createContourAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Segment <em>Segment</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Segment
	 * @generated
	 */
	public Adapter createSegmentAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Line <em>Line</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Line
	 * @generated
	 */
	public Adapter createLineAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Arc <em>Arc</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Arc
	 * @generated
	 */
	public Adapter createArcAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.FullCircle <em>Full Circle</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.FullCircle
	 * @generated
	 */
	public Adapter createFullCircleAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Corner <em>Corner</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Corner
	 * @generated
	 */
	public Adapter createCornerAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.Requirement <em>Requirement</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.Requirement
	 * @generated
	 */
	public Adapter createRequirementAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.BudgetLine <em>Budget Line</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.BudgetLine
	 * @generated
	 */
	public Adapter createBudgetLineAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.VariationStudy <em>Variation Study</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.VariationStudy
	 * @generated
	 */
	public Adapter createVariationStudyAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for an object of class '{@link org.tracewell.model.VariedParameter <em>Varied Parameter</em>}'.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null so that we can easily ignore cases;
	 * it's useful to ignore a case when inheritance will catch all the cases anyway.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @see org.tracewell.model.VariedParameter
	 * @generated
	 */
	public Adapter createVariedParameterAdapter() {
		return null;
	}

	/**
	 * Creates a new adapter for the default case.
	 * <!-- begin-user-doc -->
	 * This default implementation returns null.
	 * <!-- end-user-doc -->
	 * @return the new adapter.
	 * @generated
	 */
	public Adapter createEObjectAdapter() {
		return null;
	}

} //TracewellAdapterFactory
