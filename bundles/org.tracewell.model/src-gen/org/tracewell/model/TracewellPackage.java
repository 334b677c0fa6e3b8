/**
 */
package org.tracewell.model;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EEnum;
import org.eclipse.emf.ecore.EPackage;
import org.eclipse.emf.ecore.EReference;

/**
 * <!-- begin-user-doc -->
 * The <b>Package</b> for the model.
 * It contains accessors for the meta objects to represent
 * <ul>
 *   <li>each class,</li>
 *   <li>each feature of each class,</li>
 *   <li>each enum,</li>
 *   <li>and each data type</li>
 * </ul>
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellFactory
 * @model kind="package"
 * @generated
 */
public interface TracewellPackage extends EPackage {
	/**
	 * The package name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNAME = "model"; //$NON-NLS-1$

	/**
	 * The package namespace URI.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_URI = "http://tracewell.org/model/1.0"; //$NON-NLS-1$

	/**
	 * The package namespace name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	String eNS_PREFIX = "tw"; //$NON-NLS-1$

	/**
	 * The singleton instance of the package.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	TracewellPackage eINSTANCE = org.tracewell.model.impl.TracewellPackageImpl.init();

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.IdentifiedImpl <em>Identified</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.IdentifiedImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getIdentified()
	 * @generated
	 */
	int IDENTIFIED = 0;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int IDENTIFIED__ID = 0;

	/**
	 * The number of structural features of the '<em>Identified</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int IDENTIFIED_FEATURE_COUNT = 1;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.NamedImpl <em>Named</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.NamedImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getNamed()
	 * @generated
	 */
	int NAMED = 1;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NAMED__ID = IDENTIFIED__ID;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NAMED__NAME = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NAMED__DESCRIPTION = IDENTIFIED_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Named</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NAMED_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 2;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.MachineImpl <em>Machine</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.MachineImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getMachine()
	 * @generated
	 */
	int MACHINE = 2;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__ID = NAMED__ID;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__NAME = NAMED__NAME;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__DESCRIPTION = NAMED__DESCRIPTION;

	/**
	 * The feature id for the '<em><b>Interpolation Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__INTERPOLATION_PERIOD = NAMED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Axes</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__AXES = NAMED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Library Axes</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__LIBRARY_AXES = NAMED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Contours</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__CONTOURS = NAMED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Requirements</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__REQUIREMENTS = NAMED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Budget Lines</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__BUDGET_LINES = NAMED_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Studies</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE__STUDIES = NAMED_FEATURE_COUNT + 6;

	/**
	 * The number of structural features of the '<em>Machine</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MACHINE_FEATURE_COUNT = NAMED_FEATURE_COUNT + 7;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.AxisImpl <em>Axis</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.AxisImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getAxis()
	 * @generated
	 */
	int AXIS = 3;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__ID = NAMED__ID;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__NAME = NAMED__NAME;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__DESCRIPTION = NAMED__DESCRIPTION;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__KIND = NAMED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Plant</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__PLANT = NAMED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Controller</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__CONTROLLER = NAMED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Encoder</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__ENCODER = NAMED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Max Velocity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__MAX_VELOCITY = NAMED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Max Acceleration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__MAX_ACCELERATION = NAMED_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Max Jerk</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__MAX_JERK = NAMED_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Gantry Partner</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS__GANTRY_PARTNER = NAMED_FEATURE_COUNT + 7;

	/**
	 * The number of structural features of the '<em>Axis</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int AXIS_FEATURE_COUNT = NAMED_FEATURE_COUNT + 8;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.PlantImpl <em>Plant</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.PlantImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getPlant()
	 * @generated
	 */
	int PLANT = 4;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PLANT__ID = IDENTIFIED__ID;

	/**
	 * The number of structural features of the '<em>Plant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PLANT_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.MotorDrivenPlantImpl <em>Motor Driven Plant</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.MotorDrivenPlantImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getMotorDrivenPlant()
	 * @generated
	 */
	int MOTOR_DRIVEN_PLANT = 5;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MOTOR_DRIVEN_PLANT__ID = PLANT__ID;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH = PLANT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION = PLANT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MOTOR_DRIVEN_PLANT__COULOMB_FRICTION = PLANT_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Motor Driven Plant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int MOTOR_DRIVEN_PLANT_FEATURE_COUNT = PLANT_FEATURE_COUNT + 3;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.RigidScrewDriveImpl <em>Rigid Screw Drive</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.RigidScrewDriveImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getRigidScrewDrive()
	 * @generated
	 */
	int RIGID_SCREW_DRIVE = 6;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__ID = MOTOR_DRIVEN_PLANT__ID;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__CURRENT_LOOP_BANDWIDTH = MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH;

	/**
	 * The feature id for the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__VISCOUS_FRICTION = MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION;

	/**
	 * The feature id for the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__COULOMB_FRICTION = MOTOR_DRIVEN_PLANT__COULOMB_FRICTION;

	/**
	 * The feature id for the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__MOTOR_INERTIA = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Screw Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__SCREW_INERTIA = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Load Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__LOAD_MASS = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Lead</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__LEAD = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Gear Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__GEAR_RATIO = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE__TORQUE_CONSTANT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Rigid Screw Drive</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RIGID_SCREW_DRIVE_FEATURE_COUNT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 6;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.TwoMassDriveImpl <em>Two Mass Drive</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.TwoMassDriveImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getTwoMassDrive()
	 * @generated
	 */
	int TWO_MASS_DRIVE = 7;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__ID = RIGID_SCREW_DRIVE__ID;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__CURRENT_LOOP_BANDWIDTH = RIGID_SCREW_DRIVE__CURRENT_LOOP_BANDWIDTH;

	/**
	 * The feature id for the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__VISCOUS_FRICTION = RIGID_SCREW_DRIVE__VISCOUS_FRICTION;

	/**
	 * The feature id for the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__COULOMB_FRICTION = RIGID_SCREW_DRIVE__COULOMB_FRICTION;

	/**
	 * The feature id for the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__MOTOR_INERTIA = RIGID_SCREW_DRIVE__MOTOR_INERTIA;

	/**
	 * The feature id for the '<em><b>Screw Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__SCREW_INERTIA = RIGID_SCREW_DRIVE__SCREW_INERTIA;

	/**
	 * The feature id for the '<em><b>Load Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__LOAD_MASS = RIGID_SCREW_DRIVE__LOAD_MASS;

	/**
	 * The feature id for the '<em><b>Lead</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__LEAD = RIGID_SCREW_DRIVE__LEAD;

	/**
	 * The feature id for the '<em><b>Gear Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__GEAR_RATIO = RIGID_SCREW_DRIVE__GEAR_RATIO;

	/**
	 * The feature id for the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__TORQUE_CONSTANT = RIGID_SCREW_DRIVE__TORQUE_CONSTANT;

	/**
	 * The feature id for the '<em><b>Screw Root Diameter</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER = RIGID_SCREW_DRIVE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Screw Mounting</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__SCREW_MOUNTING = RIGID_SCREW_DRIVE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Bearing Span</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__BEARING_SPAN = RIGID_SCREW_DRIVE_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Nut Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__NUT_STIFFNESS = RIGID_SCREW_DRIVE_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Bearing Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__BEARING_STIFFNESS = RIGID_SCREW_DRIVE_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Damping Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__DAMPING_RATIO = RIGID_SCREW_DRIVE_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Nut Position Min</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__NUT_POSITION_MIN = RIGID_SCREW_DRIVE_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Nut Position Max</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE__NUT_POSITION_MAX = RIGID_SCREW_DRIVE_FEATURE_COUNT + 7;

	/**
	 * The number of structural features of the '<em>Two Mass Drive</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TWO_MASS_DRIVE_FEATURE_COUNT = RIGID_SCREW_DRIVE_FEATURE_COUNT + 8;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.RackPinionDriveImpl <em>Rack Pinion Drive</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.RackPinionDriveImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getRackPinionDrive()
	 * @generated
	 */
	int RACK_PINION_DRIVE = 8;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__ID = MOTOR_DRIVEN_PLANT__ID;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__CURRENT_LOOP_BANDWIDTH = MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH;

	/**
	 * The feature id for the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__VISCOUS_FRICTION = MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION;

	/**
	 * The feature id for the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__COULOMB_FRICTION = MOTOR_DRIVEN_PLANT__COULOMB_FRICTION;

	/**
	 * The feature id for the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__MOTOR_INERTIA = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Gearbox Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__GEARBOX_INERTIA = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Pinion Radius</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__PINION_RADIUS = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Gear Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__GEAR_RATIO = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Load Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__LOAD_MASS = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__TORQUE_CONSTANT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Drivetrain Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 6;

	/**
	 * The number of structural features of the '<em>Rack Pinion Drive</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int RACK_PINION_DRIVE_FEATURE_COUNT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 7;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.DirectDriveImpl <em>Direct Drive</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.DirectDriveImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getDirectDrive()
	 * @generated
	 */
	int DIRECT_DRIVE = 9;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE__ID = MOTOR_DRIVEN_PLANT__ID;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE__CURRENT_LOOP_BANDWIDTH = MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH;

	/**
	 * The feature id for the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE__VISCOUS_FRICTION = MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION;

	/**
	 * The feature id for the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE__COULOMB_FRICTION = MOTOR_DRIVEN_PLANT__COULOMB_FRICTION;

	/**
	 * The feature id for the '<em><b>Moving Mass</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE__MOVING_MASS = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Force Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE__FORCE_CONSTANT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Direct Drive</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int DIRECT_DRIVE_FEATURE_COUNT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 2;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.RotaryTableImpl <em>Rotary Table</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.RotaryTableImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getRotaryTable()
	 * @generated
	 */
	int ROTARY_TABLE = 10;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__ID = MOTOR_DRIVEN_PLANT__ID;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__CURRENT_LOOP_BANDWIDTH = MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH;

	/**
	 * The feature id for the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__VISCOUS_FRICTION = MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION;

	/**
	 * The feature id for the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__COULOMB_FRICTION = MOTOR_DRIVEN_PLANT__COULOMB_FRICTION;

	/**
	 * The feature id for the '<em><b>Motor Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__MOTOR_INERTIA = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Table Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__TABLE_INERTIA = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Gear Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__GEAR_RATIO = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__TORQUE_CONSTANT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Torsional Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE__TORSIONAL_STIFFNESS = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 4;

	/**
	 * The number of structural features of the '<em>Rotary Table</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ROTARY_TABLE_FEATURE_COUNT = MOTOR_DRIVEN_PLANT_FEATURE_COUNT + 5;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.TransferFunctionPlantImpl <em>Transfer Function Plant</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.TransferFunctionPlantImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getTransferFunctionPlant()
	 * @generated
	 */
	int TRANSFER_FUNCTION_PLANT = 11;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__ID = PLANT__ID;

	/**
	 * The feature id for the '<em><b>Numerator</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__NUMERATOR = PLANT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Denominator</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__DENOMINATOR = PLANT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Dead Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__DEAD_TIME = PLANT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__RATIO = PLANT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Equivalent Inertia</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA = PLANT_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Torque Constant</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT = PLANT_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH = PLANT_FEATURE_COUNT + 6;

	/**
	 * The number of structural features of the '<em>Transfer Function Plant</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_PLANT_FEATURE_COUNT = PLANT_FEATURE_COUNT + 7;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.ControllerImpl <em>Controller</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.ControllerImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getController()
	 * @generated
	 */
	int CONTROLLER = 12;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTROLLER__ID = IDENTIFIED__ID;

	/**
	 * The number of structural features of the '<em>Controller</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTROLLER_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.CascadeControllerImpl <em>Cascade Controller</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.CascadeControllerImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getCascadeController()
	 * @generated
	 */
	int CASCADE_CONTROLLER = 13;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__ID = CONTROLLER__ID;

	/**
	 * The feature id for the '<em><b>Position Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__POSITION_GAIN = CONTROLLER_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Velocity Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__VELOCITY_GAIN = CONTROLLER_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Velocity Integral Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME = CONTROLLER_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Velocity Feedforward</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD = CONTROLLER_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Acceleration Feedforward</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD = CONTROLLER_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Filter Stages</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__FILTER_STAGES = CONTROLLER_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Position Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD = CONTROLLER_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Velocity Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD = CONTROLLER_FEATURE_COUNT + 7;

	/**
	 * The number of structural features of the '<em>Cascade Controller</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CASCADE_CONTROLLER_FEATURE_COUNT = CONTROLLER_FEATURE_COUNT + 8;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.PidControllerImpl <em>Pid Controller</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.PidControllerImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getPidController()
	 * @generated
	 */
	int PID_CONTROLLER = 14;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER__ID = CONTROLLER__ID;

