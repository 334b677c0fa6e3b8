/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.DirectDrive;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Direct Drive</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.DirectDriveImpl#getMovingMass <em>Moving Mass</em>}</li>
 *   <li>{@link org.tracewell.model.impl.DirectDriveImpl#getForceConstant <em>Force Constant</em>}</li>
 * </ul>
 *
 * @generated
 */
public class DirectDriveImpl extends MotorDrivenPlantImpl implements DirectDrive {
	/**
	 * The default value of the '{@link #getMovingMass() <em>Moving Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMovingMass()
	 * @generated
	 * @ordered
	 */
	protected static final double MOVING_MASS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMovingMass() <em>Moving Mass</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMovingMass()
	 * @generated
	 * @ordered
	 */
	protected double movingMass = MOVING_MASS_EDEFAULT;

	/**
	 * The default value of the '{@link #getForceConstant() <em>Force Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getForceConstant()
	 * @generated
	 * @ordered
	 */
	protected static final double FORCE_CONSTANT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getForceConstant() <em>Force Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getForceConstant()
	 * @generated
	 * @ordered
	 */
	protected double forceConstant = FORCE_CONSTANT_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected DirectDriveImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.DIRECT_DRIVE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMovingMass() {
		return movingMass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMovingMass(double newMovingMass) {
		double oldMovingMass = movingMass;
		movingMass = newMovingMass;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.DIRECT_DRIVE__MOVING_MASS, oldMovingMass, movingMass));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getForceConstant() {
		return forceConstant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setForceConstant(double newForceConstant) {
		double oldForceConstant = forceConstant;
		forceConstant = newForceConstant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.DIRECT_DRIVE__FORCE_CONSTANT, oldForceConstant, forceConstant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.DIRECT_DRIVE__MOVING_MASS:
				return getMovingMass();
			case TracewellPackage.DIRECT_DRIVE__FORCE_CONSTANT:
				return getForceConstant();
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
			case TracewellPackage.DIRECT_DRIVE__MOVING_MASS:
				setMovingMass((Double)newValue);
				return;
			case TracewellPackage.DIRECT_DRIVE__FORCE_CONSTANT:
				setForceConstant((Double)newValue);
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
			case TracewellPackage.DIRECT_DRIVE__MOVING_MASS:
				setMovingMass(MOVING_MASS_EDEFAULT);
				return;
			case TracewellPackage.DIRECT_DRIVE__FORCE_CONSTANT:
				setForceConstant(FORCE_CONSTANT_EDEFAULT);
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
			case TracewellPackage.DIRECT_DRIVE__MOVING_MASS:
				return movingMass != MOVING_MASS_EDEFAULT;
			case TracewellPackage.DIRECT_DRIVE__FORCE_CONSTANT:
				return forceConstant != FORCE_CONSTANT_EDEFAULT;
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
		result.append(" (movingMass: "); //$NON-NLS-1$
		result.append(movingMass);
		result.append(", forceConstant: "); //$NON-NLS-1$
		result.append(forceConstant);
		result.append(')');
		return result.toString();
	}

} //DirectDriveImpl
