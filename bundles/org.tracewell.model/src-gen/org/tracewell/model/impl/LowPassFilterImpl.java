/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.LowPassFilter;
import org.tracewell.model.LowPassOrder;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Low Pass Filter</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.LowPassFilterImpl#getOrder <em>Order</em>}</li>
 *   <li>{@link org.tracewell.model.impl.LowPassFilterImpl#getCutoffFrequency <em>Cutoff Frequency</em>}</li>
 *   <li>{@link org.tracewell.model.impl.LowPassFilterImpl#getDampingRatio <em>Damping Ratio</em>}</li>
 * </ul>
 *
 * @generated
 */
public class LowPassFilterImpl extends FilterStageImpl implements LowPassFilter {
	/**
	 * The default value of the '{@link #getOrder() <em>Order</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrder()
	 * @generated
	 * @ordered
	 */
	protected static final LowPassOrder ORDER_EDEFAULT = LowPassOrder.FIRST;

	/**
	 * The cached value of the '{@link #getOrder() <em>Order</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrder()
	 * @generated
	 * @ordered
	 */
	protected LowPassOrder order = ORDER_EDEFAULT;

	/**
	 * The default value of the '{@link #getCutoffFrequency() <em>Cutoff Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCutoffFrequency()
	 * @generated
	 * @ordered
	 */
	protected static final double CUTOFF_FREQUENCY_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCutoffFrequency() <em>Cutoff Frequency</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCutoffFrequency()
	 * @generated
	 * @ordered
	 */
	protected double cutoffFrequency = CUTOFF_FREQUENCY_EDEFAULT;

	/**
	 * The default value of the '{@link #getDampingRatio() <em>Damping Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDampingRatio()
	 * @generated
	 * @ordered
	 */
	protected static final double DAMPING_RATIO_EDEFAULT = 0.707;

	/**
	 * The cached value of the '{@link #getDampingRatio() <em>Damping Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDampingRatio()
	 * @generated
	 * @ordered
	 */
	protected double dampingRatio = DAMPING_RATIO_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected LowPassFilterImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.LOW_PASS_FILTER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LowPassOrder getOrder() {
		return order;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOrder(LowPassOrder newOrder) {
		LowPassOrder oldOrder = order;
		order = newOrder == null ? ORDER_EDEFAULT : newOrder;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.LOW_PASS_FILTER__ORDER, oldOrder, order));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCutoffFrequency() {
		return cutoffFrequency;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCutoffFrequency(double newCutoffFrequency) {
		double oldCutoffFrequency = cutoffFrequency;
		cutoffFrequency = newCutoffFrequency;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.LOW_PASS_FILTER__CUTOFF_FREQUENCY, oldCutoffFrequency, cutoffFrequency));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getDampingRatio() {
		return dampingRatio;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDampingRatio(double newDampingRatio) {
		double oldDampingRatio = dampingRatio;
		dampingRatio = newDampingRatio;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.LOW_PASS_FILTER__DAMPING_RATIO, oldDampingRatio, dampingRatio));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.LOW_PASS_FILTER__ORDER:
				return getOrder();
			case TracewellPackage.LOW_PASS_FILTER__CUTOFF_FREQUENCY:
				return getCutoffFrequency();
			case TracewellPackage.LOW_PASS_FILTER__DAMPING_RATIO:
				return getDampingRatio();
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
			case TracewellPackage.LOW_PASS_FILTER__ORDER:
				setOrder((LowPassOrder)newValue);
				return;
			case TracewellPackage.LOW_PASS_FILTER__CUTOFF_FREQUENCY:
				setCutoffFrequency((Double)newValue);
				return;
			case TracewellPackage.LOW_PASS_FILTER__DAMPING_RATIO:
				setDampingRatio((Double)newValue);
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
			case TracewellPackage.LOW_PASS_FILTER__ORDER:
				setOrder(ORDER_EDEFAULT);
				return;
			case TracewellPackage.LOW_PASS_FILTER__CUTOFF_FREQUENCY:
				setCutoffFrequency(CUTOFF_FREQUENCY_EDEFAULT);
				return;
			case TracewellPackage.LOW_PASS_FILTER__DAMPING_RATIO:
				setDampingRatio(DAMPING_RATIO_EDEFAULT);
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
			case TracewellPackage.LOW_PASS_FILTER__ORDER:
				return order != ORDER_EDEFAULT;
			case TracewellPackage.LOW_PASS_FILTER__CUTOFF_FREQUENCY:
				return cutoffFrequency != CUTOFF_FREQUENCY_EDEFAULT;
			case TracewellPackage.LOW_PASS_FILTER__DAMPING_RATIO:
				return dampingRatio != DAMPING_RATIO_EDEFAULT;
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
		result.append(" (order: "); //$NON-NLS-1$
		result.append(order);
		result.append(", cutoffFrequency: "); //$NON-NLS-1$
		result.append(cutoffFrequency);
		result.append(", dampingRatio: "); //$NON-NLS-1$
		result.append(dampingRatio);
		result.append(')');
		return result.toString();
	}

} //LowPassFilterImpl
