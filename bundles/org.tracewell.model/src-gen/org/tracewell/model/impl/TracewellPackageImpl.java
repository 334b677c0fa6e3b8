/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

import org.eclipse.emf.ecore.impl.EPackageImpl;

import org.tracewell.model.Arc;
import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.BudgetSource;
import org.tracewell.model.CascadeController;
import org.tracewell.model.Contour;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.Controller;
import org.tracewell.model.Corner;
import org.tracewell.model.CornerKind;
import org.tracewell.model.DirectDrive;
import org.tracewell.model.Direction;
import org.tracewell.model.Distribution;
import org.tracewell.model.Encoder;
import org.tracewell.model.EncoderSide;
import org.tracewell.model.ErrorClass;
import org.tracewell.model.FilterStage;
import org.tracewell.model.FullCircle;
import org.tracewell.model.Identified;
import org.tracewell.model.LeadLagFilter;
import org.tracewell.model.LimitBound;
import org.tracewell.model.Line;
import org.tracewell.model.LowPassFilter;
import org.tracewell.model.LowPassOrder;
import org.tracewell.model.Machine;
import org.tracewell.model.MotorDrivenPlant;
import org.tracewell.model.Named;
import org.tracewell.model.NotchFilter;
import org.tracewell.model.PidController;
import org.tracewell.model.Plant;
import org.tracewell.model.RackPinionDrive;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.RigidScrewDrive;
import org.tracewell.model.RotaryTable;
import org.tracewell.model.ScrewMounting;
import org.tracewell.model.Segment;
import org.tracewell.model.StudyKind;
import org.tracewell.model.ToleranceShape;
import org.tracewell.model.TracewellFactory;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.TransferFunctionController;
import org.tracewell.model.TransferFunctionPlant;
import org.tracewell.model.TwoMassDrive;
import org.tracewell.model.ValueOrigin;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model <b>Package</b>.
 * <!-- end-user-doc -->
 * @generated
 */
public class TracewellPackageImpl extends EPackageImpl implements TracewellPackage {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass identifiedEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass namedEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass machineEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass axisEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass plantEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass motorDrivenPlantEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass rigidScrewDriveEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass twoMassDriveEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass rackPinionDriveEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass directDriveEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass rotaryTableEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass transferFunctionPlantEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass controllerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass cascadeControllerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass pidControllerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass transferFunctionControllerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass filterStageEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass lowPassFilterEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass notchFilterEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass leadLagFilterEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass encoderEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass contourEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass segmentEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass lineEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass arcEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass fullCircleEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass cornerEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass requirementEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass budgetLineEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass variationStudyEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EClass variedParameterEClass = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum axisKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum screwMountingEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum lowPassOrderEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum encoderSideEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum directionEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum cornerKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum requirementKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum contourMetricEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum limitBoundEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum budgetSourceEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum valueOriginEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum errorClassEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum distributionEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum studyKindEEnum = null;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private EEnum toleranceShapeEEnum = null;

	/**
	 * Creates an instance of the model <b>Package</b>, registered with
	 * {@link org.eclipse.emf.ecore.EPackage.Registry EPackage.Registry} by the package
	 * package URI value.
	 * <p>Note: the correct way to create the package is via the static
	 * factory method {@link #init init()}, which also performs
	 * initialization of the package, or returns the registered package,
	 * if one already exists.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.eclipse.emf.ecore.EPackage.Registry
	 * @see org.tracewell.model.TracewellPackage#eNS_URI
	 * @see #init()
	 * @generated
	 */
	private TracewellPackageImpl() {
		super(eNS_URI, TracewellFactory.eINSTANCE);
	}
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static boolean isInited = false;