	/**
	 * The feature id for the '<em><b>Proportional Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER__PROPORTIONAL_GAIN = CONTROLLER_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Integral Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER__INTEGRAL_GAIN = CONTROLLER_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Derivative Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER__DERIVATIVE_GAIN = CONTROLLER_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Derivative Filter Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER__DERIVATIVE_FILTER_TIME = CONTROLLER_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER__SAMPLE_PERIOD = CONTROLLER_FEATURE_COUNT + 4;

	/**
	 * The number of structural features of the '<em>Pid Controller</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int PID_CONTROLLER_FEATURE_COUNT = CONTROLLER_FEATURE_COUNT + 5;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.TransferFunctionControllerImpl <em>Transfer Function Controller</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.TransferFunctionControllerImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getTransferFunctionController()
	 * @generated
	 */
	int TRANSFER_FUNCTION_CONTROLLER = 15;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_CONTROLLER__ID = CONTROLLER__ID;

	/**
	 * The feature id for the '<em><b>Numerator</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_CONTROLLER__NUMERATOR = CONTROLLER_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Denominator</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR = CONTROLLER_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD = CONTROLLER_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Transfer Function Controller</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int TRANSFER_FUNCTION_CONTROLLER_FEATURE_COUNT = CONTROLLER_FEATURE_COUNT + 3;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.FilterStageImpl <em>Filter Stage</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.FilterStageImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getFilterStage()
	 * @generated
	 */
	int FILTER_STAGE = 16;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FILTER_STAGE__ID = IDENTIFIED__ID;

	/**
	 * The number of structural features of the '<em>Filter Stage</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FILTER_STAGE_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.LowPassFilterImpl <em>Low Pass Filter</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.LowPassFilterImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getLowPassFilter()
	 * @generated
	 */
	int LOW_PASS_FILTER = 17;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LOW_PASS_FILTER__ID = FILTER_STAGE__ID;

	/**
	 * The feature id for the '<em><b>Order</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LOW_PASS_FILTER__ORDER = FILTER_STAGE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Cutoff Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LOW_PASS_FILTER__CUTOFF_FREQUENCY = FILTER_STAGE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Damping Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LOW_PASS_FILTER__DAMPING_RATIO = FILTER_STAGE_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Low Pass Filter</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LOW_PASS_FILTER_FEATURE_COUNT = FILTER_STAGE_FEATURE_COUNT + 3;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.NotchFilterImpl <em>Notch Filter</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.NotchFilterImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getNotchFilter()
	 * @generated
	 */
	int NOTCH_FILTER = 18;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NOTCH_FILTER__ID = FILTER_STAGE__ID;

	/**
	 * The feature id for the '<em><b>Centre Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NOTCH_FILTER__CENTRE_FREQUENCY = FILTER_STAGE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Width</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NOTCH_FILTER__WIDTH = FILTER_STAGE_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Depth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NOTCH_FILTER__DEPTH = FILTER_STAGE_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Notch Filter</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int NOTCH_FILTER_FEATURE_COUNT = FILTER_STAGE_FEATURE_COUNT + 3;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.LeadLagFilterImpl <em>Lead Lag Filter</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.LeadLagFilterImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getLeadLagFilter()
	 * @generated
	 */
	int LEAD_LAG_FILTER = 19;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LEAD_LAG_FILTER__ID = FILTER_STAGE__ID;

	/**
	 * The feature id for the '<em><b>Zero Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LEAD_LAG_FILTER__ZERO_FREQUENCY = FILTER_STAGE_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Pole Frequency</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LEAD_LAG_FILTER__POLE_FREQUENCY = FILTER_STAGE_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Lead Lag Filter</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LEAD_LAG_FILTER_FEATURE_COUNT = FILTER_STAGE_FEATURE_COUNT + 2;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.EncoderImpl <em>Encoder</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.EncoderImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getEncoder()
	 * @generated
	 */
	int ENCODER = 20;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ENCODER__ID = IDENTIFIED__ID;

	/**
	 * The feature id for the '<em><b>Side</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ENCODER__SIDE = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Linear Resolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ENCODER__LINEAR_RESOLUTION = IDENTIFIED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Counts Per Revolution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ENCODER__COUNTS_PER_REVOLUTION = IDENTIFIED_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Encoder</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ENCODER_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 3;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.ContourImpl <em>Contour</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.ContourImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getContour()
	 * @generated
	 */
	int CONTOUR = 21;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__ID = NAMED__ID;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__NAME = NAMED__NAME;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__DESCRIPTION = NAMED__DESCRIPTION;

	/**
	 * The feature id for the '<em><b>Feed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__FEED = NAMED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Path Acceleration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__PATH_ACCELERATION = NAMED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Path Jerk</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__PATH_JERK = NAMED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__SAMPLE_PERIOD = NAMED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Start X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__START_X = NAMED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Start Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__START_Y = NAMED_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Axis Assignment</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__AXIS_ASSIGNMENT = NAMED_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Segments</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR__SEGMENTS = NAMED_FEATURE_COUNT + 7;

	/**
	 * The number of structural features of the '<em>Contour</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CONTOUR_FEATURE_COUNT = NAMED_FEATURE_COUNT + 8;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.SegmentImpl <em>Segment</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.SegmentImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getSegment()
	 * @generated
	 */
	int SEGMENT = 22;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SEGMENT__ID = IDENTIFIED__ID;

	/**
	 * The number of structural features of the '<em>Segment</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int SEGMENT_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.LineImpl <em>Line</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.LineImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getLine()
	 * @generated
	 */
	int LINE = 23;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LINE__ID = SEGMENT__ID;

	/**
	 * The feature id for the '<em><b>End X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LINE__END_X = SEGMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>End Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LINE__END_Y = SEGMENT_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Line</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int LINE_FEATURE_COUNT = SEGMENT_FEATURE_COUNT + 2;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.ArcImpl <em>Arc</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.ArcImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getArc()
	 * @generated
	 */
	int ARC = 24;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC__ID = SEGMENT__ID;

	/**
	 * The feature id for the '<em><b>End X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC__END_X = SEGMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>End Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC__END_Y = SEGMENT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Centre X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC__CENTRE_X = SEGMENT_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Centre Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC__CENTRE_Y = SEGMENT_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Direction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC__DIRECTION = SEGMENT_FEATURE_COUNT + 4;

	/**
	 * The number of structural features of the '<em>Arc</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int ARC_FEATURE_COUNT = SEGMENT_FEATURE_COUNT + 5;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.FullCircleImpl <em>Full Circle</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.FullCircleImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getFullCircle()
	 * @generated
	 */
	int FULL_CIRCLE = 25;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FULL_CIRCLE__ID = SEGMENT__ID;

	/**
	 * The feature id for the '<em><b>Centre X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FULL_CIRCLE__CENTRE_X = SEGMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Centre Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FULL_CIRCLE__CENTRE_Y = SEGMENT_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Direction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FULL_CIRCLE__DIRECTION = SEGMENT_FEATURE_COUNT + 2;

	/**
	 * The number of structural features of the '<em>Full Circle</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int FULL_CIRCLE_FEATURE_COUNT = SEGMENT_FEATURE_COUNT + 3;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.CornerImpl <em>Corner</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.CornerImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getCorner()
	 * @generated
	 */
	int CORNER = 26;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CORNER__ID = SEGMENT__ID;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CORNER__KIND = SEGMENT_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Rounding Tolerance</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CORNER__ROUNDING_TOLERANCE = SEGMENT_FEATURE_COUNT + 1;

	/**
	 * The number of structural features of the '<em>Corner</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int CORNER_FEATURE_COUNT = SEGMENT_FEATURE_COUNT + 2;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.RequirementImpl <em>Requirement</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.RequirementImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getRequirement()
	 * @generated
	 */
	int REQUIREMENT = 27;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__ID = IDENTIFIED__ID;

	/**
	 * The feature id for the '<em><b>Statement</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__STATEMENT = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__KIND = IDENTIFIED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Metric</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__METRIC = IDENTIFIED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Contours</b></em>' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__CONTOURS = IDENTIFIED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Bound</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__BOUND = IDENTIFIED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Limit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__LIMIT = IDENTIFIED_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Display Unit</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__DISPLAY_UNIT = IDENTIFIED_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Parent</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__PARENT = IDENTIFIED_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Allocated Axis</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__ALLOCATED_AXIS = IDENTIFIED_FEATURE_COUNT + 8;

	/**
	 * The feature id for the '<em><b>Rationale</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT__RATIONALE = IDENTIFIED_FEATURE_COUNT + 9;

	/**
	 * The number of structural features of the '<em>Requirement</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int REQUIREMENT_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 10;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.BudgetLineImpl <em>Budget Line</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.BudgetLineImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getBudgetLine()
	 * @generated
	 */
	int BUDGET_LINE = 28;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__ID = IDENTIFIED__ID;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__NAME = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Axis</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__AXIS = IDENTIFIED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Source</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__SOURCE = IDENTIFIED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Value</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__VALUE = IDENTIFIED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Origin</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__ORIGIN = IDENTIFIED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Error Class</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__ERROR_CLASS = IDENTIFIED_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>Distribution</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__DISTRIBUTION = IDENTIFIED_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>Sensitivity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__SENSITIVITY = IDENTIFIED_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Evidence</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE__EVIDENCE = IDENTIFIED_FEATURE_COUNT + 8;

	/**
	 * The number of structural features of the '<em>Budget Line</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int BUDGET_LINE_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 9;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.VariationStudyImpl <em>Variation Study</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.VariationStudyImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getVariationStudy()
	 * @generated
	 */
	int VARIATION_STUDY = 29;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__ID = NAMED__ID;

	/**
	 * The feature id for the '<em><b>Name</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__NAME = NAMED__NAME;

	/**
	 * The feature id for the '<em><b>Description</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__DESCRIPTION = NAMED__DESCRIPTION;

	/**
	 * The feature id for the '<em><b>Kind</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__KIND = NAMED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Variant Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__VARIANT_COUNT = NAMED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Seed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__SEED = NAMED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Worst Variant Count</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__WORST_VARIANT_COUNT = NAMED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Metrics</b></em>' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__METRICS = NAMED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Parameters</b></em>' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY__PARAMETERS = NAMED_FEATURE_COUNT + 5;

	/**
	 * The number of structural features of the '<em>Variation Study</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIATION_STUDY_FEATURE_COUNT = NAMED_FEATURE_COUNT + 6;

	/**
	 * The meta object id for the '{@link org.tracewell.model.impl.VariedParameterImpl <em>Varied Parameter</em>}' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.impl.VariedParameterImpl
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getVariedParameter()
	 * @generated
	 */
	int VARIED_PARAMETER = 30;

	/**
	 * The feature id for the '<em><b>Id</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__ID = IDENTIFIED__ID;

	/**
	 * The feature id for the '<em><b>Path</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__PATH = IDENTIFIED_FEATURE_COUNT + 0;

	/**
	 * The feature id for the '<em><b>Shape</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__SHAPE = IDENTIFIED_FEATURE_COUNT + 1;

	/**
	 * The feature id for the '<em><b>Sigma</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__SIGMA = IDENTIFIED_FEATURE_COUNT + 2;

	/**
	 * The feature id for the '<em><b>Half Width</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__HALF_WIDTH = IDENTIFIED_FEATURE_COUNT + 3;

	/**
	 * The feature id for the '<em><b>Minimum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__MINIMUM = IDENTIFIED_FEATURE_COUNT + 4;

	/**
	 * The feature id for the '<em><b>Maximum</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__MAXIMUM = IDENTIFIED_FEATURE_COUNT + 5;

	/**
	 * The feature id for the '<em><b>From</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__FROM = IDENTIFIED_FEATURE_COUNT + 6;

	/**
	 * The feature id for the '<em><b>To</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__TO = IDENTIFIED_FEATURE_COUNT + 7;

	/**
	 * The feature id for the '<em><b>Steps</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER__STEPS = IDENTIFIED_FEATURE_COUNT + 8;

	/**
	 * The number of structural features of the '<em>Varied Parameter</em>' class.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	int VARIED_PARAMETER_FEATURE_COUNT = IDENTIFIED_FEATURE_COUNT + 9;

	/**
	 * The meta object id for the '{@link org.tracewell.model.AxisKind <em>Axis Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.AxisKind
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getAxisKind()
	 * @generated
	 */
	int AXIS_KIND = 31;

