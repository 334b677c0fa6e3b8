/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.RotaryTable;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Rotary Table</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.RotaryTableImpl#getMotorInertia <em>Motor Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RotaryTableImpl#getTableInertia <em>Table Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RotaryTableImpl#getGearRatio <em>Gear Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RotaryTableImpl#getTorqueConstant <em>Torque Constant</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RotaryTableImpl#getTorsionalStiffness <em>Torsional Stiffness</em>}</li>
 * </ul>
 *
 * @generated
 */
public class RotaryTableImpl extends MotorDrivenPlantImpl implements RotaryTable {
	/**
	 * The default value of the '{@link #getMotorInertia() <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMotorInertia()
	 * @generated
	 * @ordered
	 */
	protected static final double MOTOR_INERTIA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMotorInertia() <em>Motor Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMotorInertia()
	 * @generated
	 * @ordered
	 */
	protected double motorInertia = MOTOR_INERTIA_EDEFAULT;

	/**
	 * The default value of the '{@link #getTableInertia() <em>Table Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTableInertia()
	 * @generated
	 * @ordered
	 */
	protected static final double TABLE_INERTIA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTableInertia() <em>Table Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTableInertia()
	 * @generated
	 * @ordered
	 */
	protected double tableInertia = TABLE_INERTIA_EDEFAULT;

	/**
	 * The default value of the '{@link #getGearRatio() <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearRatio()
	 * @generated
	 * @ordered
	 */
	protected static final double GEAR_RATIO_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getGearRatio() <em>Gear Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getGearRatio()
	 * @generated
	 * @ordered
	 */
	protected double gearRatio = GEAR_RATIO_EDEFAULT;

	/**
	 * The default value of the '{@link #getTorqueConstant() <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTorqueConstant()
	 * @generated
	 * @ordered
	 */
	protected static final double TORQUE_CONSTANT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTorqueConstant() <em>Torque Constant</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTorqueConstant()
	 * @generated
	 * @ordered
	 */
	protected double torqueConstant = TORQUE_CONSTANT_EDEFAULT;

	/**
	 * The default value of the '{@link #getTorsionalStiffness() <em>Torsional Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTorsionalStiffness()
	 * @generated
	 * @ordered
	 */
	protected static final double TORSIONAL_STIFFNESS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTorsionalStiffness() <em>Torsional Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTorsionalStiffness()
	 * @generated
	 * @ordered
	 */
	protected double torsionalStiffness = TORSIONAL_STIFFNESS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected RotaryTableImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.ROTARY_TABLE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMotorInertia() {
		return motorInertia;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMotorInertia(double newMotorInertia) {
		double oldMotorInertia = motorInertia;
		motorInertia = newMotorInertia;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ROTARY_TABLE__MOTOR_INERTIA, oldMotorInertia, motorInertia));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTableInertia() {
		return tableInertia;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTableInertia(double newTableInertia) {
		double oldTableInertia = tableInertia;
		tableInertia = newTableInertia;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ROTARY_TABLE__TABLE_INERTIA, oldTableInertia, tableInertia));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getGearRatio() {
		return gearRatio;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setGearRatio(double newGearRatio) {
		double oldGearRatio = gearRatio;
		gearRatio = newGearRatio;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ROTARY_TABLE__GEAR_RATIO, oldGearRatio, gearRatio));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTorqueConstant() {
		return torqueConstant;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTorqueConstant(double newTorqueConstant) {
		double oldTorqueConstant = torqueConstant;
		torqueConstant = newTorqueConstant;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ROTARY_TABLE__TORQUE_CONSTANT, oldTorqueConstant, torqueConstant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTorsionalStiffness() {
		return torsionalStiffness;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTorsionalStiffness(double newTorsionalStiffness) {
		double oldTorsionalStiffness = torsionalStiffness;
		torsionalStiffness = newTorsionalStiffness;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ROTARY_TABLE__TORSIONAL_STIFFNESS, oldTorsionalStiffness, torsionalStiffness));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.ROTARY_TABLE__MOTOR_INERTIA:
				return getMotorInertia();
			case TracewellPackage.ROTARY_TABLE__TABLE_INERTIA:
				return getTableInertia();
			case TracewellPackage.ROTARY_TABLE__GEAR_RATIO:
				return getGearRatio();
			case TracewellPackage.ROTARY_TABLE__TORQUE_CONSTANT:
				return getTorqueConstant();
			case TracewellPackage.ROTARY_TABLE__TORSIONAL_STIFFNESS:
				return getTorsionalStiffness();
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
			case TracewellPackage.ROTARY_TABLE__MOTOR_INERTIA:
				setMotorInertia((Double)newValue);
				return;
			case TracewellPackage.ROTARY_TABLE__TABLE_INERTIA:
				setTableInertia((Double)newValue);
				return;
			case TracewellPackage.ROTARY_TABLE__GEAR_RATIO:
				setGearRatio((Double)newValue);
				return;
			case TracewellPackage.ROTARY_TABLE__TORQUE_CONSTANT:
				setTorqueConstant((Double)newValue);
				return;
			case TracewellPackage.ROTARY_TABLE__TORSIONAL_STIFFNESS:
				setTorsionalStiffness((Double)newValue);
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
			case TracewellPackage.ROTARY_TABLE__MOTOR_INERTIA:
				setMotorInertia(MOTOR_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.ROTARY_TABLE__TABLE_INERTIA:
				setTableInertia(TABLE_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.ROTARY_TABLE__GEAR_RATIO:
				setGearRatio(GEAR_RATIO_EDEFAULT);
				return;
			case TracewellPackage.ROTARY_TABLE__TORQUE_CONSTANT:
				setTorqueConstant(TORQUE_CONSTANT_EDEFAULT);
				return;
			case TracewellPackage.ROTARY_TABLE__TORSIONAL_STIFFNESS:
				setTorsionalStiffness(TORSIONAL_STIFFNESS_EDEFAULT);
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
			case TracewellPackage.ROTARY_TABLE__MOTOR_INERTIA:
				return motorInertia != MOTOR_INERTIA_EDEFAULT;
			case TracewellPackage.ROTARY_TABLE__TABLE_INERTIA:
				return tableInertia != TABLE_INERTIA_EDEFAULT;
			case TracewellPackage.ROTARY_TABLE__GEAR_RATIO:
				return gearRatio != GEAR_RATIO_EDEFAULT;
			case TracewellPackage.ROTARY_TABLE__TORQUE_CONSTANT:
				return torqueConstant != TORQUE_CONSTANT_EDEFAULT;
			case TracewellPackage.ROTARY_TABLE__TORSIONAL_STIFFNESS:
				return torsionalStiffness != TORSIONAL_STIFFNESS_EDEFAULT;
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
		result.append(" (motorInertia: "); //$NON-NLS-1$
		result.append(motorInertia);
		result.append(", tableInertia: "); //$NON-NLS-1$
		result.append(tableInertia);
		result.append(", gearRatio: "); //$NON-NLS-1$
		result.append(gearRatio);
		result.append(", torqueConstant: "); //$NON-NLS-1$
		result.append(torqueConstant);
		result.append(", torsionalStiffness: "); //$NON-NLS-1$
		result.append(torsionalStiffness);
		result.append(')');
		return result.toString();
	}

} //RotaryTableImpl
