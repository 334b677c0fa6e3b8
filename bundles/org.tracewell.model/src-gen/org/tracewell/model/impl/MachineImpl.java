/**
 */
package org.tracewell.model.impl;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.EObjectResolvingEList;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracewell.model.Axis;
import org.tracewell.model.BudgetLine;
import org.tracewell.model.Contour;
import org.tracewell.model.Machine;
import org.tracewell.model.Requirement;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.VariationStudy;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Machine</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getInterpolationPeriod <em>Interpolation Period</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getAxes <em>Axes</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getLibraryAxes <em>Library Axes</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getContours <em>Contours</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getRequirements <em>Requirements</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getBudgetLines <em>Budget Lines</em>}</li>
 *   <li>{@link org.tracewell.model.impl.MachineImpl#getStudies <em>Studies</em>}</li>
 * </ul>
 *
 * @generated
 */
public class MachineImpl extends NamedImpl implements Machine {
	/**
	 * The default value of the '{@link #getInterpolationPeriod() <em>Interpolation Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterpolationPeriod()
	 * @generated
	 * @ordered
	 */
	protected static final double INTERPOLATION_PERIOD_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getInterpolationPeriod() <em>Interpolation Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getInterpolationPeriod()
	 * @generated
	 * @ordered
	 */
	protected double interpolationPeriod = INTERPOLATION_PERIOD_EDEFAULT;

	/**
	 * The cached value of the '{@link #getAxes() <em>Axes</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAxes()
	 * @generated
	 * @ordered
	 */
	protected EList<Axis> axes;

	/**
	 * The cached value of the '{@link #getLibraryAxes() <em>Library Axes</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getLibraryAxes()
	 * @generated
	 * @ordered
	 */
	protected EList<Axis> libraryAxes;

	/**
	 * The cached value of the '{@link #getContours() <em>Contours</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContours()
	 * @generated
	 * @ordered
	 */
	protected EList<Contour> contours;

	/**
	 * The cached value of the '{@link #getRequirements() <em>Requirements</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRequirements()
	 * @generated
	 * @ordered
	 */
	protected EList<Requirement> requirements;

	/**
	 * The cached value of the '{@link #getBudgetLines() <em>Budget Lines</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBudgetLines()
	 * @generated
	 * @ordered
	 */
	protected EList<BudgetLine> budgetLines;

	/**
	 * The cached value of the '{@link #getStudies() <em>Studies</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStudies()
	 * @generated
	 * @ordered
	 */
	protected EList<VariationStudy> studies;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected MachineImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.MACHINE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getInterpolationPeriod() {
		return interpolationPeriod;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setInterpolationPeriod(double newInterpolationPeriod) {
		double oldInterpolationPeriod = interpolationPeriod;
		interpolationPeriod = newInterpolationPeriod;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.MACHINE__INTERPOLATION_PERIOD, oldInterpolationPeriod, interpolationPeriod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Axis> getAxes() {
		if (axes == null) {
			axes = new EObjectContainmentEList<Axis>(Axis.class, this, TracewellPackage.MACHINE__AXES);
		}
		return axes;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Axis> getLibraryAxes() {
		if (libraryAxes == null) {
			libraryAxes = new EObjectResolvingEList<Axis>(Axis.class, this, TracewellPackage.MACHINE__LIBRARY_AXES);
		}
		return libraryAxes;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Contour> getContours() {
		if (contours == null) {
			contours = new EObjectContainmentEList<Contour>(Contour.class, this, TracewellPackage.MACHINE__CONTOURS);
		}
		return contours;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Requirement> getRequirements() {
		if (requirements == null) {
			requirements = new EObjectContainmentEList<Requirement>(Requirement.class, this, TracewellPackage.MACHINE__REQUIREMENTS);
		}
		return requirements;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<BudgetLine> getBudgetLines() {
		if (budgetLines == null) {
			budgetLines = new EObjectContainmentEList<BudgetLine>(BudgetLine.class, this, TracewellPackage.MACHINE__BUDGET_LINES);
		}
		return budgetLines;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<VariationStudy> getStudies() {
		if (studies == null) {
			studies = new EObjectContainmentEList<VariationStudy>(VariationStudy.class, this, TracewellPackage.MACHINE__STUDIES);
		}
		return studies;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TracewellPackage.MACHINE__AXES:
				return ((InternalEList<?>)getAxes()).basicRemove(otherEnd, msgs);
			case TracewellPackage.MACHINE__CONTOURS:
				return ((InternalEList<?>)getContours()).basicRemove(otherEnd, msgs);
			case TracewellPackage.MACHINE__REQUIREMENTS:
				return ((InternalEList<?>)getRequirements()).basicRemove(otherEnd, msgs);
			case TracewellPackage.MACHINE__BUDGET_LINES:
				return ((InternalEList<?>)getBudgetLines()).basicRemove(otherEnd, msgs);
			case TracewellPackage.MACHINE__STUDIES:
				return ((InternalEList<?>)getStudies()).basicRemove(otherEnd, msgs);
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
			case TracewellPackage.MACHINE__INTERPOLATION_PERIOD:
				return getInterpolationPeriod();
			case TracewellPackage.MACHINE__AXES:
				return getAxes();
			case TracewellPackage.MACHINE__LIBRARY_AXES:
				return getLibraryAxes();
			case TracewellPackage.MACHINE__CONTOURS:
				return getContours();
			case TracewellPackage.MACHINE__REQUIREMENTS:
				return getRequirements();
			case TracewellPackage.MACHINE__BUDGET_LINES:
				return getBudgetLines();
			case TracewellPackage.MACHINE__STUDIES:
				return getStudies();
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
			case TracewellPackage.MACHINE__INTERPOLATION_PERIOD:
				setInterpolationPeriod((Double)newValue);
				return;
			case TracewellPackage.MACHINE__AXES:
				getAxes().clear();
				getAxes().addAll((Collection<? extends Axis>)newValue);
				return;
			case TracewellPackage.MACHINE__LIBRARY_AXES:
				getLibraryAxes().clear();
				getLibraryAxes().addAll((Collection<? extends Axis>)newValue);
				return;
			case TracewellPackage.MACHINE__CONTOURS:
				getContours().clear();
				getContours().addAll((Collection<? extends Contour>)newValue);
				return;
			case TracewellPackage.MACHINE__REQUIREMENTS:
				getRequirements().clear();
				getRequirements().addAll((Collection<? extends Requirement>)newValue);
				return;
			case TracewellPackage.MACHINE__BUDGET_LINES:
				getBudgetLines().clear();
				getBudgetLines().addAll((Collection<? extends BudgetLine>)newValue);
				return;
			case TracewellPackage.MACHINE__STUDIES:
				getStudies().clear();
				getStudies().addAll((Collection<? extends VariationStudy>)newValue);
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
			case TracewellPackage.MACHINE__INTERPOLATION_PERIOD:
				setInterpolationPeriod(INTERPOLATION_PERIOD_EDEFAULT);
				return;
			case TracewellPackage.MACHINE__AXES:
				getAxes().clear();
				return;
			case TracewellPackage.MACHINE__LIBRARY_AXES:
				getLibraryAxes().clear();
				return;
			case TracewellPackage.MACHINE__CONTOURS:
				getContours().clear();
				return;
			case TracewellPackage.MACHINE__REQUIREMENTS:
				getRequirements().clear();
				return;
			case TracewellPackage.MACHINE__BUDGET_LINES:
				getBudgetLines().clear();
				return;
			case TracewellPackage.MACHINE__STUDIES:
				getStudies().clear();
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
			case TracewellPackage.MACHINE__INTERPOLATION_PERIOD:
				return interpolationPeriod != INTERPOLATION_PERIOD_EDEFAULT;
			case TracewellPackage.MACHINE__AXES:
				return axes != null && !axes.isEmpty();
			case TracewellPackage.MACHINE__LIBRARY_AXES:
				return libraryAxes != null && !libraryAxes.isEmpty();
			case TracewellPackage.MACHINE__CONTOURS:
				return contours != null && !contours.isEmpty();
			case TracewellPackage.MACHINE__REQUIREMENTS:
				return requirements != null && !requirements.isEmpty();
			case TracewellPackage.MACHINE__BUDGET_LINES:
				return budgetLines != null && !budgetLines.isEmpty();
			case TracewellPackage.MACHINE__STUDIES:
				return studies != null && !studies.isEmpty();
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
		result.append(" (interpolationPeriod: "); //$NON-NLS-1$
		result.append(interpolationPeriod);
		result.append(')');
		return result.toString();
	}

} //MachineImpl
