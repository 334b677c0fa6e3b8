/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.Axis;
import org.tracewell.model.AxisKind;
import org.tracewell.model.Controller;
import org.tracewell.model.Encoder;
import org.tracewell.model.Plant;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Axis</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getPlant <em>Plant</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getController <em>Controller</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getEncoder <em>Encoder</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getMaxVelocity <em>Max Velocity</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getMaxAcceleration <em>Max Acceleration</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getMaxJerk <em>Max Jerk</em>}</li>
 *   <li>{@link org.tracewell.model.impl.AxisImpl#getGantryPartner <em>Gantry Partner</em>}</li>
 * </ul>
 *
 * @generated
 */
public class AxisImpl extends NamedImpl implements Axis {
	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final AxisKind KIND_EDEFAULT = AxisKind.LINEAR;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected AxisKind kind = KIND_EDEFAULT;

	/**
	 * The cached value of the '{@link #getPlant() <em>Plant</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPlant()
	 * @generated
	 * @ordered
	 */
	protected Plant plant;

	/**
	 * The cached value of the '{@link #getController() <em>Controller</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getController()
	 * @generated
	 * @ordered
	 */
	protected Controller controller;

	/**
	 * The cached value of the '{@link #getEncoder() <em>Encoder</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEncoder()
	 * @generated
	 * @ordered
	 */
	protected Encoder encoder;

	/**
	 * The default value of the '{@link #getMaxVelocity() <em>Max Velocity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxVelocity()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_VELOCITY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxVelocity() <em>Max Velocity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxVelocity()
	 * @generated
	 * @ordered
	 */
	protected double maxVelocity = MAX_VELOCITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxAcceleration() <em>Max Acceleration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxAcceleration()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_ACCELERATION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxAcceleration() <em>Max Acceleration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxAcceleration()
	 * @generated
	 * @ordered
	 */
	protected double maxAcceleration = MAX_ACCELERATION_EDEFAULT;

	/**
	 * The default value of the '{@link #getMaxJerk() <em>Max Jerk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxJerk()
	 * @generated
	 * @ordered
	 */
	protected static final double MAX_JERK_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaxJerk() <em>Max Jerk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaxJerk()
	 * @generated
	 * @ordered
	 */
	protected double maxJerk = MAX_JERK_EDEFAULT;

	/**
	 * The cached value of the '{@link #getGantryPartner() <em>Gantry Partner</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGantryPartner()
	 * @generated
	 * @ordered
	 */
	protected Axis gantryPartner;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected AxisImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.AXIS;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public AxisKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(AxisKind newKind) {
		AxisKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Plant getPlant() {
		return plant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetPlant(Plant newPlant, NotificationChain msgs) {
		Plant oldPlant = plant;
		plant = newPlant;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__PLANT, oldPlant, newPlant);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPlant(Plant newPlant) {
		if (newPlant != plant) {
			NotificationChain msgs = null;
			if (plant != null)
				msgs = ((InternalEObject)plant).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TracewellPackage.AXIS__PLANT, null, msgs);
			if (newPlant != null)
				msgs = ((InternalEObject)newPlant).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TracewellPackage.AXIS__PLANT, null, msgs);
			msgs = basicSetPlant(newPlant, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__PLANT, newPlant, newPlant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Controller getController() {
		return controller;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetController(Controller newController, NotificationChain msgs) {
		Controller oldController = controller;
		controller = newController;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__CONTROLLER, oldController, newController);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setController(Controller newController) {
		if (newController != controller) {
			NotificationChain msgs = null;
			if (controller != null)
				msgs = ((InternalEObject)controller).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TracewellPackage.AXIS__CONTROLLER, null, msgs);
			if (newController != null)
				msgs = ((InternalEObject)newController).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TracewellPackage.AXIS__CONTROLLER, null, msgs);
			msgs = basicSetController(newController, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__CONTROLLER, newController, newController));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Encoder getEncoder() {
		return encoder;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetEncoder(Encoder newEncoder, NotificationChain msgs) {
		Encoder oldEncoder = encoder;
		encoder = newEncoder;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__ENCODER, oldEncoder, newEncoder);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEncoder(Encoder newEncoder) {
		if (newEncoder != encoder) {
			NotificationChain msgs = null;
			if (encoder != null)
				msgs = ((InternalEObject)encoder).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - TracewellPackage.AXIS__ENCODER, null, msgs);
			if (newEncoder != null)
				msgs = ((InternalEObject)newEncoder).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - TracewellPackage.AXIS__ENCODER, null, msgs);
			msgs = basicSetEncoder(newEncoder, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__ENCODER, newEncoder, newEncoder));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxVelocity() {
		return maxVelocity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxVelocity(double newMaxVelocity) {
		double oldMaxVelocity = maxVelocity;
		maxVelocity = newMaxVelocity;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__MAX_VELOCITY, oldMaxVelocity, maxVelocity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxAcceleration() {
		return maxAcceleration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxAcceleration(double newMaxAcceleration) {
		double oldMaxAcceleration = maxAcceleration;
		maxAcceleration = newMaxAcceleration;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__MAX_ACCELERATION, oldMaxAcceleration, maxAcceleration));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaxJerk() {
		return maxJerk;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaxJerk(double newMaxJerk) {
		double oldMaxJerk = maxJerk;
		maxJerk = newMaxJerk;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__MAX_JERK, oldMaxJerk, maxJerk));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Axis getGantryPartner() {
		if (gantryPartner != null && gantryPartner.eIsProxy()) {
			InternalEObject oldGantryPartner = (InternalEObject)gantryPartner;
			gantryPartner = (Axis)eResolveProxy(oldGantryPartner);
			if (gantryPartner != oldGantryPartner) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, TracewellPackage.AXIS__GANTRY_PARTNER, oldGantryPartner, gantryPartner));
			}
		}
		return gantryPartner;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Axis basicGetGantryPartner() {
		return gantryPartner;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGantryPartner(Axis newGantryPartner) {
		Axis oldGantryPartner = gantryPartner;
		gantryPartner = newGantryPartner;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.AXIS__GANTRY_PARTNER, oldGantryPartner, gantryPartner));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TracewellPackage.AXIS__PLANT:
				return basicSetPlant(null, msgs);
			case TracewellPackage.AXIS__CONTROLLER:
				return basicSetController(null, msgs);
			case TracewellPackage.AXIS__ENCODER:
				return basicSetEncoder(null, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.AXIS__KIND:
				return getKind();
			case TracewellPackage.AXIS__PLANT:
				return getPlant();
			case TracewellPackage.AXIS__CONTROLLER:
				return getController();
			case TracewellPackage.AXIS__ENCODER:
				return getEncoder();
			case TracewellPackage.AXIS__MAX_VELOCITY:
				return getMaxVelocity();
			case TracewellPackage.AXIS__MAX_ACCELERATION:
				return getMaxAcceleration();
			case TracewellPackage.AXIS__MAX_JERK:
				return getMaxJerk();
			case TracewellPackage.AXIS__GANTRY_PARTNER:
				if (resolve) return getGantryPartner();
				return basicGetGantryPartner();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case TracewellPackage.AXIS__KIND:
				setKind((AxisKind)newValue);
				return;
			case TracewellPackage.AXIS__PLANT:
				setPlant((Plant)newValue);
				return;
			case TracewellPackage.AXIS__CONTROLLER:
				setController((Controller)newValue);
				return;
			case TracewellPackage.AXIS__ENCODER:
				setEncoder((Encoder)newValue);
				return;
			case TracewellPackage.AXIS__MAX_VELOCITY:
				setMaxVelocity((Double)newValue);
				return;
			case TracewellPackage.AXIS__MAX_ACCELERATION:
				setMaxAcceleration((Double)newValue);
				return;
			case TracewellPackage.AXIS__MAX_JERK:
				setMaxJerk((Double)newValue);
				return;
			case TracewellPackage.AXIS__GANTRY_PARTNER:
				setGantryPartner((Axis)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case TracewellPackage.AXIS__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case TracewellPackage.AXIS__PLANT:
				setPlant((Plant)null);
				return;
			case TracewellPackage.AXIS__CONTROLLER:
				setController((Controller)null);
				return;
			case TracewellPackage.AXIS__ENCODER:
				setEncoder((Encoder)null);
				return;
			case TracewellPackage.AXIS__MAX_VELOCITY:
				setMaxVelocity(MAX_VELOCITY_EDEFAULT);
				return;
			case TracewellPackage.AXIS__MAX_ACCELERATION:
				setMaxAcceleration(MAX_ACCELERATION_EDEFAULT);
				return;
			case TracewellPackage.AXIS__MAX_JERK:
				setMaxJerk(MAX_JERK_EDEFAULT);
				return;
			case TracewellPackage.AXIS__GANTRY_PARTNER:
				setGantryPartner((Axis)null);
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case TracewellPackage.AXIS__KIND:
				return kind != KIND_EDEFAULT;
			case TracewellPackage.AXIS__PLANT:
				return plant != null;
			case TracewellPackage.AXIS__CONTROLLER:
				return controller != null;
			case TracewellPackage.AXIS__ENCODER:
				return encoder != null;
			case TracewellPackage.AXIS__MAX_VELOCITY:
				return maxVelocity != MAX_VELOCITY_EDEFAULT;
			case TracewellPackage.AXIS__MAX_ACCELERATION:
				return maxAcceleration != MAX_ACCELERATION_EDEFAULT;
			case TracewellPackage.AXIS__MAX_JERK:
				return maxJerk != MAX_JERK_EDEFAULT;
			case TracewellPackage.AXIS__GANTRY_PARTNER:
				return gantryPartner != null;
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (kind: "); //$NON-NLS-1$
		result.append(kind);
		result.append(", maxVelocity: "); //$NON-NLS-1$
		result.append(maxVelocity);
		result.append(", maxAcceleration: "); //$NON-NLS-1$
		result.append(maxAcceleration);
		result.append(", maxJerk: "); //$NON-NLS-1$
		result.append(maxJerk);
		result.append(')');
		return result.toString();
	}

} //AxisImpl
