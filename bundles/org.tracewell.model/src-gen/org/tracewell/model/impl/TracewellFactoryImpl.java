/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EDataType;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EPackage;

import org.eclipse.emf.ecore.impl.EFactoryImpl;

import org.eclipse.emf.ecore.plugin.EcorePlugin;

import org.tracewell.model.*;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Factory</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class TracewellFactoryImpl extends EFactoryImpl implements TracewellFactory {
	/**
	 * Creates the default factory implementation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static TracewellFactory init() {
		try {
			TracewellFactory theTracewellFactory = (TracewellFactory)EPackage.Registry.INSTANCE.getEFactory(TracewellPackage.eNS_URI);
			if (theTracewellFactory != null) {
				return theTracewellFactory;
			}
		}
		catch (Exception exception) {
			EcorePlugin.INSTANCE.log(exception);
		}
		return new TracewellFactoryImpl();
	}

	/**
	 * Creates an instance of the factory.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public TracewellFactoryImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EObject create(EClass eClass) {
		switch (eClass.getClassifierID()) {
			case TracewellPackage.MACHINE: return createMachine();
			case TracewellPackage.AXIS: return createAxis();
			case TracewellPackage.RIGID_SCREW_DRIVE: return createRigidScrewDrive();
			case TracewellPackage.TWO_MASS_DRIVE: return createTwoMassDrive();
			case TracewellPackage.RACK_PINION_DRIVE: return createRackPinionDrive();
			case TracewellPackage.DIRECT_DRIVE: return createDirectDrive();
			case TracewellPackage.ROTARY_TABLE: return createRotaryTable();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT: return createTransferFunctionPlant();
			case TracewellPackage.CASCADE_CONTROLLER: return createCascadeController();
			case TracewellPackage.PID_CONTROLLER: return createPidController();
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER: return createTransferFunctionController();
			case TracewellPackage.LOW_PASS_FILTER: return createLowPassFilter();
			case TracewellPackage.NOTCH_FILTER: return createNotchFilter();
			case TracewellPackage.LEAD_LAG_FILTER: return createLeadLagFilter();
			case TracewellPackage.ENCODER: return createEncoder();
			case TracewellPackage.CONTOUR: return createContour();
			case TracewellPackage.LINE: return createLine();
			case TracewellPackage.ARC: return createArc();
			case TracewellPackage.FULL_CIRCLE: return createFullCircle();
			case TracewellPackage.CORNER: return createCorner();
			case TracewellPackage.REQUIREMENT: return createRequirement();
			case TracewellPackage.BUDGET_LINE: return createBudgetLine();
			case TracewellPackage.VARIATION_STUDY: return createVariationStudy();
			case TracewellPackage.VARIED_PARAMETER: return createVariedParameter();
			default:
				throw new IllegalArgumentException("The class '" + eClass.getName() + "' is not a valid classifier"); //$NON-NLS-1$ //$NON-NLS-2$
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object createFromString(EDataType eDataType, String initialValue) {
		switch (eDataType.getClassifierID()) {
			case TracewellPackage.AXIS_KIND:
				return createAxisKindFromString(eDataType, initialValue);
			case TracewellPackage.SCREW_MOUNTING:
				return createScrewMountingFromString(eDataType, initialValue);
			case TracewellPackage.LOW_PASS_ORDER:
				return createLowPassOrderFromString(eDataType, initialValue);
			case TracewellPackage.ENCODER_SIDE:
				return createEncoderSideFromString(eDataType, initialValue);
			case TracewellPackage.DIRECTION:
				return createDirectionFromString(eDataType, initialValue);
			case TracewellPackage.CORNER_KIND:
				return createCornerKindFromString(eDataType, initialValue);
			case TracewellPackage.REQUIREMENT_KIND:
				return createRequirementKindFromString(eDataType, initialValue);
			case TracewellPackage.CONTOUR_METRIC:
				return createContourMetricFromString(eDataType, initialValue);
			case TracewellPackage.LIMIT_BOUND:
				return createLimitBoundFromString(eDataType, initialValue);
			case TracewellPackage.BUDGET_SOURCE:
				return createBudgetSourceFromString(eDataType, initialValue);
			case TracewellPackage.VALUE_ORIGIN:
				return createValueOriginFromString(eDataType, initialValue);
			case TracewellPackage.ERROR_CLASS:
				return createErrorClassFromString(eDataType, initialValue);
			case TracewellPackage.DISTRIBUTION:
				return createDistributionFromString(eDataType, initialValue);
			case TracewellPackage.STUDY_KIND:
				return createStudyKindFromString(eDataType, initialValue);
			case TracewellPackage.TOLERANCE_SHAPE:
				return createToleranceShapeFromString(eDataType, initialValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier"); //$NON-NLS-1$ //$NON-NLS-2$
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String convertToString(EDataType eDataType, Object instanceValue) {
		switch (eDataType.getClassifierID()) {
			case TracewellPackage.AXIS_KIND:
				return convertAxisKindToString(eDataType, instanceValue);
			case TracewellPackage.SCREW_MOUNTING:
				return convertScrewMountingToString(eDataType, instanceValue);
			case TracewellPackage.LOW_PASS_ORDER:
				return convertLowPassOrderToString(eDataType, instanceValue);
			case TracewellPackage.ENCODER_SIDE:
				return convertEncoderSideToString(eDataType, instanceValue);
			case TracewellPackage.DIRECTION:
				return convertDirectionToString(eDataType, instanceValue);
			case TracewellPackage.CORNER_KIND:
				return convertCornerKindToString(eDataType, instanceValue);
			case TracewellPackage.REQUIREMENT_KIND:
				return convertRequirementKindToString(eDataType, instanceValue);
			case TracewellPackage.CONTOUR_METRIC:
				return convertContourMetricToString(eDataType, instanceValue);
			case TracewellPackage.LIMIT_BOUND:
				return convertLimitBoundToString(eDataType, instanceValue);
			case TracewellPackage.BUDGET_SOURCE:
				return convertBudgetSourceToString(eDataType, instanceValue);
			case TracewellPackage.VALUE_ORIGIN:
				return convertValueOriginToString(eDataType, instanceValue);
			case TracewellPackage.ERROR_CLASS:
				return convertErrorClassToString(eDataType, instanceValue);
			case TracewellPackage.DISTRIBUTION:
				return convertDistributionToString(eDataType, instanceValue);
			case TracewellPackage.STUDY_KIND:
				return convertStudyKindToString(eDataType, instanceValue);
			case TracewellPackage.TOLERANCE_SHAPE:
				return convertToleranceShapeToString(eDataType, instanceValue);
			default:
				throw new IllegalArgumentException("The datatype '" + eDataType.getName() + "' is not a valid classifier"); //$NON-NLS-1$ //$NON-NLS-2$
		}
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Machine createMachine() {
		MachineImpl machine = new MachineImpl();
		return machine;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Axis createAxis() {
		AxisImpl axis = new AxisImpl();
		return axis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RigidScrewDrive createRigidScrewDrive() {
		RigidScrewDriveImpl rigidScrewDrive = new RigidScrewDriveImpl();
		return rigidScrewDrive;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TwoMassDrive createTwoMassDrive() {
		TwoMassDriveImpl twoMassDrive = new TwoMassDriveImpl();
		return twoMassDrive;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RackPinionDrive createRackPinionDrive() {
		RackPinionDriveImpl rackPinionDrive = new RackPinionDriveImpl();
		return rackPinionDrive;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public DirectDrive createDirectDrive() {
		DirectDriveImpl directDrive = new DirectDriveImpl();
		return directDrive;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RotaryTable createRotaryTable() {
		RotaryTableImpl rotaryTable = new RotaryTableImpl();
		return rotaryTable;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TransferFunctionPlant createTransferFunctionPlant() {
		TransferFunctionPlantImpl transferFunctionPlant = new TransferFunctionPlantImpl();
		return transferFunctionPlant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public CascadeController createCascadeController() {
		CascadeControllerImpl cascadeController = new CascadeControllerImpl();
		return cascadeController;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public PidController createPidController() {
		PidControllerImpl pidController = new PidControllerImpl();
		return pidController;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TransferFunctionController createTransferFunctionController() {
		TransferFunctionControllerImpl transferFunctionController = new TransferFunctionControllerImpl();
		return transferFunctionController;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LowPassFilter createLowPassFilter() {
		LowPassFilterImpl lowPassFilter = new LowPassFilterImpl();
		return lowPassFilter;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotchFilter createNotchFilter() {
		NotchFilterImpl notchFilter = new NotchFilterImpl();
		return notchFilter;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LeadLagFilter createLeadLagFilter() {
		LeadLagFilterImpl leadLagFilter = new LeadLagFilterImpl();
		return leadLagFilter;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Encoder createEncoder() {
		EncoderImpl encoder = new EncoderImpl();
		return encoder;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Contour createContour() {
		ContourImpl contour = new ContourImpl();
		return contour;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Line createLine() {
		LineImpl line = new LineImpl();
		return line;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Arc createArc() {
		ArcImpl arc = new ArcImpl();
		return arc;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public FullCircle createFullCircle() {
		FullCircleImpl fullCircle = new FullCircleImpl();
		return fullCircle;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Corner createCorner() {
		CornerImpl corner = new CornerImpl();
		return corner;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Requirement createRequirement() {
		RequirementImpl requirement = new RequirementImpl();
		return requirement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public BudgetLine createBudgetLine() {
		BudgetLineImpl budgetLine = new BudgetLineImpl();
		return budgetLine;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public VariationStudy createVariationStudy() {
		VariationStudyImpl variationStudy = new VariationStudyImpl();
		return variationStudy;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public VariedParameter createVariedParameter() {
		VariedParameterImpl variedParameter = new VariedParameterImpl();
		return variedParameter;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public AxisKind createAxisKindFromString(EDataType eDataType, String initialValue) {
		AxisKind result = AxisKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertAxisKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ScrewMounting createScrewMountingFromString(EDataType eDataType, String initialValue) {
		ScrewMounting result = ScrewMounting.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertScrewMountingToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LowPassOrder createLowPassOrderFromString(EDataType eDataType, String initialValue) {
		LowPassOrder result = LowPassOrder.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertLowPassOrderToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public EncoderSide createEncoderSideFromString(EDataType eDataType, String initialValue) {
		EncoderSide result = EncoderSide.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertEncoderSideToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Direction createDirectionFromString(EDataType eDataType, String initialValue) {
		Direction result = Direction.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertDirectionToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public CornerKind createCornerKindFromString(EDataType eDataType, String initialValue) {
		CornerKind result = CornerKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertCornerKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public RequirementKind createRequirementKindFromString(EDataType eDataType, String initialValue) {
		RequirementKind result = RequirementKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertRequirementKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ContourMetric createContourMetricFromString(EDataType eDataType, String initialValue) {
		ContourMetric result = ContourMetric.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertContourMetricToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public LimitBound createLimitBoundFromString(EDataType eDataType, String initialValue) {
		LimitBound result = LimitBound.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertLimitBoundToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public BudgetSource createBudgetSourceFromString(EDataType eDataType, String initialValue) {
		BudgetSource result = BudgetSource.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertBudgetSourceToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ValueOrigin createValueOriginFromString(EDataType eDataType, String initialValue) {
		ValueOrigin result = ValueOrigin.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertValueOriginToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ErrorClass createErrorClassFromString(EDataType eDataType, String initialValue) {
		ErrorClass result = ErrorClass.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertErrorClassToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Distribution createDistributionFromString(EDataType eDataType, String initialValue) {
		Distribution result = Distribution.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertDistributionToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public StudyKind createStudyKindFromString(EDataType eDataType, String initialValue) {
		StudyKind result = StudyKind.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertStudyKindToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public ToleranceShape createToleranceShapeFromString(EDataType eDataType, String initialValue) {
		ToleranceShape result = ToleranceShape.get(initialValue);
		if (result == null) throw new IllegalArgumentException("The value '" + initialValue + "' is not a valid enumerator of '" + eDataType.getName() + "'"); //$NON-NLS-1$ //$NON-NLS-2$ //$NON-NLS-3$
		return result;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public String convertToleranceShapeToString(EDataType eDataType, Object instanceValue) {
		return instanceValue == null ? null : instanceValue.toString();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TracewellPackage getTracewellPackage() {
		return (TracewellPackage)getEPackage();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @deprecated
	 * @generated
	 */
	@Deprecated
	public static TracewellPackage getPackage() {
		return TracewellPackage.eINSTANCE;
	}

} //TracewellFactoryImpl
