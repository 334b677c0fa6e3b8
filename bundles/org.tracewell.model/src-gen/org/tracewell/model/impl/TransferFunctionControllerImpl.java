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
import org.tracewell.model.TransferFunctionController;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Transfer Function Controller</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionControllerImpl#getNumerator <em>Numerator</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionControllerImpl#getDenominator <em>Denominator</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TransferFunctionControllerImpl#getSamplePeriod <em>Sample Period</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TransferFunctionControllerImpl extends ControllerImpl implements TransferFunctionController {
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
	 * The default value of the '{@link #getSamplePeriod() <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected static final double SAMPLE_PERIOD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSamplePeriod() <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSamplePeriod()
	 * @generated
	 * @ordered
	 */
	protected double samplePeriod = SAMPLE_PERIOD_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TransferFunctionControllerImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.TRANSFER_FUNCTION_CONTROLLER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Double> getNumerator() {
		if (numerator == null) {
			numerator = new EDataTypeUniqueEList<Double>(Double.class, this, TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__NUMERATOR);
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
			denominator = new EDataTypeUniqueEList<Double>(Double.class, this, TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR);
		}
		return denominator;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSamplePeriod() {
		return samplePeriod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSamplePeriod(double newSamplePeriod) {
		double oldSamplePeriod = samplePeriod;
		samplePeriod = newSamplePeriod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD, oldSamplePeriod, samplePeriod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__NUMERATOR:
				return getNumerator();
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR:
				return getDenominator();
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD:
				return getSamplePeriod();
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
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__NUMERATOR:
				getNumerator().clear();
				getNumerator().addAll((Collection<? extends Double>)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR:
				getDenominator().clear();
				getDenominator().addAll((Collection<? extends Double>)newValue);
				return;
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD:
				setSamplePeriod((Double)newValue);
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
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__NUMERATOR:
				getNumerator().clear();
				return;
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR:
				getDenominator().clear();
				return;
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD:
				setSamplePeriod(SAMPLE_PERIOD_EDEFAULT);
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
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__NUMERATOR:
				return numerator != null && !numerator.isEmpty();
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__DENOMINATOR:
				return denominator != null && !denominator.isEmpty();
			case TracewellPackage.TRANSFER_FUNCTION_CONTROLLER__SAMPLE_PERIOD:
				return samplePeriod != SAMPLE_PERIOD_EDEFAULT;
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
		result.append(", samplePeriod: "); //$NON-NLS-1$
		result.append(samplePeriod);
		result.append(')');
		return result.toString();
	}

} //TransferFunctionControllerImpl