	/**
	 * The meta object id for the '{@link org.tracewell.model.ScrewMounting <em>Screw Mounting</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.ScrewMounting
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getScrewMounting()
	 * @generated
	 */
	int SCREW_MOUNTING = 32;

	/**
	 * The meta object id for the '{@link org.tracewell.model.LowPassOrder <em>Low Pass Order</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.LowPassOrder
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getLowPassOrder()
	 * @generated
	 */
	int LOW_PASS_ORDER = 33;

	/**
	 * The meta object id for the '{@link org.tracewell.model.EncoderSide <em>Encoder Side</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.EncoderSide
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getEncoderSide()
	 * @generated
	 */
	int ENCODER_SIDE = 34;

	/**
	 * The meta object id for the '{@link org.tracewell.model.Direction <em>Direction</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.Direction
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getDirection()
	 * @generated
	 */
	int DIRECTION = 35;

	/**
	 * The meta object id for the '{@link org.tracewell.model.CornerKind <em>Corner Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.CornerKind
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getCornerKind()
	 * @generated
	 */
	int CORNER_KIND = 36;

	/**
	 * The meta object id for the '{@link org.tracewell.model.RequirementKind <em>Requirement Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.RequirementKind
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getRequirementKind()
	 * @generated
	 */
	int REQUIREMENT_KIND = 37;

	/**
	 * The meta object id for the '{@link org.tracewell.model.ContourMetric <em>Contour Metric</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.ContourMetric
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getContourMetric()
	 * @generated
	 */
	int CONTOUR_METRIC = 38;

	/**
	 * The meta object id for the '{@link org.tracewell.model.LimitBound <em>Limit Bound</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.LimitBound
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getLimitBound()
	 * @generated
	 */
	int LIMIT_BOUND = 39;

	/**
	 * The meta object id for the '{@link org.tracewell.model.BudgetSource <em>Budget Source</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.BudgetSource
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getBudgetSource()
	 * @generated
	 */
	int BUDGET_SOURCE = 40;

	/**
	 * The meta object id for the '{@link org.tracewell.model.ValueOrigin <em>Value Origin</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.ValueOrigin
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getValueOrigin()
	 * @generated
	 */
	int VALUE_ORIGIN = 41;

	/**
	 * The meta object id for the '{@link org.tracewell.model.ErrorClass <em>Error Class</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.ErrorClass
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getErrorClass()
	 * @generated
	 */
	int ERROR_CLASS = 42;

	/**
	 * The meta object id for the '{@link org.tracewell.model.Distribution <em>Distribution</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.Distribution
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getDistribution()
	 * @generated
	 */
	int DISTRIBUTION = 43;


	/**
	 * The meta object id for the '{@link org.tracewell.model.StudyKind <em>Study Kind</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.StudyKind
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getStudyKind()
	 * @generated
	 */
	int STUDY_KIND = 44;

	/**
	 * The meta object id for the '{@link org.tracewell.model.ToleranceShape <em>Tolerance Shape</em>}' enum.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see org.tracewell.model.ToleranceShape
	 * @see org.tracewell.model.impl.TracewellPackageImpl#getToleranceShape()
	 * @generated
	 */
	int TOLERANCE_SHAPE = 45;


	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Identified <em>Identified</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Identified</em>'.
	 * @see org.tracewell.model.Identified
	 * @generated
	 */
	EClass getIdentified();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Identified#getId <em>Id</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Id</em>'.
	 * @see org.tracewell.model.Identified#getId()
	 * @see #getIdentified()
	 * @generated
	 */
	EAttribute getIdentified_Id();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Named <em>Named</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Named</em>'.
	 * @see org.tracewell.model.Named
	 * @generated
	 */
	EClass getNamed();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Named#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracewell.model.Named#getName()
	 * @see #getNamed()
	 * @generated
	 */
	EAttribute getNamed_Name();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Named#getDescription <em>Description</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Description</em>'.
	 * @see org.tracewell.model.Named#getDescription()
	 * @see #getNamed()
	 * @generated
	 */
	EAttribute getNamed_Description();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Machine <em>Machine</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Machine</em>'.
	 * @see org.tracewell.model.Machine
	 * @generated
	 */
	EClass getMachine();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Machine#getInterpolationPeriod <em>Interpolation Period</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Interpolation Period</em>'.
	 * @see org.tracewell.model.Machine#getInterpolationPeriod()
	 * @see #getMachine()
	 * @generated
	 */
	EAttribute getMachine_InterpolationPeriod();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.Machine#getAxes <em>Axes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Axes</em>'.
	 * @see org.tracewell.model.Machine#getAxes()
	 * @see #getMachine()
	 * @generated
	 */
	EReference getMachine_Axes();

	/**
	 * Returns the meta object for the reference list '{@link org.tracewell.model.Machine#getLibraryAxes <em>Library Axes</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Library Axes</em>'.
	 * @see org.tracewell.model.Machine#getLibraryAxes()
	 * @see #getMachine()
	 * @generated
	 */
	EReference getMachine_LibraryAxes();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.Machine#getContours <em>Contours</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Contours</em>'.
	 * @see org.tracewell.model.Machine#getContours()
	 * @see #getMachine()
	 * @generated
	 */
	EReference getMachine_Contours();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.Machine#getRequirements <em>Requirements</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Requirements</em>'.
	 * @see org.tracewell.model.Machine#getRequirements()
	 * @see #getMachine()
	 * @generated
	 */
	EReference getMachine_Requirements();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.Machine#getBudgetLines <em>Budget Lines</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Budget Lines</em>'.
	 * @see org.tracewell.model.Machine#getBudgetLines()
	 * @see #getMachine()
	 * @generated
	 */
	EReference getMachine_BudgetLines();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.Machine#getStudies <em>Studies</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Studies</em>'.
	 * @see org.tracewell.model.Machine#getStudies()
	 * @see #getMachine()
	 * @generated
	 */
	EReference getMachine_Studies();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Axis <em>Axis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Axis</em>'.
	 * @see org.tracewell.model.Axis
	 * @generated
	 */
	EClass getAxis();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Axis#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see org.tracewell.model.Axis#getKind()
	 * @see #getAxis()
	 * @generated
	 */
	EAttribute getAxis_Kind();

	/**
	 * Returns the meta object for the containment reference '{@link org.tracewell.model.Axis#getPlant <em>Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Plant</em>'.
	 * @see org.tracewell.model.Axis#getPlant()
	 * @see #getAxis()
	 * @generated
	 */
	EReference getAxis_Plant();

	/**
	 * Returns the meta object for the containment reference '{@link org.tracewell.model.Axis#getController <em>Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Controller</em>'.
	 * @see org.tracewell.model.Axis#getController()
	 * @see #getAxis()
	 * @generated
	 */
	EReference getAxis_Controller();

	/**
	 * Returns the meta object for the containment reference '{@link org.tracewell.model.Axis#getEncoder <em>Encoder</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference '<em>Encoder</em>'.
	 * @see org.tracewell.model.Axis#getEncoder()
	 * @see #getAxis()
	 * @generated
	 */
	EReference getAxis_Encoder();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Axis#getMaxVelocity <em>Max Velocity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Velocity</em>'.
	 * @see org.tracewell.model.Axis#getMaxVelocity()
	 * @see #getAxis()
	 * @generated
	 */
	EAttribute getAxis_MaxVelocity();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Axis#getMaxAcceleration <em>Max Acceleration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Acceleration</em>'.
	 * @see org.tracewell.model.Axis#getMaxAcceleration()
	 * @see #getAxis()
	 * @generated
	 */
	EAttribute getAxis_MaxAcceleration();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Axis#getMaxJerk <em>Max Jerk</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Max Jerk</em>'.
	 * @see org.tracewell.model.Axis#getMaxJerk()
	 * @see #getAxis()
	 * @generated
	 */
	EAttribute getAxis_MaxJerk();

