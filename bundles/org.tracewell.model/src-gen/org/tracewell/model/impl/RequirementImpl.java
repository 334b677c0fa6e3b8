/**
 */
package org.tracewell.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectResolvingEList;

import org.tracewell.model.Axis;
import org.tracewell.model.Contour;
import org.tracewell.model.ContourMetric;
import org.tracewell.model.LimitBound;
import org.tracewell.model.Requirement;
import org.tracewell.model.RequirementKind;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Requirement</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getStatement <em>Statement</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getMetric <em>Metric</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getContours <em>Contours</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getBound <em>Bound</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getLimit <em>Limit</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getDisplayUnit <em>Display Unit</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getParent <em>Parent</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getAllocatedAxis <em>Allocated Axis</em>}</li>
 *   <li>{@link org.tracewell.model.impl.RequirementImpl#getRationale <em>Rationale</em>}</li>
 * </ul>
 *
 * @generated
 */
public class RequirementImpl extends IdentifiedImpl implements Requirement {
	/**
	 * The default value of the '{@link #getStatement() <em>Statement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatement()
	 * @generated
	 * @ordered
	 */
	protected static final String STATEMENT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getStatement() <em>Statement</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStatement()
	 * @generated
	 * @ordered
	 */
	protected String statement = STATEMENT_EDEFAULT;

	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final RequirementKind KIND_EDEFAULT = RequirementKind.CONTOUR_DEVIATION;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected RequirementKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getMetric() <em>Metric</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMetric()
	 * @generated
	 * @ordered
	 */
	protected static final ContourMetric METRIC_EDEFAULT = ContourMetric.MAX_NORMAL_DEVIATION;

	/**
	 * The cached value of the '{@link #getMetric() <em>Metric</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMetric()
	 * @generated
	 * @ordered
	 */
	protected ContourMetric metric = METRIC_EDEFAULT;

	/**
	 * The cached value of the '{@link #getContours() <em>Contours</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContours()
	 * @generated
	 * @ordered
	 */
	protected EList<Contour> contours;

	/**
	 * The default value of the '{@link #getBound() <em>Bound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBound()
	 * @generated
	 * @ordered
	 */
	protected static final LimitBound BOUND_EDEFAULT = LimitBound.AT_MOST;

	/**
	 * The cached value of the '{@link #getBound() <em>Bound</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBound()
	 * @generated
	 * @ordered
	 */
	protected LimitBound bound = BOUND_EDEFAULT;

	/**
	 * The default value of the '{@link #getLimit() <em>Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLimit()
	 * @generated
	 * @ordered
	 */
	protected static final double LIMIT_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getLimit() <em>Limit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLimit()
	 * @generated
	 * @ordered
	 */
	protected double limit = LIMIT_EDEFAULT;

	/**
	 * The default value of the '{@link #getDisplayUnit() <em>Display Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDisplayUnit()
	 * @generated
	 * @ordered
	 */
	protected static final String DISPLAY_UNIT_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDisplayUnit() <em>Display Unit</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDisplayUnit()
	 * @generated
	 * @ordered
	 */
	protected String displayUnit = DISPLAY_UNIT_EDEFAULT;

	/**
	 * The cached value of the '{@link #getParent() <em>Parent</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParent()
	 * @generated
	 * @ordered
	 */
	protected Requirement parent;

	/**
	 * The cached value of the '{@link #getAllocatedAxis() <em>Allocated Axis</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAllocatedAxis()
	 * @generated
	 * @ordered
	 */
	protected Axis allocatedAxis;

	/**
	 * The default value of the '{@link #getRationale() <em>Rationale</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRationale()
	 * @generated
	 * @ordered
	 */
	protected static final String RATIONALE_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getRationale() <em>Rationale</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRationale()
	 * @generated
	 * @ordered
	 */
	protected String rationale = RATIONALE_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected RequirementImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.REQUIREMENT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getStatement() {
		return statement;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStatement(String newStatement) {
		String oldStatement = statement;
		statement = newStatement;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__STATEMENT, oldStatement, statement));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public RequirementKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(RequirementKind newKind) {
		RequirementKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ContourMetric getMetric() {
		return metric;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMetric(ContourMetric newMetric) {
		ContourMetric oldMetric = metric;
		metric = newMetric == null ? METRIC_EDEFAULT : newMetric;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__METRIC, oldMetric, metric));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Contour> getContours() {
		if (contours == null) {
			contours = new EObjectResolvingEList<Contour>(Contour.class, this, TracewellPackage.REQUIREMENT__CONTOURS);
		}
		return contours;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public LimitBound getBound() {
		return bound;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBound(LimitBound newBound) {
		LimitBound oldBound = bound;
		bound = newBound == null ? BOUND_EDEFAULT : newBound;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__BOUND, oldBound, bound));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getLimit() {
		return limit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setLimit(double newLimit) {
		double oldLimit = limit;
		limit = newLimit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__LIMIT, oldLimit, limit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDisplayUnit() {
		return displayUnit;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDisplayUnit(String newDisplayUnit) {
		String oldDisplayUnit = displayUnit;
		displayUnit = newDisplayUnit;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__DISPLAY_UNIT, oldDisplayUnit, displayUnit));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Requirement getParent() {
		if (parent != null && parent.eIsProxy()) {
			InternalEObject oldParent = (InternalEObject)parent;
			parent = (Requirement)eResolveProxy(oldParent);
			if (parent != oldParent) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, TracewellPackage.REQUIREMENT__PARENT, oldParent, parent));
			}
		}
		return parent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Requirement basicGetParent() {
		return parent;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setParent(Requirement newParent) {
		Requirement oldParent = parent;
		parent = newParent;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__PARENT, oldParent, parent));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Axis getAllocatedAxis() {
		if (allocatedAxis != null && allocatedAxis.eIsProxy()) {
			InternalEObject oldAllocatedAxis = (InternalEObject)allocatedAxis;
			allocatedAxis = (Axis)eResolveProxy(oldAllocatedAxis);
			if (allocatedAxis != oldAllocatedAxis) {
				if (eNotificationRequired())
					eNotify(new ENotificationImpl(this, Notification.RESOLVE, TracewellPackage.REQUIREMENT__ALLOCATED_AXIS, oldAllocatedAxis, allocatedAxis));
			}
		}
		return allocatedAxis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public Axis basicGetAllocatedAxis() {
		return allocatedAxis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setAllocatedAxis(Axis newAllocatedAxis) {
		Axis oldAllocatedAxis = allocatedAxis;
		allocatedAxis = newAllocatedAxis;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__ALLOCATED_AXIS, oldAllocatedAxis, allocatedAxis));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getRationale() {
		return rationale;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setRationale(String newRationale) {
		String oldRationale = rationale;
		rationale = newRationale;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.REQUIREMENT__RATIONALE, oldRationale, rationale));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.REQUIREMENT__STATEMENT:
				return getStatement();
			case TracewellPackage.REQUIREMENT__KIND:
				return getKind();
			case TracewellPackage.REQUIREMENT__METRIC:
				return getMetric();
			case TracewellPackage.REQUIREMENT__CONTOURS:
				return getContours();
			case TracewellPackage.REQUIREMENT__BOUND:
				return getBound();
			case TracewellPackage.REQUIREMENT__LIMIT:
				return getLimit();
			case TracewellPackage.REQUIREMENT__DISPLAY_UNIT:
				return getDisplayUnit();
			case TracewellPackage.REQUIREMENT__PARENT:
				if (resolve) return getParent();
				return basicGetParent();
			case TracewellPackage.REQUIREMENT__ALLOCATED_AXIS:
				if (resolve) return getAllocatedAxis();
				return basicGetAllocatedAxis();
			case TracewellPackage.REQUIREMENT__RATIONALE:
				return getRationale();
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
			case TracewellPackage.REQUIREMENT__STATEMENT:
				setStatement((String)newValue);
				return;
			case TracewellPackage.REQUIREMENT__KIND:
				setKind((RequirementKind)newValue);
				return;
			case TracewellPackage.REQUIREMENT__METRIC:
				setMetric((ContourMetric)newValue);
				return;
			case TracewellPackage.REQUIREMENT__CONTOURS:
				getContours().clear();
				getContours().addAll((Collection<? extends Contour>)newValue);
				return;
			case TracewellPackage.REQUIREMENT__BOUND:
				setBound((LimitBound)newValue);
				return;
			case TracewellPackage.REQUIREMENT__LIMIT:
				setLimit((Double)newValue);
				return;
			case TracewellPackage.REQUIREMENT__DISPLAY_UNIT:
				setDisplayUnit((String)newValue);
				return;
			case TracewellPackage.REQUIREMENT__PARENT:
				setParent((Requirement)newValue);
				return;
			case TracewellPackage.REQUIREMENT__ALLOCATED_AXIS:
				setAllocatedAxis((Axis)newValue);
				return;
			case TracewellPackage.REQUIREMENT__RATIONALE:
				setRationale((String)newValue);
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
			case TracewellPackage.REQUIREMENT__STATEMENT:
				setStatement(STATEMENT_EDEFAULT);
				return;
			case TracewellPackage.REQUIREMENT__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case TracewellPackage.REQUIREMENT__METRIC:
				setMetric(METRIC_EDEFAULT);
				return;
			case TracewellPackage.REQUIREMENT__CONTOURS:
				getContours().clear();
				return;
			case TracewellPackage.REQUIREMENT__BOUND:
				setBound(BOUND_EDEFAULT);
				return;
			case TracewellPackage.REQUIREMENT__LIMIT:
				setLimit(LIMIT_EDEFAULT);
				return;
			case TracewellPackage.REQUIREMENT__DISPLAY_UNIT:
				setDisplayUnit(DISPLAY_UNIT_EDEFAULT);
				return;
			case TracewellPackage.REQUIREMENT__PARENT:
				setParent((Requirement)null);
				return;
			case TracewellPackage.REQUIREMENT__ALLOCATED_AXIS:
				setAllocatedAxis((Axis)null);
				return;
			case TracewellPackage.REQUIREMENT__RATIONALE:
				setRationale(RATIONALE_EDEFAULT);
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
			case TracewellPackage.REQUIREMENT__STATEMENT:
				return STATEMENT_EDEFAULT == null ? statement != null : !STATEMENT_EDEFAULT.equals(statement);
			case TracewellPackage.REQUIREMENT__KIND:
				return kind != KIND_EDEFAULT;
			case TracewellPackage.REQUIREMENT__METRIC:
				return metric != METRIC_EDEFAULT;
			case TracewellPackage.REQUIREMENT__CONTOURS:
				return contours != null && !contours.isEmpty();
			case TracewellPackage.REQUIREMENT__BOUND:
				return bound != BOUND_EDEFAULT;
			case TracewellPackage.REQUIREMENT__LIMIT:
				return limit != LIMIT_EDEFAULT;
			case TracewellPackage.REQUIREMENT__DISPLAY_UNIT:
				return DISPLAY_UNIT_EDEFAULT == null ? displayUnit != null : !DISPLAY_UNIT_EDEFAULT.equals(displayUnit);
			case TracewellPackage.REQUIREMENT__PARENT:
				return parent != null;
			case TracewellPackage.REQUIREMENT__ALLOCATED_AXIS:
				return allocatedAxis != null;
			case TracewellPackage.REQUIREMENT__RATIONALE:
				return RATIONALE_EDEFAULT == null ? rationale != null : !RATIONALE_EDEFAULT.equals(rationale);
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
		result.append(" (statement: "); //$NON-NLS-1$
		result.append(statement);
		result.append(", kind: "); //$NON-NLS-1$
		result.append(kind);
		result.append(", metric: "); //$NON-NLS-1$
		result.append(metric);
		result.append(", bound: "); //$NON-NLS-1$
		result.append(bound);
		result.append(", limit: "); //$NON-NLS-1$
		result.append(limit);
		result.append(", displayUnit: "); //$NON-NLS-1$
		result.append(displayUnit);
		result.append(", rationale: "); //$NON-NLS-1$
		result.append(rationale);
		result.append(')');
		return result.toString();
	}

} //RequirementImpl
