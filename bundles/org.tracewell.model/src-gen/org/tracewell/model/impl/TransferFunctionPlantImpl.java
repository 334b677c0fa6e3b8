/**
 */
package org.tracewell.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;

import org.tracewell.model.TracewellPackage;
import org.tracewell.model.TransferFunctionPlant;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Transfer Function Plant</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getNumerator <em>Numerator</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getDenominator <em>Denominator</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getDeadTime <em>Dead Time</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getRatio <em>Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getEquivalentInertia <em>Equivalent Inertia</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getTorqueConstant <em>Torque Constant</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionPlantImpl#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TransferFunctionPlantImpl extends PlantImpl implements TransferFunctionPlant {
	/**
	 * The cached value of the '{@link #getNumerator() <em>Numerator</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNumerator()
	 * @generated
	 * @ordered
	 */
	protected EList<Double> numerator;

	/**
	 * The cached value of the '{@link #getDenominator() <em>Denominator</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDenominator()
	 * @generated
	 * @ordered
	 */
	protected EList<Double> denominator;

	/**
	 * The default value of the '{@link #getDeadTime() <em>Dead Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDeadTime()
	 * @generated
	 * @ordered
	 */
	protected static final double DEAD_TIME_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getDeadTime() <em>Dead Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDeadTime()
	 * @generated
	 * @ordered
	 */
	protected double deadTime = DEAD_TIME_EDEFAULT;

	/**
	 * The default value of the '{@link #getRatio() <em>Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRatio()
	 * @generated
	 * @ordered
	 */
	protected static final double RATIO_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getRatio() <em>Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRatio()
	 * @generated
	 * @ordered
	 */
	protected double ratio = RATIO_EDEFAULT;

	/**
	 * The default value of the '{@link #getEquivalentInertia() <em>Equivalent Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEquivalentInertia()
	 * @generated
	 * @ordered
	 */
	protected static final double EQUIVALENT_INERTIA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getEquivalentInertia() <em>Equivalent Inertia</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEquivalentInertia()
	 * @generated
	 * @ordered
	 */
	protected double equivalentInertia = EQUIVALENT_INERTIA_EDEFAULT;

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
	 * The default value of the '{@link #getCurrentLoopBandwidth() <em>Current Loop Bandwidth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCurrentLoopBandwidth()
	 * @generated
	 * @ordered
	 */
	protected static final double CURRENT_LOOP_BANDWIDTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCurrentLoopBandwidth() <em>Current Loop Bandwidth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCurrentLoopBandwidth()
	 * @generated
	 * @ordered
	 */
	protected double currentLoopBandwidth = CURRENT_LOOP_BANDWIDTH_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TransferFunctionPlantImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.TRANSFER_FUNCTION_PLANT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Double> getNumerator() {
		if (numerator == null) {
			numerator = new EDataTypeUniqueEList<Double>(Double.class, this, TracewellPackage.TRANSFER_FUNCTION_PLANT__NUMERATOR);
		}
		return numerator;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Double> getDenominator() {
		if (denominator == null) {
			denominator = new EDataTypeUniqueEList<Double>(Double.class, this, TracewellPackage.TRANSFER_FUNCTION_PLANT__DENOMINATOR);
		}
		return denominator;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDeadTime() {
		return deadTime;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDeadTime(double newDeadTime) {
		double oldDeadTime = deadTime;
		deadTime = newDeadTime;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TRANSFER_FUNCTION_PLANT__DEAD_TIME, oldDeadTime, deadTime));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getRatio() {
		return ratio;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRatio(double newRatio) {
		double oldRatio = ratio;
		ratio = newRatio;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TRANSFER_FUNCTION_PLANT__RATIO, oldRatio, ratio));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEquivalentInertia() {
		return equivalentInertia;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEquivalentInertia(double newEquivalentInertia) {
		double oldEquivalentInertia = equivalentInertia;
		equivalentInertia = newEquivalentInertia;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA, oldEquivalentInertia, equivalentInertia));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT, oldTorqueConstant, torqueConstant));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCurrentLoopBandwidth() {
		return currentLoopBandwidth;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCurrentLoopBandwidth(double newCurrentLoopBandwidth) {
		double oldCurrentLoopBandwidth = currentLoopBandwidth;
		currentLoopBandwidth = newCurrentLoopBandwidth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH, oldCurrentLoopBandwidth, currentLoopBandwidth));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__NUMERATOR:
				return getNumerator();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DENOMINATOR:
				return getDenominator();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DEAD_TIME:
				return getDeadTime();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__RATIO:
				return getRatio();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA:
				return getEquivalentInertia();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT:
				return getTorqueConstant();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH:
				return getCurrentLoopBandwidth();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__NUMERATOR:
				getNumerator().clear();
				getNumerator().addAll((Collection<? extends Double>)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DENOMINATOR:
				getDenominator().clear();
				getDenominator().addAll((Collection<? extends Double>)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DEAD_TIME:
				setDeadTime((Double)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__RATIO:
				setRatio((Double)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA:
				setEquivalentInertia((Double)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT:
				setTorqueConstant((Double)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH:
				setCurrentLoopBandwidth((Double)newValue);
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
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__NUMERATOR:
				getNumerator().clear();
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DENOMINATOR:
				getDenominator().clear();
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DEAD_TIME:
				setDeadTime(DEAD_TIME_EDEFAULT);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__RATIO:
				setRatio(RATIO_EDEFAULT);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA:
				setEquivalentInertia(EQUIVALENT_INERTIA_EDEFAULT);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT:
				setTorqueConstant(TORQUE_CONSTANT_EDEFAULT);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH:
				setCurrentLoopBandwidth(CURRENT_LOOP_BANDWIDTH_EDEFAULT);
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
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__NUMERATOR:
				return numerator != null && !numerator.isEmpty();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DENOMINATOR:
				return denominator != null && !denominator.isEmpty();
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__DEAD_TIME:
				return deadTime != DEAD_TIME_EDEFAULT;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__RATIO:
				return ratio != RATIO_EDEFAULT;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__EQUIVALENT_INERTIA:
				return equivalentInertia != EQUIVALENT_INERTIA_EDEFAULT;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__TORQUE_CONSTANT:
				return torqueConstant != TORQUE_CONSTANT_EDEFAULT;
			case TracewellPackage.TRANSFER_FUNCTION_PLANT__CURRENT_LOOP_BANDWIDTH:
				return currentLoopBandwidth != CURRENT_LOOP_BANDWIDTH_EDEFAULT;
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
		result.append(" (numerator: "); //$NON-NLS-1$
		result.append(numerator);
		result.append(", denominator: "); //$NON-NLS-1$
		result.append(denominator);
		result.append(", deadTime: "); //$NON-NLS-1$
		result.append(deadTime);
		result.append(", ratio: "); //$NON-NLS-1$
		result.append(ratio);
		result.append(", equivalentInertia: "); //$NON-NLS-1$
		result.append(equivalentInertia);
		result.append(", torqueConstant: "); //$NON-NLS-1$
		result.append(torqueConstant);
		result.append(", currentLoopBandwidth: "); //$NON-NLS-1$
		result.append(currentLoopBandwidth);
		result.append(')');
		return result.toString();
	}

} //TransferFunctionPlantImpl