	/**
	 * Returns the meta object for the reference '{@link org.tracewell.model.Axis#getGantryPartner <em>Gantry Partner</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Gantry Partner</em>'.
	 * @see org.tracewell.model.Axis#getGantryPartner()
	 * @see #getAxis()
	 * @generated
	 */
	EReference getAxis_GantryPartner();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Plant <em>Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Plant</em>'.
	 * @see org.tracewell.model.Plant
	 * @generated
	 */
	EClass getPlant();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.MotorDrivenPlant <em>Motor Driven Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Motor Driven Plant</em>'.
	 * @see org.tracewell.model.MotorDrivenPlant
	 * @generated
	 */
	EClass getMotorDrivenPlant();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.MotorDrivenPlant#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Current Loop Bandwidth</em>'.
	 * @see org.tracewell.model.MotorDrivenPlant#getCurrentLoopBandwidth()
	 * @see #getMotorDrivenPlant()
	 * @generated
	 */
	EAttribute getMotorDrivenPlant_CurrentLoopBandwidth();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.MotorDrivenPlant#getViscousFriction <em>Viscous Friction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Viscous Friction</em>'.
	 * @see org.tracewell.model.MotorDrivenPlant#getViscousFriction()
	 * @see #getMotorDrivenPlant()
	 * @generated
	 */
	EAttribute getMotorDrivenPlant_ViscousFriction();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.MotorDrivenPlant#getCoulombFriction <em>Coulomb Friction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Coulomb Friction</em>'.
	 * @see org.tracewell.model.MotorDrivenPlant#getCoulombFriction()
	 * @see #getMotorDrivenPlant()
	 * @generated
	 */
	EAttribute getMotorDrivenPlant_CoulombFriction();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.RigidScrewDrive <em>Rigid Screw Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Rigid Screw Drive</em>'.
	 * @see org.tracewell.model.RigidScrewDrive
	 * @generated
	 */
	EClass getRigidScrewDrive();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RigidScrewDrive#getMotorInertia <em>Motor Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Motor Inertia</em>'.
	 * @see org.tracewell.model.RigidScrewDrive#getMotorInertia()
	 * @see #getRigidScrewDrive()
	 * @generated
	 */
	EAttribute getRigidScrewDrive_MotorInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RigidScrewDrive#getScrewInertia <em>Screw Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Screw Inertia</em>'.
	 * @see org.tracewell.model.RigidScrewDrive#getScrewInertia()
	 * @see #getRigidScrewDrive()
	 * @generated
	 */
	EAttribute getRigidScrewDrive_ScrewInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RigidScrewDrive#getLoadMass <em>Load Mass</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Load Mass</em>'.
	 * @see org.tracewell.model.RigidScrewDrive#getLoadMass()
	 * @see #getRigidScrewDrive()
	 * @generated
	 */
	EAttribute getRigidScrewDrive_LoadMass();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RigidScrewDrive#getLead <em>Lead</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Lead</em>'.
	 * @see org.tracewell.model.RigidScrewDrive#getLead()
	 * @see #getRigidScrewDrive()
	 * @generated
	 */
	EAttribute getRigidScrewDrive_Lead();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RigidScrewDrive#getGearRatio <em>Gear Ratio</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Gear Ratio</em>'.
	 * @see org.tracewell.model.RigidScrewDrive#getGearRatio()
	 * @see #getRigidScrewDrive()
	 * @generated
	 */
	EAttribute getRigidScrewDrive_GearRatio();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RigidScrewDrive#getTorqueConstant <em>Torque Constant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Torque Constant</em>'.
	 * @see org.tracewell.model.RigidScrewDrive#getTorqueConstant()
	 * @see #getRigidScrewDrive()
	 * @generated
	 */
	EAttribute getRigidScrewDrive_TorqueConstant();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.TwoMassDrive <em>Two Mass Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Two Mass Drive</em>'.
	 * @see org.tracewell.model.TwoMassDrive
	 * @generated
	 */
	EClass getTwoMassDrive();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getScrewRootDiameter <em>Screw Root Diameter</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Screw Root Diameter</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getScrewRootDiameter()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_ScrewRootDiameter();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getScrewMounting <em>Screw Mounting</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Screw Mounting</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getScrewMounting()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_ScrewMounting();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getBearingSpan <em>Bearing Span</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bearing Span</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getBearingSpan()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_BearingSpan();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getNutStiffness <em>Nut Stiffness</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Nut Stiffness</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getNutStiffness()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_NutStiffness();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getBearingStiffness <em>Bearing Stiffness</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bearing Stiffness</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getBearingStiffness()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_BearingStiffness();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getDampingRatio <em>Damping Ratio</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Damping Ratio</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getDampingRatio()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_DampingRatio();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getNutPositionMin <em>Nut Position Min</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Nut Position Min</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getNutPositionMin()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_NutPositionMin();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TwoMassDrive#getNutPositionMax <em>Nut Position Max</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Nut Position Max</em>'.
	 * @see org.tracewell.model.TwoMassDrive#getNutPositionMax()
	 * @see #getTwoMassDrive()
	 * @generated
	 */
	EAttribute getTwoMassDrive_NutPositionMax();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.RackPinionDrive <em>Rack Pinion Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Rack Pinion Drive</em>'.
	 * @see org.tracewell.model.RackPinionDrive
	 * @generated
	 */
	EClass getRackPinionDrive();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getMotorInertia <em>Motor Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Motor Inertia</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getMotorInertia()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_MotorInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getGearboxInertia <em>Gearbox Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Gearbox Inertia</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getGearboxInertia()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_GearboxInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getPinionRadius <em>Pinion Radius</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Pinion Radius</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getPinionRadius()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_PinionRadius();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getGearRatio <em>Gear Ratio</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Gear Ratio</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getGearRatio()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_GearRatio();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getLoadMass <em>Load Mass</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Load Mass</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getLoadMass()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_LoadMass();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getTorqueConstant <em>Torque Constant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Torque Constant</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getTorqueConstant()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_TorqueConstant();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RackPinionDrive#getDrivetrainStiffness <em>Drivetrain Stiffness</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Drivetrain Stiffness</em>'.
	 * @see org.tracewell.model.RackPinionDrive#getDrivetrainStiffness()
	 * @see #getRackPinionDrive()
	 * @generated
	 */
	EAttribute getRackPinionDrive_DrivetrainStiffness();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.DirectDrive <em>Direct Drive</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Direct Drive</em>'.
	 * @see org.tracewell.model.DirectDrive
	 * @generated
	 */
	EClass getDirectDrive();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.DirectDrive#getMovingMass <em>Moving Mass</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Moving Mass</em>'.
	 * @see org.tracewell.model.DirectDrive#getMovingMass()
	 * @see #getDirectDrive()
	 * @generated
	 */
	EAttribute getDirectDrive_MovingMass();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.DirectDrive#getForceConstant <em>Force Constant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Force Constant</em>'.
	 * @see org.tracewell.model.DirectDrive#getForceConstant()
	 * @see #getDirectDrive()
	 * @generated
	 */
	EAttribute getDirectDrive_ForceConstant();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.RotaryTable <em>Rotary Table</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Rotary Table</em>'.
	 * @see org.tracewell.model.RotaryTable
	 * @generated
	 */
	EClass getRotaryTable();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RotaryTable#getMotorInertia <em>Motor Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Motor Inertia</em>'.
	 * @see org.tracewell.model.RotaryTable#getMotorInertia()
	 * @see #getRotaryTable()
	 * @generated
	 */
	EAttribute getRotaryTable_MotorInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RotaryTable#getTableInertia <em>Table Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Table Inertia</em>'.
	 * @see org.tracewell.model.RotaryTable#getTableInertia()
	 * @see #getRotaryTable()
	 * @generated
	 */
	EAttribute getRotaryTable_TableInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RotaryTable#getGearRatio <em>Gear Ratio</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Gear Ratio</em>'.
	 * @see org.tracewell.model.RotaryTable#getGearRatio()
	 * @see #getRotaryTable()
	 * @generated
	 */
	EAttribute getRotaryTable_GearRatio();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RotaryTable#getTorqueConstant <em>Torque Constant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Torque Constant</em>'.
	 * @see org.tracewell.model.RotaryTable#getTorqueConstant()
	 * @see #getRotaryTable()
	 * @generated
	 */
	EAttribute getRotaryTable_TorqueConstant();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.RotaryTable#getTorsionalStiffness <em>Torsional Stiffness</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Torsional Stiffness</em>'.
	 * @see org.tracewell.model.RotaryTable#getTorsionalStiffness()
	 * @see #getRotaryTable()
	 * @generated
	 */
	EAttribute getRotaryTable_TorsionalStiffness();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.TransferFunctionPlant <em>Transfer Function Plant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Transfer Function Plant</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant
	 * @generated
	 */
	EClass getTransferFunctionPlant();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracewell.model.TransferFunctionPlant#getNumerator <em>Numerator</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Numerator</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getNumerator()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_Numerator();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracewell.model.TransferFunctionPlant#getDenominator <em>Denominator</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Denominator</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getDenominator()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_Denominator();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TransferFunctionPlant#getDeadTime <em>Dead Time</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Dead Time</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getDeadTime()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_DeadTime();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TransferFunctionPlant#getRatio <em>Ratio</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Ratio</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getRatio()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_Ratio();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TransferFunctionPlant#getEquivalentInertia <em>Equivalent Inertia</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Equivalent Inertia</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getEquivalentInertia()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_EquivalentInertia();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TransferFunctionPlant#getTorqueConstant <em>Torque Constant</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Torque Constant</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getTorqueConstant()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_TorqueConstant();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TransferFunctionPlant#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Current Loop Bandwidth</em>'.
	 * @see org.tracewell.model.TransferFunctionPlant#getCurrentLoopBandwidth()
	 * @see #getTransferFunctionPlant()
	 * @generated
	 */
	EAttribute getTransferFunctionPlant_CurrentLoopBandwidth();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Controller <em>Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Controller</em>'.
	 * @see org.tracewell.model.Controller
	 * @generated
	 */
	EClass getController();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.CascadeController <em>Cascade Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Cascade Controller</em>'.
	 * @see org.tracewell.model.CascadeController
	 * @generated
	 */
	EClass getCascadeController();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getPositionGain <em>Position Gain</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Position Gain</em>'.
	 * @see org.tracewell.model.CascadeController#getPositionGain()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_PositionGain();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getVelocityGain <em>Velocity Gain</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Velocity Gain</em>'.
	 * @see org.tracewell.model.CascadeController#getVelocityGain()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_VelocityGain();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getVelocityIntegralTime <em>Velocity Integral Time</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Velocity Integral Time</em>'.
	 * @see org.tracewell.model.CascadeController#getVelocityIntegralTime()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_VelocityIntegralTime();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getVelocityFeedforward <em>Velocity Feedforward</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Velocity Feedforward</em>'.
	 * @see org.tracewell.model.CascadeController#getVelocityFeedforward()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_VelocityFeedforward();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getAccelerationFeedforward <em>Acceleration Feedforward</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Acceleration Feedforward</em>'.
	 * @see org.tracewell.model.CascadeController#getAccelerationFeedforward()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_AccelerationFeedforward();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.CascadeController#getFilterStages <em>Filter Stages</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Filter Stages</em>'.
	 * @see org.tracewell.model.CascadeController#getFilterStages()
	 * @see #getCascadeController()
	 * @generated
	 */
	EReference getCascadeController_FilterStages();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getPositionSamplePeriod <em>Position Sample Period</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Position Sample Period</em>'.
	 * @see org.tracewell.model.CascadeController#getPositionSamplePeriod()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_PositionSamplePeriod();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.CascadeController#getVelocitySamplePeriod <em>Velocity Sample Period</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Velocity Sample Period</em>'.
	 * @see org.tracewell.model.CascadeController#getVelocitySamplePeriod()
	 * @see #getCascadeController()
	 * @generated
	 */
	EAttribute getCascadeController_VelocitySamplePeriod();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.PidController <em>Pid Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Pid Controller</em>'.
	 * @see org.tracewell.model.PidController
	 * @generated
	 */
	EClass getPidController();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.PidController#getProportionalGain <em>Proportional Gain</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Proportional Gain</em>'.
	 * @see org.tracewell.model.PidController#getProportionalGain()
	 * @see #getPidController()
	 * @generated
	 */
	EAttribute getPidController_ProportionalGain();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.PidController#getIntegralGain <em>Integral Gain</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Integral Gain</em>'.
	 * @see org.tracewell.model.PidController#getIntegralGain()
	 * @see #getPidController()
	 * @generated
	 */
	EAttribute getPidController_IntegralGain();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.PidController#getDerivativeGain <em>Derivative Gain</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Derivative Gain</em>'.
	 * @see org.tracewell.model.PidController#getDerivativeGain()
	 * @see #getPidController()
	 * @generated
	 */
	EAttribute getPidController_DerivativeGain();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.PidController#getDerivativeFilterTime <em>Derivative Filter Time</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Derivative Filter Time</em>'.
	 * @see org.tracewell.model.PidController#getDerivativeFilterTime()
	 * @see #getPidController()
	 * @generated
	 */
	EAttribute getPidController_DerivativeFilterTime();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.PidController#getSamplePeriod <em>Sample Period</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sample Period</em>'.
	 * @see org.tracewell.model.PidController#getSamplePeriod()
	 * @see #getPidController()
	 * @generated
	 */
	EAttribute getPidController_SamplePeriod();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.TransferFunctionController <em>Transfer Function Controller</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Transfer Function Controller</em>'.
	 * @see org.tracewell.model.TransferFunctionController
	 * @generated
	 */
	EClass getTransferFunctionController();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracewell.model.TransferFunctionController#getNumerator <em>Numerator</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Numerator</em>'.
	 * @see org.tracewell.model.TransferFunctionController#getNumerator()
	 * @see #getTransferFunctionController()
	 * @generated
	 */
	EAttribute getTransferFunctionController_Numerator();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracewell.model.TransferFunctionController#getDenominator <em>Denominator</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Denominator</em>'.
	 * @see org.tracewell.model.TransferFunctionController#getDenominator()
	 * @see #getTransferFunctionController()
	 * @generated
	 */
	EAttribute getTransferFunctionController_Denominator();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.TransferFunctionController#getSamplePeriod <em>Sample Period</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sample Period</em>'.
	 * @see org.tracewell.model.TransferFunctionController#getSamplePeriod()
	 * @see #getTransferFunctionController()
	 * @generated
	 */
	EAttribute getTransferFunctionController_SamplePeriod();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.FilterStage <em>Filter Stage</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Filter Stage</em>'.
	 * @see org.tracewell.model.FilterStage
	 * @generated
	 */
	EClass getFilterStage();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.LowPassFilter <em>Low Pass Filter</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Low Pass Filter</em>'.
	 * @see org.tracewell.model.LowPassFilter
	 * @generated
	 */
	EClass getLowPassFilter();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.LowPassFilter#getOrder <em>Order</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Order</em>'.
	 * @see org.tracewell.model.LowPassFilter#getOrder()
	 * @see #getLowPassFilter()
	 * @generated
	 */
	EAttribute getLowPassFilter_Order();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.LowPassFilter#getCutoffFrequency <em>Cutoff Frequency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Cutoff Frequency</em>'.
	 * @see org.tracewell.model.LowPassFilter#getCutoffFrequency()
	 * @see #getLowPassFilter()
	 * @generated
	 */
	EAttribute getLowPassFilter_CutoffFrequency();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.LowPassFilter#getDampingRatio <em>Damping Ratio</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Damping Ratio</em>'.
	 * @see org.tracewell.model.LowPassFilter#getDampingRatio()
	 * @see #getLowPassFilter()
	 * @generated
	 */
	EAttribute getLowPassFilter_DampingRatio();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.NotchFilter <em>Notch Filter</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Notch Filter</em>'.
	 * @see org.tracewell.model.NotchFilter
	 * @generated
	 */
	EClass getNotchFilter();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.NotchFilter#getCentreFrequency <em>Centre Frequency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Centre Frequency</em>'.
	 * @see org.tracewell.model.NotchFilter#getCentreFrequency()
	 * @see #getNotchFilter()
	 * @generated
	 */
	EAttribute getNotchFilter_CentreFrequency();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.NotchFilter#getWidth <em>Width</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Width</em>'.
	 * @see org.tracewell.model.NotchFilter#getWidth()
	 * @see #getNotchFilter()
	 * @generated
	 */
	EAttribute getNotchFilter_Width();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.NotchFilter#getDepth <em>Depth</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Depth</em>'.
	 * @see org.tracewell.model.NotchFilter#getDepth()
	 * @see #getNotchFilter()
	 * @generated
	 */
	EAttribute getNotchFilter_Depth();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.LeadLagFilter <em>Lead Lag Filter</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Lead Lag Filter</em>'.
	 * @see org.tracewell.model.LeadLagFilter
	 * @generated
	 */
	EClass getLeadLagFilter();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.LeadLagFilter#getZeroFrequency <em>Zero Frequency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Zero Frequency</em>'.
	 * @see org.tracewell.model.LeadLagFilter#getZeroFrequency()
	 * @see #getLeadLagFilter()
	 * @generated
	 */
	EAttribute getLeadLagFilter_ZeroFrequency();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.LeadLagFilter#getPoleFrequency <em>Pole Frequency</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Pole Frequency</em>'.
	 * @see org.tracewell.model.LeadLagFilter#getPoleFrequency()
	 * @see #getLeadLagFilter()
	 * @generated
	 */
	EAttribute getLeadLagFilter_PoleFrequency();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Encoder <em>Encoder</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Encoder</em>'.
	 * @see org.tracewell.model.Encoder
	 * @generated
	 */
	EClass getEncoder();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Encoder#getSide <em>Side</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Side</em>'.
	 * @see org.tracewell.model.Encoder#getSide()
	 * @see #getEncoder()
	 * @generated
	 */
	EAttribute getEncoder_Side();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Encoder#getLinearResolution <em>Linear Resolution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Linear Resolution</em>'.
	 * @see org.tracewell.model.Encoder#getLinearResolution()
	 * @see #getEncoder()
	 * @generated
	 */
	EAttribute getEncoder_LinearResolution();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Encoder#getCountsPerRevolution <em>Counts Per Revolution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Counts Per Revolution</em>'.
	 * @see org.tracewell.model.Encoder#getCountsPerRevolution()
	 * @see #getEncoder()
	 * @generated
	 */
	EAttribute getEncoder_CountsPerRevolution();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Contour <em>Contour</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Contour</em>'.
	 * @see org.tracewell.model.Contour
	 * @generated
	 */
	EClass getContour();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Contour#getFeed <em>Feed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Feed</em>'.
	 * @see org.tracewell.model.Contour#getFeed()
	 * @see #getContour()
	 * @generated
	 */
	EAttribute getContour_Feed();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Contour#getPathAcceleration <em>Path Acceleration</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Path Acceleration</em>'.
	 * @see org.tracewell.model.Contour#getPathAcceleration()
	 * @see #getContour()
	 * @generated
	 */
	EAttribute getContour_PathAcceleration();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Contour#getPathJerk <em>Path Jerk</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Path Jerk</em>'.
	 * @see org.tracewell.model.Contour#getPathJerk()
	 * @see #getContour()
	 * @generated
	 */
	EAttribute getContour_PathJerk();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Contour#getSamplePeriod <em>Sample Period</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sample Period</em>'.
	 * @see org.tracewell.model.Contour#getSamplePeriod()
	 * @see #getContour()
	 * @generated
	 */
	EAttribute getContour_SamplePeriod();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Contour#getStartX <em>Start X</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Start X</em>'.
	 * @see org.tracewell.model.Contour#getStartX()
	 * @see #getContour()
	 * @generated
	 */
	EAttribute getContour_StartX();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Contour#getStartY <em>Start Y</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Start Y</em>'.
	 * @see org.tracewell.model.Contour#getStartY()
	 * @see #getContour()
	 * @generated
	 */
	EAttribute getContour_StartY();

