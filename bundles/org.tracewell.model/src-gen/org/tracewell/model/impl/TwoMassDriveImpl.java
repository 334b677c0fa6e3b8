/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.ScrewMounting;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.TwoMassDrive;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Two Mass Drive</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getScrewRootDiameter <em>Screw Root Diameter</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getScrewMounting <em>Screw Mounting</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getBearingSpan <em>Bearing Span</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getNutStiffness <em>Nut Stiffness</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getBearingStiffness <em>Bearing Stiffness</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getDampingRatio <em>Damping Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getNutPositionMin <em>Nut Position Min</em>}</li>
 *   <li>{@link org.tracewell.model.impl.TwoMassDriveImpl#getNutPositionMax <em>Nut Position Max</em>}</li>
 * </ul>
 *
 * @generated
 */
public class TwoMassDriveImpl extends RigidScrewDriveImpl implements TwoMassDrive {
	/**
	 * The default value of the '{@link #getScrewRootDiameter() <em>Screw Root Diameter</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScrewRootDiameter()
	 * @generated
	 * @ordered
	 */
	protected static final double SCREW_ROOT_DIAMETER_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getScrewRootDiameter() <em>Screw Root Diameter</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScrewRootDiameter()
	 * @generated
	 * @ordered
	 */
	protected double screwRootDiameter = SCREW_ROOT_DIAMETER_EDEFAULT;

	/**
	 * The default value of the '{@link #getScrewMounting() <em>Screw Mounting</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScrewMounting()
	 * @generated
	 * @ordered
	 */
	protected static final ScrewMounting SCREW_MOUNTING_EDEFAULT = ScrewMounting.FIXED_FREE;

	/**
	 * The cached value of the '{@link #getScrewMounting() <em>Screw Mounting</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getScrewMounting()
	 * @generated
	 * @ordered
	 */
	protected ScrewMounting screwMounting = SCREW_MOUNTING_EDEFAULT;

	/**
	 * The default value of the '{@link #getBearingSpan() <em>Bearing Span</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBearingSpan()
	 * @generated
	 * @ordered
	 */
	protected static final double BEARING_SPAN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBearingSpan() <em>Bearing Span</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBearingSpan()
	 * @generated
	 * @ordered
	 */
	protected double bearingSpan = BEARING_SPAN_EDEFAULT;

	/**
	 * The default value of the '{@link #getNutStiffness() <em>Nut Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNutStiffness()
	 * @generated
	 * @ordered
	 */
	protected static final double NUT_STIFFNESS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getNutStiffness() <em>Nut Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNutStiffness()
	 * @generated
	 * @ordered
	 */
	protected double nutStiffness = NUT_STIFFNESS_EDEFAULT;

	/**
	 * The default value of the '{@link #getBearingStiffness() <em>Bearing Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBearingStiffness()
	 * @generated
	 * @ordered
	 */
	protected static final double BEARING_STIFFNESS_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getBearingStiffness() <em>Bearing Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getBearingStiffness()
	 * @generated
	 * @ordered
	 */
	protected double bearingStiffness = BEARING_STIFFNESS_EDEFAULT;

	/**
	 * The default value of the '{@link #getDampingRatio() <em>Damping Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDampingRatio()
	 * @generated
	 * @ordered
	 */
	protected static final double DAMPING_RATIO_EDEFAULT = 0.0;

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
	 * The default value of the '{@link #getNutPositionMin() <em>Nut Position Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNutPositionMin()
	 * @generated
	 * @ordered
	 */
	protected static final double NUT_POSITION_MIN_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getNutPositionMin() <em>Nut Position Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNutPositionMin()
	 * @generated
	 * @ordered
	 */
	protected double nutPositionMin = NUT_POSITION_MIN_EDEFAULT;

	/**
	 * The default value of the '{@link #getNutPositionMax() <em>Nut Position Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNutPositionMax()
	 * @generated
	 * @ordered
	 */
	protected static final double NUT_POSITION_MAX_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getNutPositionMax() <em>Nut Position Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getNutPositionMax()
	 * @generated
	 * @ordered
	 */
	protected double nutPositionMax = NUT_POSITION_MAX_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected TwoMassDriveImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.TWO_MASS_DRIVE;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getScrewRootDiameter() {
		return screwRootDiameter;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setScrewRootDiameter(double newScrewRootDiameter) {
		double oldScrewRootDiameter = screwRootDiameter;
		screwRootDiameter = newScrewRootDiameter;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER, oldScrewRootDiameter, screwRootDiameter));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ScrewMounting getScrewMounting() {
		return screwMounting;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setScrewMounting(ScrewMounting newScrewMounting) {
		ScrewMounting oldScrewMounting = screwMounting;
		screwMounting = newScrewMounting == null ? SCREW_MOUNTING_EDEFAULT : newScrewMounting;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__SCREW_MOUNTING, oldScrewMounting, screwMounting));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBearingSpan() {
		return bearingSpan;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBearingSpan(double newBearingSpan) {
		double oldBearingSpan = bearingSpan;
		bearingSpan = newBearingSpan;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__BEARING_SPAN, oldBearingSpan, bearingSpan));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNutStiffness() {
		return nutStiffness;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNutStiffness(double newNutStiffness) {
		double oldNutStiffness = nutStiffness;
		nutStiffness = newNutStiffness;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__NUT_STIFFNESS, oldNutStiffness, nutStiffness));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getBearingStiffness() {
		return bearingStiffness;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setBearingStiffness(double newBearingStiffness) {
		double oldBearingStiffness = bearingStiffness;
		bearingStiffness = newBearingStiffness;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__BEARING_STIFFNESS, oldBearingStiffness, bearingStiffness));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__DAMPING_RATIO, oldDampingRatio, dampingRatio));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNutPositionMin() {
		return nutPositionMin;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNutPositionMin(double newNutPositionMin) {
		double oldNutPositionMin = nutPositionMin;
		nutPositionMin = newNutPositionMin;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MIN, oldNutPositionMin, nutPositionMin));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getNutPositionMax() {
		return nutPositionMax;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setNutPositionMax(double newNutPositionMax) {
		double oldNutPositionMax = nutPositionMax;
		nutPositionMax = newNutPositionMax;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MAX, oldNutPositionMax, nutPositionMax));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER:
				return getScrewRootDiameter();
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_MOUNTING:
				return getScrewMounting();
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_SPAN:
				return getBearingSpan();
			case TracewellPackage.TWO_MASS_DRIVE__NUT_STIFFNESS:
				return getNutStiffness();
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_STIFFNESS:
				return getBearingStiffness();
			case TracewellPackage.TWO_MASS_DRIVE__DAMPING_RATIO:
				return getDampingRatio();
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MIN:
				return getNutPositionMin();
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MAX:
				return getNutPositionMax();
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
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER:
				setScrewRootDiameter((Double)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_MOUNTING:
				setScrewMounting((ScrewMounting)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_SPAN:
				setBearingSpan((Double)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_STIFFNESS:
				setNutStiffness((Double)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_STIFFNESS:
				setBearingStiffness((Double)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__DAMPING_RATIO:
				setDampingRatio((Double)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MIN:
				setNutPositionMin((Double)newValue);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MAX:
				setNutPositionMax((Double)newValue);
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
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER:
				setScrewRootDiameter(SCREW_ROOT_DIAMETER_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_MOUNTING:
				setScrewMounting(SCREW_MOUNTING_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_SPAN:
				setBearingSpan(BEARING_SPAN_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_STIFFNESS:
				setNutStiffness(NUT_STIFFNESS_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_STIFFNESS:
				setBearingStiffness(BEARING_STIFFNESS_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__DAMPING_RATIO:
				setDampingRatio(DAMPING_RATIO_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MIN:
				setNutPositionMin(NUT_POSITION_MIN_EDEFAULT);
				return;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MAX:
				setNutPositionMax(NUT_POSITION_MAX_EDEFAULT);
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
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_ROOT_DIAMETER:
				return screwRootDiameter != SCREW_ROOT_DIAMETER_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__SCREW_MOUNTING:
				return screwMounting != SCREW_MOUNTING_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_SPAN:
				return bearingSpan != BEARING_SPAN_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_STIFFNESS:
				return nutStiffness != NUT_STIFFNESS_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__BEARING_STIFFNESS:
				return bearingStiffness != BEARING_STIFFNESS_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__DAMPING_RATIO:
				return dampingRatio != DAMPING_RATIO_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MIN:
				return nutPositionMin != NUT_POSITION_MIN_EDEFAULT;
			case TracewellPackage.TWO_MASS_DRIVE__NUT_POSITION_MAX:
				return nutPositionMax != NUT_POSITION_MAX_EDEFAULT;
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
		result.append(" (screwRootDiameter: "); //$NON-NLS-1$
		result.append(screwRootDiameter);
		result.append(", screwMounting: "); //$NON-NLS-1$
		result.append(screwMounting);
		result.append(", bearingSpan: "); //$NON-NLS-1$
		result.append(bearingSpan);
		result.append(", nutStiffness: "); //$NON-NLS-1$
		result.append(nutStiffness);
		result.append(", bearingStiffness: "); //$NON-NLS-1$
		result.append(bearingStiffness);
		result.append(", dampingRatio: "); //$NON-NLS-1$
		result.append(dampingRatio);
		result.append(", nutPositionMin: "); //$NON-NLS-1$
		result.append(nutPositionMin);
		result.append(", nutPositionMax: "); //$NON-NLS-1$
		result.append(nutPositionMax);
		result.append(')');
		return result.toString();
	}

} //TwoMassDriveImpl
