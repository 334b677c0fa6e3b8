/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.Axis;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.BudgetSource;
import org.tracewell.model.Distribution;
import org.tracewell.model.ErrorClass;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.ValueOrigin;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Budget Line</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getName <em>Name</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getAxis <em>Axis</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getSource <em>Source</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getValue <em>Value</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getOrigin <em>Origin</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getErrorClass <em>Error Class</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getDistribution <em>Distribution</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getSensitivity <em>Sensitivity</em>}</li>
 *   <li>{@link org.tracewell.model.impl.BudgetLineImpl#getEvidence <em>Evidence</em>}</li>
 * </ul>
 *
 * @generated
 */
public class BudgetLineImpl extends IdentifiedImpl implements BudgetLine {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The cached value of the '{@link #getAxis() <em>Axis</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAxis()
	 * @generated
	 * @ordered
	 */
	protected Axis axis;

	/**
	 * The default value of the '{@link #getSource() <em>Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSource()
	 * @generated
	 * @ordered
	 */
	protected static final BudgetSource SOURCE_EDEFAULT = BudgetSource.SERVO_LAG;

	/**
	 * The cached value of the '{@link #getSource() <em>Source</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSource()
	 * @generated
	 * @ordered
	 */
	protected BudgetSource source = SOURCE_EDEFAULT;

	/**
	 * The default value of the '{@link #getValue() <em>Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getValue()
	 * @generated
	 * @ordered
	 */
	protected static final double VALUE_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getValue() <em>Value</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getValue()
	 * @generated
	 * @ordered
	 */
	protected double value = VALUE_EDEFAULT;

	/**
	 * The default value of the '{@link #getOrigin() <em>Origin</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrigin()
	 * @generated
	 * @ordered
	 */
	protected static final ValueOrigin ORIGIN_EDEFAULT = ValueOrigin.ENTERED;

	/**
	 * The cached value of the '{@link #getOrigin() <em>Origin</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getOrigin()
	 * @generated
	 * @ordered
	 */
	protected ValueOrigin origin = ORIGIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getErrorClass() <em>Error Class</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getErrorClass()
	 * @generated
	 * @ordered
	 */
	protected static final ErrorClass ERROR_CLASS_EDEFAULT = ErrorClass.SYSTEMATIC;

	/**
	 * The cached value of the '{@link #getErrorClass() <em>Error Class</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getErrorClass()
	 * @generated
	 * @ordered
	 */
	protected ErrorClass errorClass = ERROR_CLASS_EDEFAULT;

	/**
	 * The default value of the '{@link #getDistribution() <em>Distribution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDistribution()
	 * @generated
	 * @ordered
	 */
	protected static final Distribution DISTRIBUTION_EDEFAULT = Distribution.NORMAL;

	/**
	 * The cached value of the '{@link #getDistribution() <em>Distribution</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDistribution()
	 * @generated
	 * @ordered
	 */
	protected Distribution distribution = DISTRIBUTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getSensitivity() <em>Sensitivity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSensitivity()
	 * @generated
	 * @ordered
	 */
	protected static final double SENSITIVITY_EDEFAULT = 1.0;

	/**
	 * The cached value of the '{@link #getSensitivity() <em>Sensitivity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSensitivity()
	 * @generated
	 * @ordered
	 */
	protected double sensitivity = SENSITIVITY_EDEFAULT;

	/**
	 * The default value of the '{@link #getEvidence() <em>Evidence</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEvidence()
	 * @generated
	 * @ordered
	 */
	protected static final String EVIDENCE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getEvidence() <em>Evidence</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEvidence()
	 * @generated
	 * @ordered
	 */
	protected String evidence = EVIDENCE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected BudgetLineImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.BUDGET_LINE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Axis getAxis() {
		if (axis != null && axis.eIsProxy()) {
			InternalEObject oldAxis = (InternalEObject)axis;
			axis = (Axis)eResolveProxy(oldAxis);
			if (axis != oldAxis) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, TracewellPackage.BUDGET_LINE__AXIS, oldAxis, axis));
			}
		}
		return axis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Axis basicGetAxis() {
		return axis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAxis(Axis newAxis) {
		Axis oldAxis = axis;
		axis = newAxis;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__AXIS, oldAxis, axis));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public BudgetSource getSource() {
		return source;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSource(BudgetSource newSource) {
		BudgetSource oldSource = source;
		source = newSource == null ? SOURCE_EDEFAULT : newSource;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__SOURCE, oldSource, source));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getValue() {
		return value;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setValue(double newValue) {
		double oldValue = value;
		value = newValue;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__VALUE, oldValue, value));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ValueOrigin getOrigin() {
		return origin;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setOrigin(ValueOrigin newOrigin) {
		ValueOrigin oldOrigin = origin;
		origin = newOrigin == null ? ORIGIN_EDEFAULT : newOrigin;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__ORIGIN, oldOrigin, origin));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ErrorClass getErrorClass() {
		return errorClass;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setErrorClass(ErrorClass newErrorClass) {
		ErrorClass oldErrorClass = errorClass;
		errorClass = newErrorClass == null ? ERROR_CLASS_EDEFAULT : newErrorClass;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__ERROR_CLASS, oldErrorClass, errorClass));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Distribution getDistribution() {
		return distribution;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDistribution(Distribution newDistribution) {
		Distribution oldDistribution = distribution;
		distribution = newDistribution == null ? DISTRIBUTION_EDEFAULT : newDistribution;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__DISTRIBUTION, oldDistribution, distribution));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSensitivity() {
		return sensitivity;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSensitivity(double newSensitivity) {
		double oldSensitivity = sensitivity;
		sensitivity = newSensitivity;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__SENSITIVITY, oldSensitivity, sensitivity));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getEvidence() {
		return evidence;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEvidence(String newEvidence) {
		String oldEvidence = evidence;
		evidence = newEvidence;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.BUDGET_LINE__EVIDENCE, oldEvidence, evidence));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.BUDGET_LINE__NAME:
				return getName();
			case TracewellPackage.BUDGET_LINE__AXIS:
				if (resolve) return getAxis();
				return basicGetAxis();
			case TracewellPackage.BUDGET_LINE__SOURCE:
				return getSource();
			case TracewellPackage.BUDGET_LINE__VALUE:
				return getValue();
			case TracewellPackage.BUDGET_LINE__ORIGIN:
				return getOrigin();
			case TracewellPackage.BUDGET_LINE__ERROR_CLASS:
				return getErrorClass();
			case TracewellPackage.BUDGET_LINE__DISTRIBUTION:
				return getDistribution();
			case TracewellPackage.BUDGET_LINE__SENSITIVITY:
				return getSensitivity();
			case TracewellPackage.BUDGET_LINE__EVIDENCE:
				return getEvidence();
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
			case TracewellPackage.BUDGET_LINE__NAME:
				setName((String)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__AXIS:
				setAxis((Axis)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__SOURCE:
				setSource((BudgetSource)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__VALUE:
				setValue((Double)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__ORIGIN:
				setOrigin((ValueOrigin)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__ERROR_CLASS:
				setErrorClass((ErrorClass)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__DISTRIBUTION:
				setDistribution((Distribution)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__SENSITIVITY:
				setSensitivity((Double)newValue);
				return;
			case TracewellPackage.BUDGET_LINE__EVIDENCE:
				setEvidence((String)newValue);
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
			case TracewellPackage.BUDGET_LINE__NAME:
				setName(NAME_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__AXIS:
				setAxis((Axis)null);
				return;
			case TracewellPackage.BUDGET_LINE__SOURCE:
				setSource(SOURCE_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__VALUE:
				setValue(VALUE_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__ORIGIN:
				setOrigin(ORIGIN_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__ERROR_CLASS:
				setErrorClass(ERROR_CLASS_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__DISTRIBUTION:
				setDistribution(DISTRIBUTION_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__SENSITIVITY:
				setSensitivity(SENSITIVITY_EDEFAULT);
				return;
			case TracewellPackage.BUDGET_LINE__EVIDENCE:
				setEvidence(EVIDENCE_EDEFAULT);
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
			case TracewellPackage.BUDGET_LINE__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case TracewellPackage.BUDGET_LINE__AXIS:
				return axis != null;
			case TracewellPackage.BUDGET_LINE__SOURCE:
				return source != SOURCE_EDEFAULT;
			case TracewellPackage.BUDGET_LINE__VALUE:
				return value != VALUE_EDEFAULT;
			case TracewellPackage.BUDGET_LINE__ORIGIN:
				return origin != ORIGIN_EDEFAULT;
			case TracewellPackage.BUDGET_LINE__ERROR_CLASS:
				return errorClass != ERROR_CLASS_EDEFAULT;
			case TracewellPackage.BUDGET_LINE__DISTRIBUTION:
				return distribution != DISTRIBUTION_EDEFAULT;
			case TracewellPackage.BUDGET_LINE__SENSITIVITY:
				return sensitivity != SENSITIVITY_EDEFAULT;
			case TracewellPackage.BUDGET_LINE__EVIDENCE:
				return EVIDENCE_EDEFAULT == null ? evidence != null : !EVIDENCE_EDEFAULT.equals(evidence);
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
		result.append(" (name: "); //$NON-NLS-1$
		result.append(name);
		result.append(", source: "); //$NON-NLS-1$
		result.append(source);
		result.append(", value: "); //$NON-NLS-1$
		result.append(value);
		result.append(", origin: "); //$NON-NLS-1$
		result.append(origin);
		result.append(", errorClass: "); //$NON-NLS-1$
		result.append(errorClass);
		result.append(", distribution: "); //$NON-NLS-1$
		result.append(distribution);
		result.append(", sensitivity: "); //$NON-NLS-1$
		result.append(sensitivity);
		result.append(", evidence: "); //$NON-NLS-1$
		result.append(evidence);
		result.append(')');
		return result.toString();
	}

} //BudgetLineImpl