	/**
	 * Returns the meta object for the reference list '{@link org.tracewell.model.Contour#getAxisAssignment <em>Axis Assignment</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Axis Assignment</em>'.
	 * @see org.tracewell.model.Contour#getAxisAssignment()
	 * @see #getContour()
	 * @generated
	 */
	EReference getContour_AxisAssignment();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.Contour#getSegments <em>Segments</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Segments</em>'.
	 * @see org.tracewell.model.Contour#getSegments()
	 * @see #getContour()
	 * @generated
	 */
	EReference getContour_Segments();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Segment <em>Segment</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Segment</em>'.
	 * @see org.tracewell.model.Segment
	 * @generated
	 */
	EClass getSegment();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Line <em>Line</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Line</em>'.
	 * @see org.tracewell.model.Line
	 * @generated
	 */
	EClass getLine();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Line#getEndX <em>End X</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>End X</em>'.
	 * @see org.tracewell.model.Line#getEndX()
	 * @see #getLine()
	 * @generated
	 */
	EAttribute getLine_EndX();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Line#getEndY <em>End Y</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>End Y</em>'.
	 * @see org.tracewell.model.Line#getEndY()
	 * @see #getLine()
	 * @generated
	 */
	EAttribute getLine_EndY();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Arc <em>Arc</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Arc</em>'.
	 * @see org.tracewell.model.Arc
	 * @generated
	 */
	EClass getArc();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Arc#getEndX <em>End X</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>End X</em>'.
	 * @see org.tracewell.model.Arc#getEndX()
	 * @see #getArc()
	 * @generated
	 */
	EAttribute getArc_EndX();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Arc#getEndY <em>End Y</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>End Y</em>'.
	 * @see org.tracewell.model.Arc#getEndY()
	 * @see #getArc()
	 * @generated
	 */
	EAttribute getArc_EndY();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Arc#getCentreX <em>Centre X</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Centre X</em>'.
	 * @see org.tracewell.model.Arc#getCentreX()
	 * @see #getArc()
	 * @generated
	 */
	EAttribute getArc_CentreX();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Arc#getCentreY <em>Centre Y</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Centre Y</em>'.
	 * @see org.tracewell.model.Arc#getCentreY()
	 * @see #getArc()
	 * @generated
	 */
	EAttribute getArc_CentreY();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Arc#getDirection <em>Direction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Direction</em>'.
	 * @see org.tracewell.model.Arc#getDirection()
	 * @see #getArc()
	 * @generated
	 */
	EAttribute getArc_Direction();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.FullCircle <em>Full Circle</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Full Circle</em>'.
	 * @see org.tracewell.model.FullCircle
	 * @generated
	 */
	EClass getFullCircle();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.FullCircle#getCentreX <em>Centre X</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Centre X</em>'.
	 * @see org.tracewell.model.FullCircle#getCentreX()
	 * @see #getFullCircle()
	 * @generated
	 */
	EAttribute getFullCircle_CentreX();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.FullCircle#getCentreY <em>Centre Y</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Centre Y</em>'.
	 * @see org.tracewell.model.FullCircle#getCentreY()
	 * @see #getFullCircle()
	 * @generated
	 */
	EAttribute getFullCircle_CentreY();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.FullCircle#getDirection <em>Direction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Direction</em>'.
	 * @see org.tracewell.model.FullCircle#getDirection()
	 * @see #getFullCircle()
	 * @generated
	 */
	EAttribute getFullCircle_Direction();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Corner <em>Corner</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Corner</em>'.
	 * @see org.tracewell.model.Corner
	 * @generated
	 */
	EClass getCorner();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Corner#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see org.tracewell.model.Corner#getKind()
	 * @see #getCorner()
	 * @generated
	 */
	EAttribute getCorner_Kind();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Corner#getRoundingTolerance <em>Rounding Tolerance</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Rounding Tolerance</em>'.
	 * @see org.tracewell.model.Corner#getRoundingTolerance()
	 * @see #getCorner()
	 * @generated
	 */
	EAttribute getCorner_RoundingTolerance();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.Requirement <em>Requirement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Requirement</em>'.
	 * @see org.tracewell.model.Requirement
	 * @generated
	 */
	EClass getRequirement();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getStatement <em>Statement</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Statement</em>'.
	 * @see org.tracewell.model.Requirement#getStatement()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_Statement();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see org.tracewell.model.Requirement#getKind()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_Kind();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getMetric <em>Metric</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Metric</em>'.
	 * @see org.tracewell.model.Requirement#getMetric()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_Metric();

	/**
	 * Returns the meta object for the reference list '{@link org.tracewell.model.Requirement#getContours <em>Contours</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference list '<em>Contours</em>'.
	 * @see org.tracewell.model.Requirement#getContours()
	 * @see #getRequirement()
	 * @generated
	 */
	EReference getRequirement_Contours();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getBound <em>Bound</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Bound</em>'.
	 * @see org.tracewell.model.Requirement#getBound()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_Bound();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getLimit <em>Limit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Limit</em>'.
	 * @see org.tracewell.model.Requirement#getLimit()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_Limit();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getDisplayUnit <em>Display Unit</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Display Unit</em>'.
	 * @see org.tracewell.model.Requirement#getDisplayUnit()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_DisplayUnit();

	/**
	 * Returns the meta object for the reference '{@link org.tracewell.model.Requirement#getParent <em>Parent</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Parent</em>'.
	 * @see org.tracewell.model.Requirement#getParent()
	 * @see #getRequirement()
	 * @generated
	 */
	EReference getRequirement_Parent();

	/**
	 * Returns the meta object for the reference '{@link org.tracewell.model.Requirement#getAllocatedAxis <em>Allocated Axis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Allocated Axis</em>'.
	 * @see org.tracewell.model.Requirement#getAllocatedAxis()
	 * @see #getRequirement()
	 * @generated
	 */
	EReference getRequirement_AllocatedAxis();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.Requirement#getRationale <em>Rationale</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Rationale</em>'.
	 * @see org.tracewell.model.Requirement#getRationale()
	 * @see #getRequirement()
	 * @generated
	 */
	EAttribute getRequirement_Rationale();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.BudgetLine <em>Budget Line</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Budget Line</em>'.
	 * @see org.tracewell.model.BudgetLine
	 * @generated
	 */
	EClass getBudgetLine();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getName <em>Name</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Name</em>'.
	 * @see org.tracewell.model.BudgetLine#getName()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Name();

	/**
	 * Returns the meta object for the reference '{@link org.tracewell.model.BudgetLine#getAxis <em>Axis</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the reference '<em>Axis</em>'.
	 * @see org.tracewell.model.BudgetLine#getAxis()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EReference getBudgetLine_Axis();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getSource <em>Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Source</em>'.
	 * @see org.tracewell.model.BudgetLine#getSource()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Source();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getValue <em>Value</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Value</em>'.
	 * @see org.tracewell.model.BudgetLine#getValue()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Value();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getOrigin <em>Origin</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Origin</em>'.
	 * @see org.tracewell.model.BudgetLine#getOrigin()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Origin();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getErrorClass <em>Error Class</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Error Class</em>'.
	 * @see org.tracewell.model.BudgetLine#getErrorClass()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_ErrorClass();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getDistribution <em>Distribution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Distribution</em>'.
	 * @see org.tracewell.model.BudgetLine#getDistribution()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Distribution();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getSensitivity <em>Sensitivity</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sensitivity</em>'.
	 * @see org.tracewell.model.BudgetLine#getSensitivity()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Sensitivity();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.BudgetLine#getEvidence <em>Evidence</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Evidence</em>'.
	 * @see org.tracewell.model.BudgetLine#getEvidence()
	 * @see #getBudgetLine()
	 * @generated
	 */
	EAttribute getBudgetLine_Evidence();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.VariationStudy <em>Variation Study</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Variation Study</em>'.
	 * @see org.tracewell.model.VariationStudy
	 * @generated
	 */
	EClass getVariationStudy();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariationStudy#getKind <em>Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Kind</em>'.
	 * @see org.tracewell.model.VariationStudy#getKind()
	 * @see #getVariationStudy()
	 * @generated
	 */
	EAttribute getVariationStudy_Kind();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariationStudy#getVariantCount <em>Variant Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Variant Count</em>'.
	 * @see org.tracewell.model.VariationStudy#getVariantCount()
	 * @see #getVariationStudy()
	 * @generated
	 */
	EAttribute getVariationStudy_VariantCount();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariationStudy#getSeed <em>Seed</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Seed</em>'.
	 * @see org.tracewell.model.VariationStudy#getSeed()
	 * @see #getVariationStudy()
	 * @generated
	 */
	EAttribute getVariationStudy_Seed();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariationStudy#getWorstVariantCount <em>Worst Variant Count</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Worst Variant Count</em>'.
	 * @see org.tracewell.model.VariationStudy#getWorstVariantCount()
	 * @see #getVariationStudy()
	 * @generated
	 */
	EAttribute getVariationStudy_WorstVariantCount();