	/**
	 * Creates, registers, and initializes the <b>Package</b> for this model, and for any others upon which it depends.
	 *
	 * <p>This method is used to initialize {@link TracewellPackage#eINSTANCE} when that field is accessed.
	 * Clients should not invoke it directly. Instead, they should simply access that field to obtain the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #eNS_URI
	 * @see #createPackageContents()
	 * @see #initializePackageContents()
	 * @generated
	 */
	public static TracewellPackage init() {
		if (isInited) return (TracewellPackage)EPackage.Registry.INSTANCE.getEPackage(TracewellPackage.eNS_URI);

		// Obtain or create and register package
		Object registeredTracewellPackage = EPackage.Registry.INSTANCE.get(eNS_URI);
		TracewellPackageImpl theTracewellPackage = registeredTracewellPackage instanceof TracewellPackageImpl ? (TracewellPackageImpl)registeredTracewellPackage : new TracewellPackageImpl();

		isInited = true;

		// Create package meta-data objects
		theTracewellPackage.createPackageContents();

		// Initialize created meta-data
		theTracewellPackage.initializePackageContents();

		// Mark meta-data to indicate it can't be changed
		theTracewellPackage.freeze();

		// Update the registry and return the package
		EPackage.Registry.INSTANCE.put(TracewellPackage.eNS_URI, theTracewellPackage);
		return theTracewellPackage;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getIdentified() {
		return identifiedEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getIdentified_Id() {
		return (EAttribute)identifiedEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getNamed() {
		return namedEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getNamed_Name() {
		return (EAttribute)namedEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getNamed_Description() {
		return (EAttribute)namedEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getMachine() {
		return machineEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMachine_InterpolationPeriod() {
		return (EAttribute)machineEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMachine_Axes() {
		return (EReference)machineEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMachine_LibraryAxes() {
		return (EReference)machineEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMachine_Contours() {
		return (EReference)machineEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMachine_Requirements() {
		return (EReference)machineEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMachine_BudgetLines() {
		return (EReference)machineEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getMachine_Studies() {
		return (EReference)machineEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getAxis() {
		return axisEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAxis_Kind() {
		return (EAttribute)axisEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getAxis_Plant() {
		return (EReference)axisEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getAxis_Controller() {
		return (EReference)axisEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getAxis_Encoder() {
		return (EReference)axisEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAxis_MaxVelocity() {
		return (EAttribute)axisEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAxis_MaxAcceleration() {
		return (EAttribute)axisEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getAxis_MaxJerk() {
		return (EAttribute)axisEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getAxis_GantryPartner() {
		return (EReference)axisEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getPlant() {
		return plantEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getMotorDrivenPlant() {
		return motorDrivenPlantEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMotorDrivenPlant_CurrentLoopBandwidth() {
		return (EAttribute)motorDrivenPlantEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMotorDrivenPlant_ViscousFriction() {
		return (EAttribute)motorDrivenPlantEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getMotorDrivenPlant_CoulombFriction() {
		return (EAttribute)motorDrivenPlantEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRigidScrewDrive() {
		return rigidScrewDriveEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRigidScrewDrive_MotorInertia() {
		return (EAttribute)rigidScrewDriveEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRigidScrewDrive_ScrewInertia() {
		return (EAttribute)rigidScrewDriveEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRigidScrewDrive_LoadMass() {
		return (EAttribute)rigidScrewDriveEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRigidScrewDrive_Lead() {
		return (EAttribute)rigidScrewDriveEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRigidScrewDrive_GearRatio() {
		return (EAttribute)rigidScrewDriveEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRigidScrewDrive_TorqueConstant() {
		return (EAttribute)rigidScrewDriveEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTwoMassDrive() {
		return twoMassDriveEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_ScrewRootDiameter() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_ScrewMounting() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_BearingSpan() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_NutStiffness() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_BearingStiffness() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_DampingRatio() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_NutPositionMin() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTwoMassDrive_NutPositionMax() {
		return (EAttribute)twoMassDriveEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRackPinionDrive() {
		return rackPinionDriveEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_MotorInertia() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_GearboxInertia() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_PinionRadius() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_GearRatio() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_LoadMass() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_TorqueConstant() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRackPinionDrive_DrivetrainStiffness() {
		return (EAttribute)rackPinionDriveEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getDirectDrive() {
		return directDriveEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getDirectDrive_MovingMass() {
		return (EAttribute)directDriveEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getDirectDrive_ForceConstant() {
		return (EAttribute)directDriveEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRotaryTable() {
		return rotaryTableEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRotaryTable_MotorInertia() {
		return (EAttribute)rotaryTableEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRotaryTable_TableInertia() {
		return (EAttribute)rotaryTableEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRotaryTable_GearRatio() {
		return (EAttribute)rotaryTableEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRotaryTable_TorqueConstant() {
		return (EAttribute)rotaryTableEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRotaryTable_TorsionalStiffness() {
		return (EAttribute)rotaryTableEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTransferFunctionPlant() {
		return transferFunctionPlantEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_Numerator() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_Denominator() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_DeadTime() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_Ratio() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_EquivalentInertia() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_TorqueConstant() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionPlant_CurrentLoopBandwidth() {
		return (EAttribute)transferFunctionPlantEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getController() {
		return controllerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getCascadeController() {
		return cascadeControllerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_PositionGain() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_VelocityGain() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_VelocityIntegralTime() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_VelocityFeedforward() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_AccelerationFeedforward() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getCascadeController_FilterStages() {
		return (EReference)cascadeControllerEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_PositionSamplePeriod() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCascadeController_VelocitySamplePeriod() {
		return (EAttribute)cascadeControllerEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getPidController() {
		return pidControllerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPidController_ProportionalGain() {
		return (EAttribute)pidControllerEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPidController_IntegralGain() {
		return (EAttribute)pidControllerEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPidController_DerivativeGain() {
		return (EAttribute)pidControllerEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPidController_DerivativeFilterTime() {
		return (EAttribute)pidControllerEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getPidController_SamplePeriod() {
		return (EAttribute)pidControllerEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getTransferFunctionController() {
		return transferFunctionControllerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionController_Numerator() {
		return (EAttribute)transferFunctionControllerEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionController_Denominator() {
		return (EAttribute)transferFunctionControllerEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getTransferFunctionController_SamplePeriod() {
		return (EAttribute)transferFunctionControllerEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getFilterStage() {
		return filterStageEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getLowPassFilter() {
		return lowPassFilterEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLowPassFilter_Order() {
		return (EAttribute)lowPassFilterEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLowPassFilter_CutoffFrequency() {
		return (EAttribute)lowPassFilterEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLowPassFilter_DampingRatio() {
		return (EAttribute)lowPassFilterEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getNotchFilter() {
		return notchFilterEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getNotchFilter_CentreFrequency() {
		return (EAttribute)notchFilterEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getNotchFilter_Width() {
		return (EAttribute)notchFilterEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getNotchFilter_Depth() {
		return (EAttribute)notchFilterEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getLeadLagFilter() {
		return leadLagFilterEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLeadLagFilter_ZeroFrequency() {
		return (EAttribute)leadLagFilterEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLeadLagFilter_PoleFrequency() {
		return (EAttribute)leadLagFilterEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getEncoder() {
		return encoderEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getEncoder_Side() {
		return (EAttribute)encoderEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getEncoder_LinearResolution() {
		return (EAttribute)encoderEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getEncoder_CountsPerRevolution() {
		return (EAttribute)encoderEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getContour() {
		return contourEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContour_Feed() {
		return (EAttribute)contourEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContour_PathAcceleration() {
		return (EAttribute)contourEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContour_PathJerk() {
		return (EAttribute)contourEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContour_SamplePeriod() {
		return (EAttribute)contourEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContour_StartX() {
		return (EAttribute)contourEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getContour_StartY() {
		return (EAttribute)contourEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getContour_AxisAssignment() {
		return (EReference)contourEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getContour_Segments() {
		return (EReference)contourEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getSegment() {
		return segmentEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getLine() {
		return lineEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLine_EndX() {
		return (EAttribute)lineEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getLine_EndY() {
		return (EAttribute)lineEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getArc() {
		return arcEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getArc_EndX() {
		return (EAttribute)arcEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getArc_EndY() {
		return (EAttribute)arcEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getArc_CentreX() {
		return (EAttribute)arcEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getArc_CentreY() {
		return (EAttribute)arcEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getArc_Direction() {
		return (EAttribute)arcEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getFullCircle() {
		return fullCircleEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFullCircle_CentreX() {
		return (EAttribute)fullCircleEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFullCircle_CentreY() {
		return (EAttribute)fullCircleEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getFullCircle_Direction() {
		return (EAttribute)fullCircleEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getCorner() {
		return cornerEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCorner_Kind() {
		return (EAttribute)cornerEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getCorner_RoundingTolerance() {
		return (EAttribute)cornerEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getRequirement() {
		return requirementEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_Statement() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_Kind() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_Metric() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRequirement_Contours() {
		return (EReference)requirementEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_Bound() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_Limit() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_DisplayUnit() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRequirement_Parent() {
		return (EReference)requirementEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getRequirement_AllocatedAxis() {
		return (EReference)requirementEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getRequirement_Rationale() {
		return (EAttribute)requirementEClass.getEStructuralFeatures().get(9);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getBudgetLine() {
		return budgetLineEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Name() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getBudgetLine_Axis() {
		return (EReference)budgetLineEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Source() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Value() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Origin() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_ErrorClass() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Distribution() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Sensitivity() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getBudgetLine_Evidence() {
		return (EAttribute)budgetLineEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getVariationStudy() {
		return variationStudyEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariationStudy_Kind() {
		return (EAttribute)variationStudyEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariationStudy_VariantCount() {
		return (EAttribute)variationStudyEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariationStudy_Seed() {
		return (EAttribute)variationStudyEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariationStudy_WorstVariantCount() {
		return (EAttribute)variationStudyEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariationStudy_Metrics() {
		return (EAttribute)variationStudyEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EReference getVariationStudy_Parameters() {
		return (EReference)variationStudyEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EClass getVariedParameter() {
		return variedParameterEClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_Path() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(0);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_Shape() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(1);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_Sigma() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(2);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_HalfWidth() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(3);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_Minimum() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(4);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_Maximum() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(5);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_From() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(6);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_To() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(7);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EAttribute getVariedParameter_Steps() {
		return (EAttribute)variedParameterEClass.getEStructuralFeatures().get(8);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getAxisKind() {
		return axisKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getScrewMounting() {
		return screwMountingEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getLowPassOrder() {
		return lowPassOrderEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getEncoderSide() {
		return encoderSideEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getDirection() {
		return directionEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getCornerKind() {
		return cornerKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getRequirementKind() {
		return requirementKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getContourMetric() {
		return contourMetricEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getLimitBound() {
		return limitBoundEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getBudgetSource() {
		return budgetSourceEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getValueOrigin() {
		return valueOriginEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getErrorClass() {
		return errorClassEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getDistribution() {
		return distributionEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getStudyKind() {
		return studyKindEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EEnum getToleranceShape() {
		return toleranceShapeEEnum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public TracewellFactory getTracewellFactory() {
		return (TracewellFactory)getEFactoryInstance();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isCreated = false;

	/**
	 * Creates the meta-model objects for the package.  This method is
	 * guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void createPackageContents() {
		if (isCreated) return;
		isCreated = true;

		// Create classes and their features
		identifiedEClass = createEClass(IDENTIFIED);
		createEAttribute(identifiedEClass, IDENTIFIED__ID);

		namedEClass = createEClass(NAMED);
		createEAttribute(namedEClass, NAMED__NAME);
		createEAttribute(namedEClass, NAMED__DESCRIPTION);

		machineEClass = createEClass(MACHINE);
		createEAttribute(machineEClass, MACHINE__INTERPOLATION_PERIOD);
		createEReference(machineEClass, MACHINE__AXES);
		createEReference(machineEClass, MACHINE__LIBRARY_AXES);
		createEReference(machineEClass, MACHINE__CONTOURS);
		createEReference(machineEClass, MACHINE__REQUIREMENTS);
		createEReference(machineEClass, MACHINE__BUDGET_LINES);
		createEReference(machineEClass, MACHINE__STUDIES);

		axisEClass = createEClass(AXIS);
		createEAttribute(axisEClass, AXIS__KIND);
		createEReference(axisEClass, AXIS__PLANT);
		createEReference(axisEClass, AXIS__CONTROLLER);
		createEReference(axisEClass, AXIS__ENCODER);
		createEAttribute(axisEClass, AXIS__MAX_VELOCITY);
		createEAttribute(axisEClass, AXIS__MAX_ACCELERATION);
		createEAttribute(axisEClass, AXIS__MAX_JERK);
		createEReference(axisEClass, AXIS__GANTRY_PARTNER);

		plantEClass = createEClass(PLANT);

		motorDrivenPlantEClass = createEClass(MOTOR_DRIVEN_PLANT);
		createEAttribute(motorDrivenPlantEClass, MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH);
		createEAttribute(motorDrivenPlantEClass, MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION);
		createEAttribute(motorDrivenPlantEClass, MOTOR_DRIVEN_PLANT__COULOMB_FRICTION);

		rigidScrewDriveEClass = createEClass(RIGID_SCREW_DRIVE);
		createEAttribute(rigidScrewDriveEClass, RIGID_SCREW_DRIVE__MOTOR_INERTIA);
		createEAttribute(rigidScrewDriveEClass, RIGID_SCREW_DRIVE__SCREW_INERTIA);
		createEAttribute(rigidScrewDriveEClass, RIGID_SCREW_DRIVE__LOAD_MASS);
		createEAttribute(rigidScrewDriveEClass, RIGID_SCREW_DRIVE__LEAD);
		createEAttribute(rigidScrewDriveEClass, RIGID_SCREW_DRIVE__GEAR_RATIO);
		createEAttribute(rigidScrewDriveEClass, RIGID_SCREW_DRIVE__TORQUE_CONSTANT);

		twoMassDriveEClass = createEClass(TWO_MASS_DRIVE);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__SCREW_MOUNTING);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__BEARING_SPAN);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__NUT_STIFFNESS);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__BEARING_STIFFNESS);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__DAMPING_RATIO);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__NUT_POSITION_MIN);
		createEAttribute(twoMassDriveEClass, TWO_MASS_DRIVE__NUT_POSITION_MAX);

		rackPinionDriveEClass = createEClass(RACK_PINION_DRIVE);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__MOTOR_INERTIA);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__GEARBOX_INERTIA);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__PINION_RADIUS);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__GEAR_RATIO);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__LOAD_MASS);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__TORQUE_CONSTANT);
		createEAttribute(rackPinionDriveEClass, RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS);

		directDriveEClass = createEClass(DIRECT_DRIVE);
		createEAttribute(directDriveEClass, DIRECT_DRIVE__MOVING_MASS);
		createEAttribute(directDriveEClass, DIRECT_DRIVE__FORCE_CONSTANT);

		rotaryTableEClass = createEClass(ROTARY_TABLE);
		createEAttribute(rotaryTableEClass, ROTARY_TABLE__MOTOR_INERTIA);
		createEAttribute(rotaryTableEClass, ROTARY_TABLE__TABLE_INERTIA);
		createEAttribute(rotaryTableEClass, ROTARY_TABLE__GEAR_RATIO);
		createEAttribute(rotaryTableEClass, ROTARY_TABLE__TORQUE_CONSTANT);
		createEAttribute(rotaryTableEClass, ROTARY_TABLE__TORSIONAL_STIFFNESS);

		transferFunctionPlantEClass = createEClass(TRANSFER_FUNCTION_PLANT);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__NUMERATOR);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__DENOMINATOR);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__DEAD_TIME);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__RATIO);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT);
		createEAttribute(transferFunctionPlantEClass, TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH);

		controllerEClass = createEClass(CONTROLLER);

		cascadeControllerEClass = createEClass(CASCADE_CONTROLLER);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__POSITION_GAIN);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__VELOCITY_GAIN);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD);
		createEReference(cascadeControllerEClass, CASCADE_CONTROLLER__FILTER_STAGES);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD);
		createEAttribute(cascadeControllerEClass, CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD);

		pidControllerEClass = createEClass(PID_CONTROLLER);
		createEAttribute(pidControllerEClass, PID_CONTROLLER__PROPORTIONAL_GAIN);
		createEAttribute(pidControllerEClass, PID_CONTROLLER__INTEGRAL_GAIN);
		createEAttribute(pidControllerEClass, PID_CONTROLLER__DERIVATIVE_GAIN);
		createEAttribute(pidControllerEClass, PID_CONTROLLER__DERIVATIVE_FILTER_TIME);
		createEAttribute(pidControllerEClass, PID_CONTROLLER__SAMPLE_PERIOD);

		transferFunctionControllerEClass = createEClass(TRANSFER_FUNCTION_CONTROLLER);
		createEAttribute(transferFunctionControllerEClass, TRANSFER_FUNCTION_CONTROLLER__NUMERATOR);
		createEAttribute(transferFunctionControllerEClass, TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR);
		createEAttribute(transferFunctionControllerEClass, TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD);

		filterStageEClass = createEClass(FILTER_STAGE);

		lowPassFilterEClass = createEClass(LOW_PASS_FILTER);
		createEAttribute(lowPassFilterEClass, LOW_PASS_FILTER__ORDER);
		createEAttribute(lowPassFilterEClass, LOW_PASS_FILTER__CUTOFF_FREQUENCY);
		createEAttribute(lowPassFilterEClass, LOW_PASS_FILTER__DAMPING_RATIO);

		notchFilterEClass = createEClass(NOTCH_FILTER);
		createEAttribute(notchFilterEClass, NOTCH_FILTER__CENTRE_FREQUENCY);
		createEAttribute(notchFilterEClass, NOTCH_FILTER__WIDTH);
		createEAttribute(notchFilterEClass, NOTCH_FILTER__DEPTH);

		leadLagFilterEClass = createEClass(LEAD_LAG_FILTER);
		createEAttribute(leadLagFilterEClass, LEAD_LAG_FILTER__ZERO_FREQUENCY);
		createEAttribute(leadLagFilterEClass, LEAD_LAG_FILTER__POLE_FREQUENCY);

		encoderEClass = createEClass(ENCODER);
		createEAttribute(encoderEClass, ENCODER__SIDE);
		createEAttribute(encoderEClass, ENCODER__LINEAR_RESOLUTION);
		createEAttribute(encoderEClass, ENCODER__COUNTS_PER_REVOLUTION);

		contourEClass = createEClass(CONTOUR);
		createEAttribute(contourEClass, CONTOUR__FEED);
		createEAttribute(contourEClass, CONTOUR__PATH_ACCELERATION);
		createEAttribute(contourEClass, CONTOUR__PATH_JERK);
		createEAttribute(contourEClass, CONTOUR__SAMPLE_PERIOD);
		createEAttribute(contourEClass, CONTOUR__START_X);
		createEAttribute(contourEClass, CONTOUR__START_Y);
		createEReference(contourEClass, CONTOUR__AXIS_ASSIGNMENT);
		createEReference(contourEClass, CONTOUR__SEGMENTS);

		segmentEClass = createEClass(SEGMENT);

		lineEClass = createEClass(LINE);
		createEAttribute(lineEClass, LINE__END_X);
		createEAttribute(lineEClass, LINE__END_Y);

		arcEClass = createEClass(ARC);
		createEAttribute(arcEClass, ARC__END_X);
		createEAttribute(arcEClass, ARC__END_Y);
		createEAttribute(arcEClass, ARC__CENTRE_X);
		createEAttribute(arcEClass, ARC__CENTRE_Y);
		createEAttribute(arcEClass, ARC__DIRECTION);

		fullCircleEClass = createEClass(FULL_CIRCLE);
		createEAttribute(fullCircleEClass, FULL_CIRCLE__CENTRE_X);
		createEAttribute(fullCircleEClass, FULL_CIRCLE__CENTRE_Y);
		createEAttribute(fullCircleEClass, FULL_CIRCLE__DIRECTION);

		cornerEClass = createEClass(CORNER);
		createEAttribute(cornerEClass, CORNER__KIND);
		createEAttribute(cornerEClass, CORNER__ROUNDING_TOLERANCE);

		requirementEClass = createEClass(REQUIREMENT);
		createEAttribute(requirementEClass, REQUIREMENT__STATEMENT);
		createEAttribute(requirementEClass, REQUIREMENT__KIND);
		createEAttribute(requirementEClass, REQUIREMENT__METRIC);
		createEReference(requirementEClass, REQUIREMENT__CONTOURS);
		createEAttribute(requirementEClass, REQUIREMENT__BOUND);
		createEAttribute(requirementEClass, REQUIREMENT__LIMIT);
		createEAttribute(requirementEClass, REQUIREMENT__DISPLAY_UNIT);
		createEReference(requirementEClass, REQUIREMENT__PARENT);
		createEReference(requirementEClass, REQUIREMENT__ALLOCATED_AXIS);
		createEAttribute(requirementEClass, REQUIREMENT__RATIONALE);

		budgetLineEClass = createEClass(BUDGET_LINE);
		createEAttribute(budgetLineEClass, BUDGET_LINE__NAME);
		createEReference(budgetLineEClass, BUDGET_LINE__AXIS);
		createEAttribute(budgetLineEClass, BUDGET_LINE__SOURCE);
		createEAttribute(budgetLineEClass, BUDGET_LINE__VALUE);
		createEAttribute(budgetLineEClass, BUDGET_LINE__ORIGIN);
		createEAttribute(budgetLineEClass, BUDGET_LINE__ERROR_CLASS);
		createEAttribute(budgetLineEClass, BUDGET_LINE__DISTRIBUTION);
		createEAttribute(budgetLineEClass, BUDGET_LINE__SENSITIVITY);
		createEAttribute(budgetLineEClass, BUDGET_LINE__EVIDENCE);

		variationStudyEClass = createEClass(VARIATION_STUDY);
		createEAttribute(variationStudyEClass, VARIATION_STUDY__KIND);
		createEAttribute(variationStudyEClass, VARIATION_STUDY__VARIANT_COUNT);
		createEAttribute(variationStudyEClass, VARIATION_STUDY__SEED);
		createEAttribute(variationStudyEClass, VARIATION_STUDY__WORST_VARIANT_COUNT);
		createEAttribute(variationStudyEClass, VARIATION_STUDY__METRICS);
		createEReference(variationStudyEClass, VARIATION_STUDY__PARAMETERS);

		variedParameterEClass = createEClass(VARIED_PARAMETER);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__PATH);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__SHAPE);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__SIGMA);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__HALF_WIDTH);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__MINIMUM);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__MAXIMUM);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__FROM);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__TO);
		createEAttribute(variedParameterEClass, VARIED_PARAMETER__STEPS);

		// Create enums
		axisKindEEnum = createEEnum(AXIS_KIND);
		screwMountingEEnum = createEEnum(SCREW_MOUNTING);
		lowPassOrderEEnum = createEEnum(LOW_PASS_ORDER);
		encoderSideEEnum = createEEnum(ENCODER_SIDE);
		directionEEnum = createEEnum(DIRECTION);
		cornerKindEEnum = createEEnum(CORNER_KIND);
		requirementKindEEnum = createEEnum(REQUIREMENT_KIND);
		contourMetricEEnum = createEEnum(CONTOUR_METRIC);
		limitBoundEEnum = createEEnum(LIMIT_BOUND);
		budgetSourceEEnum = createEEnum(BUDGET_SOURCE);
		valueOriginEEnum = createEEnum(VALUE_ORIGIN);
		errorClassEEnum = createEEnum(ERROR_CLASS);
		distributionEEnum = createEEnum(DISTRIBUTION);
		studyKindEEnum = createEEnum(STUDY_KIND);
		toleranceShapeEEnum = createEEnum(TOLERANCE_SHAPE);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private boolean isInitialized = false;

	/**
	 * Complete the initialization of the package and its meta-model.  This
	 * method is guarded to have no affect on any invocation but its first.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public void initializePackageContents() {
		if (isInitialized) return;
		isInitialized = true;

		// Initialize package
		setName(eNAME);
		setNsPrefix(eNS_PREFIX);
		setNsURI(eNS_URI);

		// Create type parameters

		// Set bounds for type parameters

		// Add supertypes to classes
		namedEClass.getESuperTypes().add(this.getIdentified());
		machineEClass.getESuperTypes().add(this.getNamed());
		axisEClass.getESuperTypes().add(this.getNamed());
		plantEClass.getESuperTypes().add(this.getIdentified());
		motorDrivenPlantEClass.getESuperTypes().add(this.getPlant());
		rigidScrewDriveEClass.getESuperTypes().add(this.getMotorDrivenPlant());
		twoMassDriveEClass.getESuperTypes().add(this.getRigidScrewDrive());
		rackPinionDriveEClass.getESuperTypes().add(this.getMotorDrivenPlant());
		directDriveEClass.getESuperTypes().add(this.getMotorDrivenPlant());
		rotaryTableEClass.getESuperTypes().add(this.getMotorDrivenPlant());
		transferFunctionPlantEClass.getESuperTypes().add(this.getPlant());
		controllerEClass.getESuperTypes().add(this.getIdentified());
		cascadeControllerEClass.getESuperTypes().add(this.getController());
		pidControllerEClass.getESuperTypes().add(this.getController());
		transferFunctionControllerEClass.getESuperTypes().add(this.getController());
		filterStageEClass.getESuperTypes().add(this.getIdentified());
		lowPassFilterEClass.getESuperTypes().add(this.getFilterStage());
		notchFilterEClass.getESuperTypes().add(this.getFilterStage());
		leadLagFilterEClass.getESuperTypes().add(this.getFilterStage());
		encoderEClass.getESuperTypes().add(this.getIdentified());
		contourEClass.getESuperTypes().add(this.getNamed());
		segmentEClass.getESuperTypes().add(this.getIdentified());
		lineEClass.getESuperTypes().add(this.getSegment());
		arcEClass.getESuperTypes().add(this.getSegment());
		fullCircleEClass.getESuperTypes().add(this.getSegment());
		cornerEClass.getESuperTypes().add(this.getSegment());
		requirementEClass.getESuperTypes().add(this.getIdentified());
		budgetLineEClass.getESuperTypes().add(this.getIdentified());
		variationStudyEClass.getESuperTypes().add(this.getNamed());
		variedParameterEClass.getESuperTypes().add(this.getIdentified());

		// Initialize classes and features; add operations and parameters
		initEClass(identifiedEClass, Identified.class, "Identified", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getIdentified_Id(), ecorePackage.getEString(), "id", null, 1, 1, Identified.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(namedEClass, Named.class, "Named", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getNamed_Name(), ecorePackage.getEString(), "name", null, 0, 1, Named.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getNamed_Description(), ecorePackage.getEString(), "description", null, 0, 1, Named.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(machineEClass, Machine.class, "Machine", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getMachine_InterpolationPeriod(), ecorePackage.getEDouble(), "interpolationPeriod", null, 0, 1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getMachine_Axes(), this.getAxis(), null, "axes", null, 0, -1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getMachine_LibraryAxes(), this.getAxis(), null, "libraryAxes", null, 0, -1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getMachine_Contours(), this.getContour(), null, "contours", null, 0, -1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getMachine_Requirements(), this.getRequirement(), null, "requirements", null, 0, -1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getMachine_BudgetLines(), this.getBudgetLine(), null, "budgetLines", null, 0, -1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getMachine_Studies(), this.getVariationStudy(), null, "studies", null, 0, -1, Machine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(axisEClass, Axis.class, "Axis", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getAxis_Kind(), this.getAxisKind(), "kind", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getAxis_Plant(), this.getPlant(), null, "plant", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getAxis_Controller(), this.getController(), null, "controller", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getAxis_Encoder(), this.getEncoder(), null, "encoder", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getAxis_MaxVelocity(), ecorePackage.getEDouble(), "maxVelocity", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getAxis_MaxAcceleration(), ecorePackage.getEDouble(), "maxAcceleration", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getAxis_MaxJerk(), ecorePackage.getEDouble(), "maxJerk", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getAxis_GantryPartner(), this.getAxis(), null, "gantryPartner", null, 0, 1, Axis.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(plantEClass, Plant.class, "Plant", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$

		initEClass(motorDrivenPlantEClass, MotorDrivenPlant.class, "MotorDrivenPlant", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getMotorDrivenPlant_CurrentLoopBandwidth(), ecorePackage.getEDouble(), "currentLoopBandwidth", null, 0, 1, MotorDrivenPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getMotorDrivenPlant_ViscousFriction(), ecorePackage.getEDouble(), "viscousFriction", null, 0, 1, MotorDrivenPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getMotorDrivenPlant_CoulombFriction(), ecorePackage.getEDouble(), "coulombFriction", null, 0, 1, MotorDrivenPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(rigidScrewDriveEClass, RigidScrewDrive.class, "RigidScrewDrive", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getRigidScrewDrive_MotorInertia(), ecorePackage.getEDouble(), "motorInertia", null, 0, 1, RigidScrewDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRigidScrewDrive_ScrewInertia(), ecorePackage.getEDouble(), "screwInertia", null, 0, 1, RigidScrewDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRigidScrewDrive_LoadMass(), ecorePackage.getEDouble(), "loadMass", null, 0, 1, RigidScrewDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRigidScrewDrive_Lead(), ecorePackage.getEDouble(), "lead", null, 0, 1, RigidScrewDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRigidScrewDrive_GearRatio(), ecorePackage.getEDouble(), "gearRatio", "1.0", 0, 1, RigidScrewDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$ //$NON-NLS-2$
		initEAttribute(getRigidScrewDrive_TorqueConstant(), ecorePackage.getEDouble(), "torqueConstant", null, 0, 1, RigidScrewDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(twoMassDriveEClass, TwoMassDrive.class, "TwoMassDrive", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_ScrewRootDiameter(), ecorePackage.getEDouble(), "screwRootDiameter", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_ScrewMounting(), this.getScrewMounting(), "screwMounting", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_BearingSpan(), ecorePackage.getEDouble(), "bearingSpan", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_NutStiffness(), ecorePackage.getEDouble(), "nutStiffness", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_BearingStiffness(), ecorePackage.getEDouble(), "bearingStiffness", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_DampingRatio(), ecorePackage.getEDouble(), "dampingRatio", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_NutPositionMin(), ecorePackage.getEDouble(), "nutPositionMin", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTwoMassDrive_NutPositionMax(), ecorePackage.getEDouble(), "nutPositionMax", null, 0, 1, TwoMassDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(rackPinionDriveEClass, RackPinionDrive.class, "RackPinionDrive", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_MotorInertia(), ecorePackage.getEDouble(), "motorInertia", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_GearboxInertia(), ecorePackage.getEDouble(), "gearboxInertia", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_PinionRadius(), ecorePackage.getEDouble(), "pinionRadius", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_GearRatio(), ecorePackage.getEDouble(), "gearRatio", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_LoadMass(), ecorePackage.getEDouble(), "loadMass", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_TorqueConstant(), ecorePackage.getEDouble(), "torqueConstant", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRackPinionDrive_DrivetrainStiffness(), ecorePackage.getEDouble(), "drivetrainStiffness", null, 0, 1, RackPinionDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(directDriveEClass, DirectDrive.class, "DirectDrive", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getDirectDrive_MovingMass(), ecorePackage.getEDouble(), "movingMass", null, 0, 1, DirectDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getDirectDrive_ForceConstant(), ecorePackage.getEDouble(), "forceConstant", null, 0, 1, DirectDrive.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(rotaryTableEClass, RotaryTable.class, "RotaryTable", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getRotaryTable_MotorInertia(), ecorePackage.getEDouble(), "motorInertia", null, 0, 1, RotaryTable.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRotaryTable_TableInertia(), ecorePackage.getEDouble(), "tableInertia", null, 0, 1, RotaryTable.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRotaryTable_GearRatio(), ecorePackage.getEDouble(), "gearRatio", null, 0, 1, RotaryTable.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRotaryTable_TorqueConstant(), ecorePackage.getEDouble(), "torqueConstant", null, 0, 1, RotaryTable.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRotaryTable_TorsionalStiffness(), ecorePackage.getEDouble(), "torsionalStiffness", null, 0, 1, RotaryTable.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(transferFunctionPlantEClass, TransferFunctionPlant.class, "TransferFunctionPlant", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_Numerator(), ecorePackage.getEDouble(), "numerator", null, 0, -1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_Denominator(), ecorePackage.getEDouble(), "denominator", null, 0, -1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_DeadTime(), ecorePackage.getEDouble(), "deadTime", null, 0, 1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_Ratio(), ecorePackage.getEDouble(), "ratio", null, 0, 1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_EquivalentInertia(), ecorePackage.getEDouble(), "equivalentInertia", null, 0, 1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_TorqueConstant(), ecorePackage.getEDouble(), "torqueConstant", null, 0, 1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionPlant_CurrentLoopBandwidth(), ecorePackage.getEDouble(), "currentLoopBandwidth", null, 0, 1, TransferFunctionPlant.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(controllerEClass, Controller.class, "Controller", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$

		initEClass(cascadeControllerEClass, CascadeController.class, "CascadeController", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getCascadeController_PositionGain(), ecorePackage.getEDouble(), "positionGain", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCascadeController_VelocityGain(), ecorePackage.getEDouble(), "velocityGain", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCascadeController_VelocityIntegralTime(), ecorePackage.getEDouble(), "velocityIntegralTime", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCascadeController_VelocityFeedforward(), ecorePackage.getEDouble(), "velocityFeedforward", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCascadeController_AccelerationFeedforward(), ecorePackage.getEDouble(), "accelerationFeedforward", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getCascadeController_FilterStages(), this.getFilterStage(), null, "filterStages", null, 0, -1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCascadeController_PositionSamplePeriod(), ecorePackage.getEDouble(), "positionSamplePeriod", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCascadeController_VelocitySamplePeriod(), ecorePackage.getEDouble(), "velocitySamplePeriod", null, 0, 1, CascadeController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(pidControllerEClass, PidController.class, "PidController", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getPidController_ProportionalGain(), ecorePackage.getEDouble(), "proportionalGain", null, 0, 1, PidController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getPidController_IntegralGain(), ecorePackage.getEDouble(), "integralGain", null, 0, 1, PidController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getPidController_DerivativeGain(), ecorePackage.getEDouble(), "derivativeGain", null, 0, 1, PidController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getPidController_DerivativeFilterTime(), ecorePackage.getEDouble(), "derivativeFilterTime", null, 0, 1, PidController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getPidController_SamplePeriod(), ecorePackage.getEDouble(), "samplePeriod", null, 0, 1, PidController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(transferFunctionControllerEClass, TransferFunctionController.class, "TransferFunctionController", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getTransferFunctionController_Numerator(), ecorePackage.getEDouble(), "numerator", null, 0, -1, TransferFunctionController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionController_Denominator(), ecorePackage.getEDouble(), "denominator", null, 0, -1, TransferFunctionController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getTransferFunctionController_SamplePeriod(), ecorePackage.getEDouble(), "samplePeriod", null, 0, 1, TransferFunctionController.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(filterStageEClass, FilterStage.class, "FilterStage", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$

		initEClass(lowPassFilterEClass, LowPassFilter.class, "LowPassFilter", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getLowPassFilter_Order(), this.getLowPassOrder(), "order", null, 0, 1, LowPassFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getLowPassFilter_CutoffFrequency(), ecorePackage.getEDouble(), "cutoffFrequency", null, 0, 1, LowPassFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getLowPassFilter_DampingRatio(), ecorePackage.getEDouble(), "dampingRatio", "0.707", 0, 1, LowPassFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$ //$NON-NLS-2$

		initEClass(notchFilterEClass, NotchFilter.class, "NotchFilter", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getNotchFilter_CentreFrequency(), ecorePackage.getEDouble(), "centreFrequency", null, 0, 1, NotchFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getNotchFilter_Width(), ecorePackage.getEDouble(), "width", null, 0, 1, NotchFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getNotchFilter_Depth(), ecorePackage.getEDouble(), "depth", null, 0, 1, NotchFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(leadLagFilterEClass, LeadLagFilter.class, "LeadLagFilter", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getLeadLagFilter_ZeroFrequency(), ecorePackage.getEDouble(), "zeroFrequency", null, 0, 1, LeadLagFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getLeadLagFilter_PoleFrequency(), ecorePackage.getEDouble(), "poleFrequency", null, 0, 1, LeadLagFilter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(encoderEClass, Encoder.class, "Encoder", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getEncoder_Side(), this.getEncoderSide(), "side", null, 0, 1, Encoder.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getEncoder_LinearResolution(), ecorePackage.getEDouble(), "linearResolution", null, 0, 1, Encoder.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getEncoder_CountsPerRevolution(), ecorePackage.getEInt(), "countsPerRevolution", null, 0, 1, Encoder.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(contourEClass, Contour.class, "Contour", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getContour_Feed(), ecorePackage.getEDouble(), "feed", null, 0, 1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getContour_PathAcceleration(), ecorePackage.getEDouble(), "pathAcceleration", null, 0, 1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getContour_PathJerk(), ecorePackage.getEDouble(), "pathJerk", null, 0, 1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getContour_SamplePeriod(), ecorePackage.getEDouble(), "samplePeriod", null, 0, 1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getContour_StartX(), ecorePackage.getEDouble(), "startX", null, 0, 1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getContour_StartY(), ecorePackage.getEDouble(), "startY", null, 0, 1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getContour_AxisAssignment(), this.getAxis(), null, "axisAssignment", null, 2, 2, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getContour_Segments(), this.getSegment(), null, "segments", null, 0, -1, Contour.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(segmentEClass, Segment.class, "Segment", IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$

		initEClass(lineEClass, Line.class, "Line", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getLine_EndX(), ecorePackage.getEDouble(), "endX", null, 0, 1, Line.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getLine_EndY(), ecorePackage.getEDouble(), "endY", null, 0, 1, Line.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(arcEClass, Arc.class, "Arc", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getArc_EndX(), ecorePackage.getEDouble(), "endX", null, 0, 1, Arc.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getArc_EndY(), ecorePackage.getEDouble(), "endY", null, 0, 1, Arc.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getArc_CentreX(), ecorePackage.getEDouble(), "centreX", null, 0, 1, Arc.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getArc_CentreY(), ecorePackage.getEDouble(), "centreY", null, 0, 1, Arc.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getArc_Direction(), this.getDirection(), "direction", null, 0, 1, Arc.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(fullCircleEClass, FullCircle.class, "FullCircle", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getFullCircle_CentreX(), ecorePackage.getEDouble(), "centreX", null, 0, 1, FullCircle.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getFullCircle_CentreY(), ecorePackage.getEDouble(), "centreY", null, 0, 1, FullCircle.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getFullCircle_Direction(), this.getDirection(), "direction", null, 0, 1, FullCircle.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(cornerEClass, Corner.class, "Corner", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getCorner_Kind(), this.getCornerKind(), "kind", null, 0, 1, Corner.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getCorner_RoundingTolerance(), ecorePackage.getEDouble(), "roundingTolerance", null, 0, 1, Corner.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(requirementEClass, Requirement.class, "Requirement", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getRequirement_Statement(), ecorePackage.getEString(), "statement", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRequirement_Kind(), this.getRequirementKind(), "kind", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRequirement_Metric(), this.getContourMetric(), "metric", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getRequirement_Contours(), this.getContour(), null, "contours", null, 0, -1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRequirement_Bound(), this.getLimitBound(), "bound", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRequirement_Limit(), ecorePackage.getEDouble(), "limit", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRequirement_DisplayUnit(), ecorePackage.getEString(), "displayUnit", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getRequirement_Parent(), this.getRequirement(), null, "parent", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getRequirement_AllocatedAxis(), this.getAxis(), null, "allocatedAxis", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getRequirement_Rationale(), ecorePackage.getEString(), "rationale", null, 0, 1, Requirement.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(budgetLineEClass, BudgetLine.class, "BudgetLine", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getBudgetLine_Name(), ecorePackage.getEString(), "name", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getBudgetLine_Axis(), this.getAxis(), null, "axis", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_COMPOSITE, IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getBudgetLine_Source(), this.getBudgetSource(), "source", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getBudgetLine_Value(), ecorePackage.getEDouble(), "value", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getBudgetLine_Origin(), this.getValueOrigin(), "origin", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getBudgetLine_ErrorClass(), this.getErrorClass(), "errorClass", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getBudgetLine_Distribution(), this.getDistribution(), "distribution", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getBudgetLine_Sensitivity(), ecorePackage.getEDouble(), "sensitivity", "1.0", 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$ //$NON-NLS-2$
		initEAttribute(getBudgetLine_Evidence(), ecorePackage.getEString(), "evidence", null, 0, 1, BudgetLine.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(variationStudyEClass, VariationStudy.class, "VariationStudy", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getVariationStudy_Kind(), this.getStudyKind(), "kind", null, 0, 1, VariationStudy.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariationStudy_VariantCount(), ecorePackage.getEInt(), "variantCount", "1000", 0, 1, VariationStudy.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$ //$NON-NLS-2$
		initEAttribute(getVariationStudy_Seed(), ecorePackage.getELong(), "seed", "1", 0, 1, VariationStudy.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$ //$NON-NLS-2$
		initEAttribute(getVariationStudy_WorstVariantCount(), ecorePackage.getEInt(), "worstVariantCount", "5", 0, 1, VariationStudy.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$ //$NON-NLS-2$
		initEAttribute(getVariationStudy_Metrics(), ecorePackage.getEString(), "metrics", null, 0, -1, VariationStudy.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEReference(getVariationStudy_Parameters(), this.getVariedParameter(), null, "parameters", null, 0, -1, VariationStudy.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_COMPOSITE, !IS_RESOLVE_PROXIES, !IS_UNSETTABLE, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		initEClass(variedParameterEClass, VariedParameter.class, "VariedParameter", !IS_ABSTRACT, !IS_INTERFACE, IS_GENERATED_INSTANCE_CLASS); //$NON-NLS-1$
		initEAttribute(getVariedParameter_Path(), ecorePackage.getEString(), "path", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_Shape(), this.getToleranceShape(), "shape", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_Sigma(), ecorePackage.getEDouble(), "sigma", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_HalfWidth(), ecorePackage.getEDouble(), "halfWidth", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_Minimum(), ecorePackage.getEDouble(), "minimum", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_Maximum(), ecorePackage.getEDouble(), "maximum", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_From(), ecorePackage.getEDouble(), "from", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_To(), ecorePackage.getEDouble(), "to", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$
		initEAttribute(getVariedParameter_Steps(), ecorePackage.getEInt(), "steps", null, 0, 1, VariedParameter.class, !IS_TRANSIENT, !IS_VOLATILE, IS_CHANGEABLE, !IS_UNSETTABLE, !IS_ID, IS_UNIQUE, !IS_DERIVED, IS_ORDERED); //$NON-NLS-1$

		// Initialize enums and add enum literals
		initEEnum(axisKindEEnum, AxisKind.class, "AxisKind"); //$NON-NLS-1$
		addEEnumLiteral(axisKindEEnum, AxisKind.LINEAR);
		addEEnumLiteral(axisKindEEnum, AxisKind.ROTARY);

		initEEnum(screwMountingEEnum, ScrewMounting.class, "ScrewMounting"); //$NON-NLS-1$
		addEEnumLiteral(screwMountingEEnum, ScrewMounting.FIXED_FREE);
		addEEnumLiteral(screwMountingEEnum, ScrewMounting.FIXED_FIXED);

		initEEnum(lowPassOrderEEnum, LowPassOrder.class, "LowPassOrder"); //$NON-NLS-1$
		addEEnumLiteral(lowPassOrderEEnum, LowPassOrder.FIRST);
		addEEnumLiteral(lowPassOrderEEnum, LowPassOrder.SECOND);

		initEEnum(encoderSideEEnum, EncoderSide.class, "EncoderSide"); //$NON-NLS-1$
		addEEnumLiteral(encoderSideEEnum, EncoderSide.MOTOR);
		addEEnumLiteral(encoderSideEEnum, EncoderSide.LOAD);

		initEEnum(directionEEnum, Direction.class, "Direction"); //$NON-NLS-1$
		addEEnumLiteral(directionEEnum, Direction.COUNTER_CLOCKWISE);
		addEEnumLiteral(directionEEnum, Direction.CLOCKWISE);

		initEEnum(cornerKindEEnum, CornerKind.class, "CornerKind"); //$NON-NLS-1$
		addEEnumLiteral(cornerKindEEnum, CornerKind.SHARP);
		addEEnumLiteral(cornerKindEEnum, CornerKind.EXACT_STOP);
		addEEnumLiteral(cornerKindEEnum, CornerKind.ROUNDED);

		initEEnum(requirementKindEEnum, RequirementKind.class, "RequirementKind"); //$NON-NLS-1$
		addEEnumLiteral(requirementKindEEnum, RequirementKind.CONTOUR_DEVIATION);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.FOLLOWING_ERROR);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.PHASE_MARGIN);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.GAIN_MARGIN);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.BANDWIDTH);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.SETTLING_TIME);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.STEADY_STATE_ERROR);
		addEEnumLiteral(requirementKindEEnum, RequirementKind.POSITION_GAIN);

		initEEnum(contourMetricEEnum, ContourMetric.class, "ContourMetric"); //$NON-NLS-1$
		addEEnumLiteral(contourMetricEEnum, ContourMetric.MAX_NORMAL_DEVIATION);
		addEEnumLiteral(contourMetricEEnum, ContourMetric.CIRCULAR_DEVIATION);
		addEEnumLiteral(contourMetricEEnum, ContourMetric.RADIAL_DEVIATION);

		initEEnum(limitBoundEEnum, LimitBound.class, "LimitBound"); //$NON-NLS-1$
		addEEnumLiteral(limitBoundEEnum, LimitBound.AT_MOST);
		addEEnumLiteral(limitBoundEEnum, LimitBound.AT_LEAST);

		initEEnum(budgetSourceEEnum, BudgetSource.class, "BudgetSource"); //$NON-NLS-1$
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.SERVO_LAG);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.GAIN_MISMATCH);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.QUANTISATION);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.RESONANCE);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.FRICTION_REVERSAL);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.THERMAL);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.GEOMETRIC);
		addEEnumLiteral(budgetSourceEEnum, BudgetSource.USER_ENTERED);

		initEEnum(valueOriginEEnum, ValueOrigin.class, "ValueOrigin"); //$NON-NLS-1$
		addEEnumLiteral(valueOriginEEnum, ValueOrigin.ENTERED);
		addEEnumLiteral(valueOriginEEnum, ValueOrigin.COMPUTED);

		initEEnum(errorClassEEnum, ErrorClass.class, "ErrorClass"); //$NON-NLS-1$
		addEEnumLiteral(errorClassEEnum, ErrorClass.SYSTEMATIC);
		addEEnumLiteral(errorClassEEnum, ErrorClass.RANDOM);

		initEEnum(distributionEEnum, Distribution.class, "Distribution"); //$NON-NLS-1$
		addEEnumLiteral(distributionEEnum, Distribution.NORMAL);
		addEEnumLiteral(distributionEEnum, Distribution.UNIFORM);
		addEEnumLiteral(distributionEEnum, Distribution.USHAPED);
		addEEnumLiteral(distributionEEnum, Distribution.QUANTISATION);

		initEEnum(studyKindEEnum, StudyKind.class, "StudyKind"); //$NON-NLS-1$
		addEEnumLiteral(studyKindEEnum, StudyKind.MONTE_CARLO);
		addEEnumLiteral(studyKindEEnum, StudyKind.SWEEP);

		initEEnum(toleranceShapeEEnum, ToleranceShape.class, "ToleranceShape"); //$NON-NLS-1$
		addEEnumLiteral(toleranceShapeEEnum, ToleranceShape.NORMAL);
		addEEnumLiteral(toleranceShapeEEnum, ToleranceShape.UNIFORM);
		addEEnumLiteral(toleranceShapeEEnum, ToleranceShape.TRIANGULAR);

		// Create resource
		createResource(eNS_URI);

		// Create annotations
		// http://tracewell.org/units
		createUnitsAnnotations();
	}

	/**
	 * Initializes the annotations for <b>http://tracewell.org/units</b>.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected void createUnitsAnnotations() {
		String source = "http://tracewell.org/units"; //$NON-NLS-1$
		addAnnotation
		  (getMachine_InterpolationPeriod(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getAxis_MaxVelocity(),
		   source,
		   new String[] {
			   "unit", "m/s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "m/min", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "rad/s", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "rev/min" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getAxis_MaxAcceleration(),
		   source,
		   new String[] {
			   "unit", "m/s\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "m/s\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "rad/s\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "rad/s\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getAxis_MaxJerk(),
		   source,
		   new String[] {
			   "unit", "m/s\u00b3", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "m/s\u00b3", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "rad/s\u00b3", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "rad/s\u00b3" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getMotorDrivenPlant_CurrentLoopBandwidth(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getMotorDrivenPlant_ViscousFriction(),
		   source,
		   new String[] {
			   "unit", "N\u00b7s/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7s/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "N\u00b7m\u00b7s/rad", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "N\u00b7m\u00b7s/rad" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getMotorDrivenPlant_CoulombFriction(),
		   source,
		   new String[] {
			   "unit", "N", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "N\u00b7m", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "N\u00b7m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRigidScrewDrive_MotorInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRigidScrewDrive_ScrewInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRigidScrewDrive_LoadMass(),
		   source,
		   new String[] {
			   "unit", "kg", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRigidScrewDrive_Lead(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRigidScrewDrive_GearRatio(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRigidScrewDrive_TorqueConstant(),
		   source,
		   new String[] {
			   "unit", "N\u00b7m/A", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7m/A" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_ScrewRootDiameter(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_BearingSpan(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_NutStiffness(),
		   source,
		   new String[] {
			   "unit", "N/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N/\u00b5m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_BearingStiffness(),
		   source,
		   new String[] {
			   "unit", "N/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N/\u00b5m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_DampingRatio(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "%" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_NutPositionMin(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTwoMassDrive_NutPositionMax(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_MotorInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_GearboxInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_PinionRadius(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_GearRatio(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_LoadMass(),
		   source,
		   new String[] {
			   "unit", "kg", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_TorqueConstant(),
		   source,
		   new String[] {
			   "unit", "N\u00b7m/A", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7m/A" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRackPinionDrive_DrivetrainStiffness(),
		   source,
		   new String[] {
			   "unit", "N/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N/\u00b5m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getDirectDrive_MovingMass(),
		   source,
		   new String[] {
			   "unit", "kg", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getDirectDrive_ForceConstant(),
		   source,
		   new String[] {
			   "unit", "N/A", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N/A" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRotaryTable_MotorInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRotaryTable_TableInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRotaryTable_GearRatio(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRotaryTable_TorqueConstant(),
		   source,
		   new String[] {
			   "unit", "N\u00b7m/A", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7m/A" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getRotaryTable_TorsionalStiffness(),
		   source,
		   new String[] {
			   "unit", "N\u00b7m/rad", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7m/arcmin" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTransferFunctionPlant_DeadTime(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTransferFunctionPlant_Ratio(),
		   source,
		   new String[] {
			   "unit", "m/rad", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm/rev", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTransferFunctionPlant_EquivalentInertia(),
		   source,
		   new String[] {
			   "unit", "kg\u00b7m\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "kg\u00b7cm\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTransferFunctionPlant_TorqueConstant(),
		   source,
		   new String[] {
			   "unit", "N\u00b7m/A", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7m/A" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTransferFunctionPlant_CurrentLoopBandwidth(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_PositionGain(),
		   source,
		   new String[] {
			   "unit", "1/s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "(m/min)/mm", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "1/s", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "1/s" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_VelocityGain(),
		   source,
		   new String[] {
			   "unit", "N\u00b7s/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7s/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "N\u00b7m\u00b7s/rad", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "N\u00b7m\u00b7s/rad" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_VelocityIntegralTime(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_VelocityFeedforward(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "%" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_AccelerationFeedforward(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "%" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_PositionSamplePeriod(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCascadeController_VelocitySamplePeriod(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getPidController_ProportionalGain(),
		   source,
		   new String[] {
			   "unit", "N/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N/\u00b5m", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "N\u00b7m/rad", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "N\u00b7m/rad" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getPidController_IntegralGain(),
		   source,
		   new String[] {
			   "unit", "N/(m\u00b7s)", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N/(m\u00b7s)", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "N\u00b7m/(rad\u00b7s)", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "N\u00b7m/(rad\u00b7s)" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getPidController_DerivativeGain(),
		   source,
		   new String[] {
			   "unit", "N\u00b7s/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "N\u00b7s/m", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryUnit", "N\u00b7m\u00b7s/rad", //$NON-NLS-1$ //$NON-NLS-2$
			   "rotaryDisplayUnit", "N\u00b7m\u00b7s/rad" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getPidController_DerivativeFilterTime(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getPidController_SamplePeriod(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getTransferFunctionController_SamplePeriod(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getLowPassFilter_CutoffFrequency(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getLowPassFilter_DampingRatio(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getNotchFilter_CentreFrequency(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getNotchFilter_Width(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getNotchFilter_Depth(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getLeadLagFilter_ZeroFrequency(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getLeadLagFilter_PoleFrequency(),
		   source,
		   new String[] {
			   "unit", "Hz", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "Hz" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getEncoder_LinearResolution(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "\u00b5m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getEncoder_CountsPerRevolution(),
		   source,
		   new String[] {
			   "unit", "1/rev", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1/rev" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getContour_Feed(),
		   source,
		   new String[] {
			   "unit", "m/s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "m/min" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getContour_PathAcceleration(),
		   source,
		   new String[] {
			   "unit", "m/s\u00b2", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "m/s\u00b2" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getContour_PathJerk(),
		   source,
		   new String[] {
			   "unit", "m/s\u00b3", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "m/s\u00b3" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getContour_SamplePeriod(),
		   source,
		   new String[] {
			   "unit", "s", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "ms" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getContour_StartX(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getContour_StartY(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getLine_EndX(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getLine_EndY(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getArc_EndX(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getArc_EndY(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getArc_CentreX(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getArc_CentreY(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getFullCircle_CentreX(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getFullCircle_CentreY(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "mm" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getCorner_RoundingTolerance(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "\u00b5m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getBudgetLine_Value(),
		   source,
		   new String[] {
			   "unit", "m", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "\u00b5m" //$NON-NLS-1$ //$NON-NLS-2$
		   });
		addAnnotation
		  (getBudgetLine_Sensitivity(),
		   source,
		   new String[] {
			   "unit", "1", //$NON-NLS-1$ //$NON-NLS-2$
			   "displayUnit", "1" //$NON-NLS-1$ //$NON-NLS-2$
		   });
	}

} //TracewellPackageImpl