	/**
	 * Returns the meta object for the attribute list '{@link org.tracewell.model.VariationStudy#getMetrics <em>Metrics</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute list '<em>Metrics</em>'.
	 * @see org.tracewell.model.VariationStudy#getMetrics()
	 * @see #getVariationStudy()
	 * @generated
	 */
	EAttribute getVariationStudy_Metrics();

	/**
	 * Returns the meta object for the containment reference list '{@link org.tracewell.model.VariationStudy#getParameters <em>Parameters</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the containment reference list '<em>Parameters</em>'.
	 * @see org.tracewell.model.VariationStudy#getParameters()
	 * @see #getVariationStudy()
	 * @generated
	 */
	EReference getVariationStudy_Parameters();

	/**
	 * Returns the meta object for class '{@link org.tracewell.model.VariedParameter <em>Varied Parameter</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for class '<em>Varied Parameter</em>'.
	 * @see org.tracewell.model.VariedParameter
	 * @generated
	 */
	EClass getVariedParameter();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getPath <em>Path</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Path</em>'.
	 * @see org.tracewell.model.VariedParameter#getPath()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_Path();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getShape <em>Shape</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Shape</em>'.
	 * @see org.tracewell.model.VariedParameter#getShape()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_Shape();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getSigma <em>Sigma</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Sigma</em>'.
	 * @see org.tracewell.model.VariedParameter#getSigma()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_Sigma();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getHalfWidth <em>Half Width</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Half Width</em>'.
	 * @see org.tracewell.model.VariedParameter#getHalfWidth()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_HalfWidth();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getMinimum <em>Minimum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Minimum</em>'.
	 * @see org.tracewell.model.VariedParameter#getMinimum()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_Minimum();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getMaximum <em>Maximum</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Maximum</em>'.
	 * @see org.tracewell.model.VariedParameter#getMaximum()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_Maximum();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getFrom <em>From</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>From</em>'.
	 * @see org.tracewell.model.VariedParameter#getFrom()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_From();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getTo <em>To</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>To</em>'.
	 * @see org.tracewell.model.VariedParameter#getTo()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_To();

	/**
	 * Returns the meta object for the attribute '{@link org.tracewell.model.VariedParameter#getSteps <em>Steps</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for the attribute '<em>Steps</em>'.
	 * @see org.tracewell.model.VariedParameter#getSteps()
	 * @see #getVariedParameter()
	 * @generated
	 */
	EAttribute getVariedParameter_Steps();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.AxisKind <em>Axis Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Axis Kind</em>'.
	 * @see org.tracewell.model.AxisKind
	 * @generated
	 */
	EEnum getAxisKind();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.ScrewMounting <em>Screw Mounting</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Screw Mounting</em>'.
	 * @see org.tracewell.model.ScrewMounting
	 * @generated
	 */
	EEnum getScrewMounting();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.LowPassOrder <em>Low Pass Order</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Low Pass Order</em>'.
	 * @see org.tracewell.model.LowPassOrder
	 * @generated
	 */
	EEnum getLowPassOrder();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.EncoderSide <em>Encoder Side</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Encoder Side</em>'.
	 * @see org.tracewell.model.EncoderSide
	 * @generated
	 */
	EEnum getEncoderSide();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.Direction <em>Direction</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Direction</em>'.
	 * @see org.tracewell.model.Direction
	 * @generated
	 */
	EEnum getDirection();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.CornerKind <em>Corner Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Corner Kind</em>'.
	 * @see org.tracewell.model.CornerKind
	 * @generated
	 */
	EEnum getCornerKind();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.RequirementKind <em>Requirement Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Requirement Kind</em>'.
	 * @see org.tracewell.model.RequirementKind
	 * @generated
	 */
	EEnum getRequirementKind();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.ContourMetric <em>Contour Metric</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Contour Metric</em>'.
	 * @see org.tracewell.model.ContourMetric
	 * @generated
	 */
	EEnum getContourMetric();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.LimitBound <em>Limit Bound</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Limit Bound</em>'.
	 * @see org.tracewell.model.LimitBound
	 * @generated
	 */
	EEnum getLimitBound();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.BudgetSource <em>Budget Source</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Budget Source</em>'.
	 * @see org.tracewell.model.BudgetSource
	 * @generated
	 */
	EEnum getBudgetSource();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.ValueOrigin <em>Value Origin</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Value Origin</em>'.
	 * @see org.tracewell.model.ValueOrigin
	 * @generated
	 */
	EEnum getValueOrigin();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.ErrorClass <em>Error Class</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Error Class</em>'.
	 * @see org.tracewell.model.ErrorClass
	 * @generated
	 */
	EEnum getErrorClass();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.Distribution <em>Distribution</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Distribution</em>'.
	 * @see org.tracewell.model.Distribution
	 * @generated
	 */
	EEnum getDistribution();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.StudyKind <em>Study Kind</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Study Kind</em>'.
	 * @see org.tracewell.model.StudyKind
	 * @generated
	 */
	EEnum getStudyKind();

	/**
	 * Returns the meta object for enum '{@link org.tracewell.model.ToleranceShape <em>Tolerance Shape</em>}'.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the meta object for enum '<em>Tolerance Shape</em>'.
	 * @see org.tracewell.model.ToleranceShape
	 * @generated
	 */
	EEnum getToleranceShape();

	/**
	 * Returns the factory that creates the instances of the model.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the factory that creates the instances of the model.
	 * @generated
	 */
	TracewellFactory getTracewellFactory();

	/**
	 * <!-- begin-user-doc -->
	 * Defines literals for the meta objects that represent
	 * <ul>
	 *   <li>each class,</li>
	 *   <li>each feature of each class,</li>
	 *   <li>each enum,</li>
	 *   <li>and each data type</li>
	 * </ul>
	 * <!-- end-user-doc -->
	 * @generated
	 */
	interface Literals {
		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.IdentifiedImpl <em>Identified</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.IdentifiedImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getIdentified()
		 * @generated
		 */
		EClass IDENTIFIED = eINSTANCE.getIdentified();

		/**
		 * The meta object literal for the '<em><b>Id</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute IDENTIFIED__ID = eINSTANCE.getIdentified_Id();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.NamedImpl <em>Named</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.NamedImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getNamed()
		 * @generated
		 */
		EClass NAMED = eINSTANCE.getNamed();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute NAMED__NAME = eINSTANCE.getNamed_Name();

		/**
		 * The meta object literal for the '<em><b>Description</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute NAMED__DESCRIPTION = eINSTANCE.getNamed_Description();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.MachineImpl <em>Machine</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.MachineImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getMachine()
		 * @generated
		 */
		EClass MACHINE = eINSTANCE.getMachine();

		/**
		 * The meta object literal for the '<em><b>Interpolation Period</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MACHINE__INTERPOLATION_PERIOD = eINSTANCE.getMachine_InterpolationPeriod();

		/**
		 * The meta object literal for the '<em><b>Axes</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MACHINE__AXES = eINSTANCE.getMachine_Axes();

		/**
		 * The meta object literal for the '<em><b>Library Axes</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MACHINE__LIBRARY_AXES = eINSTANCE.getMachine_LibraryAxes();

		/**
		 * The meta object literal for the '<em><b>Contours</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MACHINE__CONTOURS = eINSTANCE.getMachine_Contours();

		/**
		 * The meta object literal for the '<em><b>Requirements</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MACHINE__REQUIREMENTS = eINSTANCE.getMachine_Requirements();

		/**
		 * The meta object literal for the '<em><b>Budget Lines</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MACHINE__BUDGET_LINES = eINSTANCE.getMachine_BudgetLines();

		/**
		 * The meta object literal for the '<em><b>Studies</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference MACHINE__STUDIES = eINSTANCE.getMachine_Studies();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.AxisImpl <em>Axis</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.AxisImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getAxis()
		 * @generated
		 */
		EClass AXIS = eINSTANCE.getAxis();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute AXIS__KIND = eINSTANCE.getAxis_Kind();

		/**
		 * The meta object literal for the '<em><b>Plant</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference AXIS__PLANT = eINSTANCE.getAxis_Plant();

		/**
		 * The meta object literal for the '<em><b>Controller</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference AXIS__CONTROLLER = eINSTANCE.getAxis_Controller();

		/**
		 * The meta object literal for the '<em><b>Encoder</b></em>' containment reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference AXIS__ENCODER = eINSTANCE.getAxis_Encoder();

		/**
		 * The meta object literal for the '<em><b>Max Velocity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute AXIS__MAX_VELOCITY = eINSTANCE.getAxis_MaxVelocity();

		/**
		 * The meta object literal for the '<em><b>Max Acceleration</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute AXIS__MAX_ACCELERATION = eINSTANCE.getAxis_MaxAcceleration();

		/**
		 * The meta object literal for the '<em><b>Max Jerk</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute AXIS__MAX_JERK = eINSTANCE.getAxis_MaxJerk();

		/**
		 * The meta object literal for the '<em><b>Gantry Partner</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference AXIS__GANTRY_PARTNER = eINSTANCE.getAxis_GantryPartner();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.PlantImpl <em>Plant</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.PlantImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getPlant()
		 * @generated
		 */
		EClass PLANT = eINSTANCE.getPlant();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.MotorDrivenPlantImpl <em>Motor Driven Plant</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.MotorDrivenPlantImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getMotorDrivenPlant()
		 * @generated
		 */
		EClass MOTOR_DRIVEN_PLANT = eINSTANCE.getMotorDrivenPlant();

		/**
		 * The meta object literal for the '<em><b>Current Loop Bandwidth</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MOTOR_DRIVEN_PLANT__CURRENT_LOOP_BANDWIDTH = eINSTANCE.getMotorDrivenPlant_CurrentLoopBandwidth();

		/**
		 * The meta object literal for the '<em><b>Viscous Friction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MOTOR_DRIVEN_PLANT__VISCOUS_FRICTION = eINSTANCE.getMotorDrivenPlant_ViscousFriction();

		/**
		 * The meta object literal for the '<em><b>Coulomb Friction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute MOTOR_DRIVEN_PLANT__COULOMB_FRICTION = eINSTANCE.getMotorDrivenPlant_CoulombFriction();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.RigidScrewDriveImpl <em>Rigid Screw Drive</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.RigidScrewDriveImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getRigidScrewDrive()
		 * @generated
		 */
		EClass RIGID_SCREW_DRIVE = eINSTANCE.getRigidScrewDrive();

		/**
		 * The meta object literal for the '<em><b>Motor Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RIGID_SCREW_DRIVE__MOTOR_INERTIA = eINSTANCE.getRigidScrewDrive_MotorInertia();

		/**
		 * The meta object literal for the '<em><b>Screw Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RIGID_SCREW_DRIVE__SCREW_INERTIA = eINSTANCE.getRigidScrewDrive_ScrewInertia();

		/**
		 * The meta object literal for the '<em><b>Load Mass</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RIGID_SCREW_DRIVE__LOAD_MASS = eINSTANCE.getRigidScrewDrive_LoadMass();

		/**
		 * The meta object literal for the '<em><b>Lead</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RIGID_SCREW_DRIVE__LEAD = eINSTANCE.getRigidScrewDrive_Lead();

		/**
		 * The meta object literal for the '<em><b>Gear Ratio</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RIGID_SCREW_DRIVE__GEAR_RATIO = eINSTANCE.getRigidScrewDrive_GearRatio();

		/**
		 * The meta object literal for the '<em><b>Torque Constant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RIGID_SCREW_DRIVE__TORQUE_CONSTANT = eINSTANCE.getRigidScrewDrive_TorqueConstant();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.TwoMassDriveImpl <em>Two Mass Drive</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.TwoMassDriveImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getTwoMassDrive()
		 * @generated
		 */
		EClass TWO_MASS_DRIVE = eINSTANCE.getTwoMassDrive();

		/**
		 * The meta object literal for the '<em><b>Screw Root Diameter</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER = eINSTANCE.getTwoMassDrive_ScrewRootDiameter();

		/**
		 * The meta object literal for the '<em><b>Screw Mounting</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__SCREW_MOUNTING = eINSTANCE.getTwoMassDrive_ScrewMounting();

		/**
		 * The meta object literal for the '<em><b>Bearing Span</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__BEARING_SPAN = eINSTANCE.getTwoMassDrive_BearingSpan();

		/**
		 * The meta object literal for the '<em><b>Nut Stiffness</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__NUT_STIFFNESS = eINSTANCE.getTwoMassDrive_NutStiffness();

		/**
		 * The meta object literal for the '<em><b>Bearing Stiffness</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__BEARING_STIFFNESS = eINSTANCE.getTwoMassDrive_BearingStiffness();

		/**
		 * The meta object literal for the '<em><b>Damping Ratio</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__DAMPING_RATIO = eINSTANCE.getTwoMassDrive_DampingRatio();

		/**
		 * The meta object literal for the '<em><b>Nut Position Min</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__NUT_POSITION_MIN = eINSTANCE.getTwoMassDrive_NutPositionMin();

		/**
		 * The meta object literal for the '<em><b>Nut Position Max</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TWO_MASS_DRIVE__NUT_POSITION_MAX = eINSTANCE.getTwoMassDrive_NutPositionMax();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.RackPinionDriveImpl <em>Rack Pinion Drive</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.RackPinionDriveImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getRackPinionDrive()
		 * @generated
		 */
		EClass RACK_PINION_DRIVE = eINSTANCE.getRackPinionDrive();

		/**
		 * The meta object literal for the '<em><b>Motor Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__MOTOR_INERTIA = eINSTANCE.getRackPinionDrive_MotorInertia();

		/**
		 * The meta object literal for the '<em><b>Gearbox Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__GEARBOX_INERTIA = eINSTANCE.getRackPinionDrive_GearboxInertia();

		/**
		 * The meta object literal for the '<em><b>Pinion Radius</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__PINION_RADIUS = eINSTANCE.getRackPinionDrive_PinionRadius();

		/**
		 * The meta object literal for the '<em><b>Gear Ratio</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__GEAR_RATIO = eINSTANCE.getRackPinionDrive_GearRatio();

		/**
		 * The meta object literal for the '<em><b>Load Mass</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__LOAD_MASS = eINSTANCE.getRackPinionDrive_LoadMass();

		/**
		 * The meta object literal for the '<em><b>Torque Constant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__TORQUE_CONSTANT = eINSTANCE.getRackPinionDrive_TorqueConstant();

		/**
		 * The meta object literal for the '<em><b>Drivetrain Stiffness</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute RACK_PINION_DRIVE__DRIVETRAIN_STIFFNESS = eINSTANCE.getRackPinionDrive_DrivetrainStiffness();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.DirectDriveImpl <em>Direct Drive</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.DirectDriveImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getDirectDrive()
		 * @generated
		 */
		EClass DIRECT_DRIVE = eINSTANCE.getDirectDrive();

		/**
		 * The meta object literal for the '<em><b>Moving Mass</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute DIRECT_DRIVE__MOVING_MASS = eINSTANCE.getDirectDrive_MovingMass();

		/**
		 * The meta object literal for the '<em><b>Force Constant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute DIRECT_DRIVE__FORCE_CONSTANT = eINSTANCE.getDirectDrive_ForceConstant();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.RotaryTableImpl <em>Rotary Table</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.RotaryTableImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getRotaryTable()
		 * @generated
		 */
		EClass ROTARY_TABLE = eINSTANCE.getRotaryTable();

		/**
		 * The meta object literal for the '<em><b>Motor Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ROTARY_TABLE__MOTOR_INERTIA = eINSTANCE.getRotaryTable_MotorInertia();

		/**
		 * The meta object literal for the '<em><b>Table Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ROTARY_TABLE__TABLE_INERTIA = eINSTANCE.getRotaryTable_TableInertia();

		/**
		 * The meta object literal for the '<em><b>Gear Ratio</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ROTARY_TABLE__GEAR_RATIO = eINSTANCE.getRotaryTable_GearRatio();

		/**
		 * The meta object literal for the '<em><b>Torque Constant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ROTARY_TABLE__TORQUE_CONSTANT = eINSTANCE.getRotaryTable_TorqueConstant();

		/**
		 * The meta object literal for the '<em><b>Torsional Stiffness</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ROTARY_TABLE__TORSIONAL_STIFFNESS = eINSTANCE.getRotaryTable_TorsionalStiffness();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.TransferFunctionPlantImpl <em>Transfer Function Plant</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.TransferFunctionPlantImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getTransferFunctionPlant()
		 * @generated
		 */
		EClass TRANSFER_FUNCTION_PLANT = eINSTANCE.getTransferFunctionPlant();

		/**
		 * The meta object literal for the '<em><b>Numerator</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__NUMERATOR = eINSTANCE.getTransferFunctionPlant_Numerator();

		/**
		 * The meta object literal for the '<em><b>Denominator</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__DENOMINATOR = eINSTANCE.getTransferFunctionPlant_Denominator();

		/**
		 * The meta object literal for the '<em><b>Dead Time</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__DEAD_TIME = eINSTANCE.getTransferFunctionPlant_DeadTime();

		/**
		 * The meta object literal for the '<em><b>Ratio</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__RATIO = eINSTANCE.getTransferFunctionPlant_Ratio();

		/**
		 * The meta object literal for the '<em><b>Equivalent Inertia</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA = eINSTANCE.getTransferFunctionPlant_EquivalentInertia();

		/**
		 * The meta object literal for the '<em><b>Torque Constant</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT = eINSTANCE.getTransferFunctionPlant_TorqueConstant();

		/**
		 * The meta object literal for the '<em><b>Current Loop Bandwidth</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH = eINSTANCE.getTransferFunctionPlant_CurrentLoopBandwidth();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.ControllerImpl <em>Controller</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.ControllerImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getController()
		 * @generated
		 */
		EClass CONTROLLER = eINSTANCE.getController();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.CascadeControllerImpl <em>Cascade Controller</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.CascadeControllerImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getCascadeController()
		 * @generated
		 */
		EClass CASCADE_CONTROLLER = eINSTANCE.getCascadeController();

		/**
		 * The meta object literal for the '<em><b>Position Gain</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__POSITION_GAIN = eINSTANCE.getCascadeController_PositionGain();

		/**
		 * The meta object literal for the '<em><b>Velocity Gain</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__VELOCITY_GAIN = eINSTANCE.getCascadeController_VelocityGain();

		/**
		 * The meta object literal for the '<em><b>Velocity Integral Time</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__VELOCITY_INTEGRAL_TIME = eINSTANCE.getCascadeController_VelocityIntegralTime();

		/**
		 * The meta object literal for the '<em><b>Velocity Feedforward</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__VELOCITY_FEEDFORWARD = eINSTANCE.getCascadeController_VelocityFeedforward();

		/**
		 * The meta object literal for the '<em><b>Acceleration Feedforward</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__ACCELERATION_FEEDFORWARD = eINSTANCE.getCascadeController_AccelerationFeedforward();

		/**
		 * The meta object literal for the '<em><b>Filter Stages</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CASCADE_CONTROLLER__FILTER_STAGES = eINSTANCE.getCascadeController_FilterStages();

		/**
		 * The meta object literal for the '<em><b>Position Sample Period</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__POSITION_SAMPLE_PERIOD = eINSTANCE.getCascadeController_PositionSamplePeriod();

		/**
		 * The meta object literal for the '<em><b>Velocity Sample Period</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CASCADE_CONTROLLER__VELOCITY_SAMPLE_PERIOD = eINSTANCE.getCascadeController_VelocitySamplePeriod();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.PidControllerImpl <em>Pid Controller</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.PidControllerImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getPidController()
		 * @generated
		 */
		EClass PID_CONTROLLER = eINSTANCE.getPidController();

		/**
		 * The meta object literal for the '<em><b>Proportional Gain</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PID_CONTROLLER__PROPORTIONAL_GAIN = eINSTANCE.getPidController_ProportionalGain();

		/**
		 * The meta object literal for the '<em><b>Integral Gain</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PID_CONTROLLER__INTEGRAL_GAIN = eINSTANCE.getPidController_IntegralGain();

		/**
		 * The meta object literal for the '<em><b>Derivative Gain</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PID_CONTROLLER__DERIVATIVE_GAIN = eINSTANCE.getPidController_DerivativeGain();

		/**
		 * The meta object literal for the '<em><b>Derivative Filter Time</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PID_CONTROLLER__DERIVATIVE_FILTER_TIME = eINSTANCE.getPidController_DerivativeFilterTime();

		/**
		 * The meta object literal for the '<em><b>Sample Period</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute PID_CONTROLLER__SAMPLE_PERIOD = eINSTANCE.getPidController_SamplePeriod();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.TransferFunctionControllerImpl <em>Transfer Function Controller</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.TransferFunctionControllerImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getTransferFunctionController()
		 * @generated
		 */
		EClass TRANSFER_FUNCTION_CONTROLLER = eINSTANCE.getTransferFunctionController();

		/**
		 * The meta object literal for the '<em><b>Numerator</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_CONTROLLER__NUMERATOR = eINSTANCE.getTransferFunctionController_Numerator();

		/**
		 * The meta object literal for the '<em><b>Denominator</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR = eINSTANCE.getTransferFunctionController_Denominator();

		/**
		 * The meta object literal for the '<em><b>Sample Period</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD = eINSTANCE.getTransferFunctionController_SamplePeriod();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.FilterStageImpl <em>Filter Stage</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.FilterStageImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getFilterStage()
		 * @generated
		 */
		EClass FILTER_STAGE = eINSTANCE.getFilterStage();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.LowPassFilterImpl <em>Low Pass Filter</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.LowPassFilterImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getLowPassFilter()
		 * @generated
		 */
		EClass LOW_PASS_FILTER = eINSTANCE.getLowPassFilter();

		/**
		 * The meta object literal for the '<em><b>Order</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LOW_PASS_FILTER__ORDER = eINSTANCE.getLowPassFilter_Order();

		/**
		 * The meta object literal for the '<em><b>Cutoff Frequency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LOW_PASS_FILTER__CUTOFF_FREQUENCY = eINSTANCE.getLowPassFilter_CutoffFrequency();

		/**
		 * The meta object literal for the '<em><b>Damping Ratio</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LOW_PASS_FILTER__DAMPING_RATIO = eINSTANCE.getLowPassFilter_DampingRatio();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.NotchFilterImpl <em>Notch Filter</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.NotchFilterImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getNotchFilter()
		 * @generated
		 */
		EClass NOTCH_FILTER = eINSTANCE.getNotchFilter();

		/**
		 * The meta object literal for the '<em><b>Centre Frequency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute NOTCH_FILTER__CENTRE_FREQUENCY = eINSTANCE.getNotchFilter_CentreFrequency();

		/**
		 * The meta object literal for the '<em><b>Width</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute NOTCH_FILTER__WIDTH = eINSTANCE.getNotchFilter_Width();

		/**
		 * The meta object literal for the '<em><b>Depth</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute NOTCH_FILTER__DEPTH = eINSTANCE.getNotchFilter_Depth();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.LeadLagFilterImpl <em>Lead Lag Filter</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.LeadLagFilterImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getLeadLagFilter()
		 * @generated
		 */
		EClass LEAD_LAG_FILTER = eINSTANCE.getLeadLagFilter();

		/**
		 * The meta object literal for the '<em><b>Zero Frequency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LEAD_LAG_FILTER__ZERO_FREQUENCY = eINSTANCE.getLeadLagFilter_ZeroFrequency();

		/**
		 * The meta object literal for the '<em><b>Pole Frequency</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LEAD_LAG_FILTER__POLE_FREQUENCY = eINSTANCE.getLeadLagFilter_PoleFrequency();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.EncoderImpl <em>Encoder</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.EncoderImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getEncoder()
		 * @generated
		 */
		EClass ENCODER = eINSTANCE.getEncoder();

		/**
		 * The meta object literal for the '<em><b>Side</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ENCODER__SIDE = eINSTANCE.getEncoder_Side();

		/**
		 * The meta object literal for the '<em><b>Linear Resolution</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ENCODER__LINEAR_RESOLUTION = eINSTANCE.getEncoder_LinearResolution();

		/**
		 * The meta object literal for the '<em><b>Counts Per Revolution</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ENCODER__COUNTS_PER_REVOLUTION = eINSTANCE.getEncoder_CountsPerRevolution();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.ContourImpl <em>Contour</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.ContourImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getContour()
		 * @generated
		 */
		EClass CONTOUR = eINSTANCE.getContour();

		/**
		 * The meta object literal for the '<em><b>Feed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTOUR__FEED = eINSTANCE.getContour_Feed();

		/**
		 * The meta object literal for the '<em><b>Path Acceleration</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTOUR__PATH_ACCELERATION = eINSTANCE.getContour_PathAcceleration();

		/**
		 * The meta object literal for the '<em><b>Path Jerk</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTOUR__PATH_JERK = eINSTANCE.getContour_PathJerk();

		/**
		 * The meta object literal for the '<em><b>Sample Period</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTOUR__SAMPLE_PERIOD = eINSTANCE.getContour_SamplePeriod();

		/**
		 * The meta object literal for the '<em><b>Start X</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTOUR__START_X = eINSTANCE.getContour_StartX();

		/**
		 * The meta object literal for the '<em><b>Start Y</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CONTOUR__START_Y = eINSTANCE.getContour_StartY();

		/**
		 * The meta object literal for the '<em><b>Axis Assignment</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CONTOUR__AXIS_ASSIGNMENT = eINSTANCE.getContour_AxisAssignment();

		/**
		 * The meta object literal for the '<em><b>Segments</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference CONTOUR__SEGMENTS = eINSTANCE.getContour_Segments();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.SegmentImpl <em>Segment</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.SegmentImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getSegment()
		 * @generated
		 */
		EClass SEGMENT = eINSTANCE.getSegment();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.LineImpl <em>Line</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.LineImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getLine()
		 * @generated
		 */
		EClass LINE = eINSTANCE.getLine();

		/**
		 * The meta object literal for the '<em><b>End X</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LINE__END_X = eINSTANCE.getLine_EndX();

		/**
		 * The meta object literal for the '<em><b>End Y</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute LINE__END_Y = eINSTANCE.getLine_EndY();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.ArcImpl <em>Arc</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.ArcImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getArc()
		 * @generated
		 */
		EClass ARC = eINSTANCE.getArc();

		/**
		 * The meta object literal for the '<em><b>End X</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ARC__END_X = eINSTANCE.getArc_EndX();

		/**
		 * The meta object literal for the '<em><b>End Y</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ARC__END_Y = eINSTANCE.getArc_EndY();

		/**
		 * The meta object literal for the '<em><b>Centre X</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ARC__CENTRE_X = eINSTANCE.getArc_CentreX();

		/**
		 * The meta object literal for the '<em><b>Centre Y</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ARC__CENTRE_Y = eINSTANCE.getArc_CentreY();

		/**
		 * The meta object literal for the '<em><b>Direction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute ARC__DIRECTION = eINSTANCE.getArc_Direction();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.FullCircleImpl <em>Full Circle</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.FullCircleImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getFullCircle()
		 * @generated
		 */
		EClass FULL_CIRCLE = eINSTANCE.getFullCircle();

		/**
		 * The meta object literal for the '<em><b>Centre X</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FULL_CIRCLE__CENTRE_X = eINSTANCE.getFullCircle_CentreX();

		/**
		 * The meta object literal for the '<em><b>Centre Y</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FULL_CIRCLE__CENTRE_Y = eINSTANCE.getFullCircle_CentreY();

		/**
		 * The meta object literal for the '<em><b>Direction</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute FULL_CIRCLE__DIRECTION = eINSTANCE.getFullCircle_Direction();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.CornerImpl <em>Corner</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.CornerImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getCorner()
		 * @generated
		 */
		EClass CORNER = eINSTANCE.getCorner();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CORNER__KIND = eINSTANCE.getCorner_Kind();

		/**
		 * The meta object literal for the '<em><b>Rounding Tolerance</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute CORNER__ROUNDING_TOLERANCE = eINSTANCE.getCorner_RoundingTolerance();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.RequirementImpl <em>Requirement</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.RequirementImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getRequirement()
		 * @generated
		 */
		EClass REQUIREMENT = eINSTANCE.getRequirement();

		/**
		 * The meta object literal for the '<em><b>Statement</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__STATEMENT = eINSTANCE.getRequirement_Statement();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__KIND = eINSTANCE.getRequirement_Kind();

		/**
		 * The meta object literal for the '<em><b>Metric</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__METRIC = eINSTANCE.getRequirement_Metric();

		/**
		 * The meta object literal for the '<em><b>Contours</b></em>' reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REQUIREMENT__CONTOURS = eINSTANCE.getRequirement_Contours();

		/**
		 * The meta object literal for the '<em><b>Bound</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__BOUND = eINSTANCE.getRequirement_Bound();

		/**
		 * The meta object literal for the '<em><b>Limit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__LIMIT = eINSTANCE.getRequirement_Limit();

		/**
		 * The meta object literal for the '<em><b>Display Unit</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__DISPLAY_UNIT = eINSTANCE.getRequirement_DisplayUnit();

		/**
		 * The meta object literal for the '<em><b>Parent</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REQUIREMENT__PARENT = eINSTANCE.getRequirement_Parent();

		/**
		 * The meta object literal for the '<em><b>Allocated Axis</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference REQUIREMENT__ALLOCATED_AXIS = eINSTANCE.getRequirement_AllocatedAxis();

		/**
		 * The meta object literal for the '<em><b>Rationale</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute REQUIREMENT__RATIONALE = eINSTANCE.getRequirement_Rationale();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.BudgetLineImpl <em>Budget Line</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.BudgetLineImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getBudgetLine()
		 * @generated
		 */
		EClass BUDGET_LINE = eINSTANCE.getBudgetLine();

		/**
		 * The meta object literal for the '<em><b>Name</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__NAME = eINSTANCE.getBudgetLine_Name();

		/**
		 * The meta object literal for the '<em><b>Axis</b></em>' reference feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference BUDGET_LINE__AXIS = eINSTANCE.getBudgetLine_Axis();

		/**
		 * The meta object literal for the '<em><b>Source</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__SOURCE = eINSTANCE.getBudgetLine_Source();

		/**
		 * The meta object literal for the '<em><b>Value</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__VALUE = eINSTANCE.getBudgetLine_Value();

		/**
		 * The meta object literal for the '<em><b>Origin</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__ORIGIN = eINSTANCE.getBudgetLine_Origin();

		/**
		 * The meta object literal for the '<em><b>Error Class</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__ERROR_CLASS = eINSTANCE.getBudgetLine_ErrorClass();

		/**
		 * The meta object literal for the '<em><b>Distribution</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__DISTRIBUTION = eINSTANCE.getBudgetLine_Distribution();

		/**
		 * The meta object literal for the '<em><b>Sensitivity</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__SENSITIVITY = eINSTANCE.getBudgetLine_Sensitivity();

		/**
		 * The meta object literal for the '<em><b>Evidence</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute BUDGET_LINE__EVIDENCE = eINSTANCE.getBudgetLine_Evidence();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.VariationStudyImpl <em>Variation Study</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.VariationStudyImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getVariationStudy()
		 * @generated
		 */
		EClass VARIATION_STUDY = eINSTANCE.getVariationStudy();

		/**
		 * The meta object literal for the '<em><b>Kind</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIATION_STUDY__KIND = eINSTANCE.getVariationStudy_Kind();

		/**
		 * The meta object literal for the '<em><b>Variant Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIATION_STUDY__VARIANT_COUNT = eINSTANCE.getVariationStudy_VariantCount();

		/**
		 * The meta object literal for the '<em><b>Seed</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIATION_STUDY__SEED = eINSTANCE.getVariationStudy_Seed();

		/**
		 * The meta object literal for the '<em><b>Worst Variant Count</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIATION_STUDY__WORST_VARIANT_COUNT = eINSTANCE.getVariationStudy_WorstVariantCount();

		/**
		 * The meta object literal for the '<em><b>Metrics</b></em>' attribute list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIATION_STUDY__METRICS = eINSTANCE.getVariationStudy_Metrics();

		/**
		 * The meta object literal for the '<em><b>Parameters</b></em>' containment reference list feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EReference VARIATION_STUDY__PARAMETERS = eINSTANCE.getVariationStudy_Parameters();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.impl.VariedParameterImpl <em>Varied Parameter</em>}' class.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.impl.VariedParameterImpl
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getVariedParameter()
		 * @generated
		 */
		EClass VARIED_PARAMETER = eINSTANCE.getVariedParameter();

		/**
		 * The meta object literal for the '<em><b>Path</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__PATH = eINSTANCE.getVariedParameter_Path();

		/**
		 * The meta object literal for the '<em><b>Shape</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__SHAPE = eINSTANCE.getVariedParameter_Shape();

		/**
		 * The meta object literal for the '<em><b>Sigma</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__SIGMA = eINSTANCE.getVariedParameter_Sigma();

		/**
		 * The meta object literal for the '<em><b>Half Width</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__HALF_WIDTH = eINSTANCE.getVariedParameter_HalfWidth();

		/**
		 * The meta object literal for the '<em><b>Minimum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__MINIMUM = eINSTANCE.getVariedParameter_Minimum();

		/**
		 * The meta object literal for the '<em><b>Maximum</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__MAXIMUM = eINSTANCE.getVariedParameter_Maximum();

		/**
		 * The meta object literal for the '<em><b>From</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__FROM = eINSTANCE.getVariedParameter_From();

		/**
		 * The meta object literal for the '<em><b>To</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__TO = eINSTANCE.getVariedParameter_To();

		/**
		 * The meta object literal for the '<em><b>Steps</b></em>' attribute feature.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @generated
		 */
		EAttribute VARIED_PARAMETER__STEPS = eINSTANCE.getVariedParameter_Steps();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.AxisKind <em>Axis Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.AxisKind
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getAxisKind()
		 * @generated
		 */
		EEnum AXIS_KIND = eINSTANCE.getAxisKind();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.ScrewMounting <em>Screw Mounting</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.ScrewMounting
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getScrewMounting()
		 * @generated
		 */
		EEnum SCREW_MOUNTING = eINSTANCE.getScrewMounting();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.LowPassOrder <em>Low Pass Order</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.LowPassOrder
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getLowPassOrder()
		 * @generated
		 */
		EEnum LOW_PASS_ORDER = eINSTANCE.getLowPassOrder();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.EncoderSide <em>Encoder Side</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.EncoderSide
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getEncoderSide()
		 * @generated
		 */
		EEnum ENCODER_SIDE = eINSTANCE.getEncoderSide();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.Direction <em>Direction</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.Direction
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getDirection()
		 * @generated
		 */
		EEnum DIRECTION = eINSTANCE.getDirection();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.CornerKind <em>Corner Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.CornerKind
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getCornerKind()
		 * @generated
		 */
		EEnum CORNER_KIND = eINSTANCE.getCornerKind();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.RequirementKind <em>Requirement Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.RequirementKind
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getRequirementKind()
		 * @generated
		 */
		EEnum REQUIREMENT_KIND = eINSTANCE.getRequirementKind();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.ContourMetric <em>Contour Metric</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.ContourMetric
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getContourMetric()
		 * @generated
		 */
		EEnum CONTOUR_METRIC = eINSTANCE.getContourMetric();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.LimitBound <em>Limit Bound</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.LimitBound
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getLimitBound()
		 * @generated
		 */
		EEnum LIMIT_BOUND = eINSTANCE.getLimitBound();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.BudgetSource <em>Budget Source</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.BudgetSource
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getBudgetSource()
		 * @generated
		 */
		EEnum BUDGET_SOURCE = eINSTANCE.getBudgetSource();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.ValueOrigin <em>Value Origin</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.ValueOrigin
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getValueOrigin()
		 * @generated
		 */
		EEnum VALUE_ORIGIN = eINSTANCE.getValueOrigin();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.ErrorClass <em>Error Class</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.ErrorClass
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getErrorClass()
		 * @generated
		 */
		EEnum ERROR_CLASS = eINSTANCE.getErrorClass();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.Distribution <em>Distribution</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.Distribution
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getDistribution()
		 * @generated
		 */
		EEnum DISTRIBUTION = eINSTANCE.getDistribution();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.StudyKind <em>Study Kind</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.StudyKind
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getStudyKind()
		 * @generated
		 */
		EEnum STUDY_KIND = eINSTANCE.getStudyKind();

		/**
		 * The meta object literal for the '{@link org.tracewell.model.ToleranceShape <em>Tolerance Shape</em>}' enum.
		 * <!-- begin-user-doc -->
		 * <!-- end-user-doc -->
		 * @see org.tracewell.model.ToleranceShape
		 * @see org.tracewell.model.impl.TracewellPackageImpl#getToleranceShape()
		 * @generated
		 */
		EEnum TOLERANCE_SHAPE = eINSTANCE.getToleranceShape();

	}

} //TracewellPackage
