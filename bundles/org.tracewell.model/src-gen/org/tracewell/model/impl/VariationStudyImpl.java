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

import org.eclipse.emf.ecore.util.EDataTypeUniqueEList;
import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

import org.tracewell.model.StudyKind;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.VariationStudy;
import org.tracewell.model.VariedParameter;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Variation Study</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.VariationStudyImpl#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariationStudyImpl#getVariantCount <em>Variant Count</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariationStudyImpl#getSeed <em>Seed</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariationStudyImpl#getWorstVariantCount <em>Worst Variant Count</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariationStudyImpl#getMetrics <em>Metrics</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariationStudyImpl#getParameters <em>Parameters</em>}</li>
 * </ul>
 *
 * @generated
 */
public class VariationStudyImpl extends NamedImpl implements VariationStudy {
	/**
	 * The default value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected static final StudyKind KIND_EDEFAULT = StudyKind.MONTE_CARLO;

	/**
	 * The cached value of the '{@link #getKind() <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getKind()
	 * @generated
	 * @ordered
	 */
	protected StudyKind kind = KIND_EDEFAULT;

	/**
	 * The default value of the '{@link #getVariantCount() <em>Variant Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariantCount()
	 * @generated
	 * @ordered
	 */
	protected static final int VARIANT_COUNT_EDEFAULT = 1000;

	/**
	 * The cached value of the '{@link #getVariantCount() <em>Variant Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getVariantCount()
	 * @generated
	 * @ordered
	 */
	protected int variantCount = VARIANT_COUNT_EDEFAULT;

	/**
	 * The default value of the '{@link #getSeed() <em>Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSeed()
	 * @generated
	 * @ordered
	 */
	protected static final long SEED_EDEFAULT = 1L;

	/**
	 * The cached value of the '{@link #getSeed() <em>Seed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSeed()
	 * @generated
	 * @ordered
	 */
	protected long seed = SEED_EDEFAULT;

	/**
	 * The default value of the '{@link #getWorstVariantCount() <em>Worst Variant Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWorstVariantCount()
	 * @generated
	 * @ordered
	 */
	protected static final int WORST_VARIANT_COUNT_EDEFAULT = 5;

	/**
	 * The cached value of the '{@link #getWorstVariantCount() <em>Worst Variant Count</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getWorstVariantCount()
	 * @generated
	 * @ordered
	 */
	protected int worstVariantCount = WORST_VARIANT_COUNT_EDEFAULT;

	/**
	 * The cached value of the '{@link #getMetrics() <em>Metrics</em>}' attribute list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMetrics()
	 * @generated
	 * @ordered
	 */
	protected EList<String> metrics;

	/**
	 * The cached value of the '{@link #getParameters() <em>Parameters</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getParameters()
	 * @generated
	 * @ordered
	 */
	protected EList<VariedParameter> parameters;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected VariationStudyImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.VARIATION_STUDY;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public StudyKind getKind() {
		return kind;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setKind(StudyKind newKind) {
		StudyKind oldKind = kind;
		kind = newKind == null ? KIND_EDEFAULT : newKind;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIATION_STUDY__KIND, oldKind, kind));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getVariantCount() {
		return variantCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setVariantCount(int newVariantCount) {
		int oldVariantCount = variantCount;
		variantCount = newVariantCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIATION_STUDY__VARIANT_COUNT, oldVariantCount, variantCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public long getSeed() {
		return seed;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSeed(long newSeed) {
		long oldSeed = seed;
		seed = newSeed;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIATION_STUDY__SEED, oldSeed, seed));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getWorstVariantCount() {
		return worstVariantCount;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setWorstVariantCount(int newWorstVariantCount) {
		int oldWorstVariantCount = worstVariantCount;
		worstVariantCount = newWorstVariantCount;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIATION_STUDY__WORST_VARIANT_COUNT, oldWorstVariantCount, worstVariantCount));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<String> getMetrics() {
		if (metrics == null) {
			metrics = new EDataTypeUniqueEList<String>(String.class, this, TracewellPackage.VARIATION_STUDY__METRICS);
		}
		return metrics;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<VariedParameter> getParameters() {
		if (parameters == null) {
			parameters = new EObjectContainmentEList<VariedParameter>(VariedParameter.class, this, TracewellPackage.VARIATION_STUDY__PARAMETERS);
		}
		return parameters;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TracewellPackage.VARIATION_STUDY__PARAMETERS:
				return ((InternalEList<?>)getParameters()).basicRemove(otherEnd, msgs);
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
			case TracewellPackage.VARIATION_STUDY__KIND:
				return getKind();
			case TracewellPackage.VARIATION_STUDY__VARIANT_COUNT:
				return getVariantCount();
			case TracewellPackage.VARIATION_STUDY__SEED:
				return getSeed();
			case TracewellPackage.VARIATION_STUDY__WORST_VARIANT_COUNT:
				return getWorstVariantCount();
			case TracewellPackage.VARIATION_STUDY__METRICS:
				return getMetrics();
			case TracewellPackage.VARIATION_STUDY__PARAMETERS:
				return getParameters();
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
			case TracewellPackage.VARIATION_STUDY__KIND:
				setKind((StudyKind)newValue);
				return;
			case TracewellPackage.VARIATION_STUDY__VARIANT_COUNT:
				setVariantCount((Integer)newValue);
				return;
			case TracewellPackage.VARIATION_STUDY__SEED:
				setSeed((Long)newValue);
				return;
			case TracewellPackage.VARIATION_STUDY__WORST_VARIANT_COUNT:
				setWorstVariantCount((Integer)newValue);
				return;
			case TracewellPackage.VARIATION_STUDY__METRICS:
				getMetrics().clear();
				getMetrics().addAll((Collection<? extends String>)newValue);
				return;
			case TracewellPackage.VARIATION_STUDY__PARAMETERS:
				getParameters().clear();
				getParameters().addAll((Collection<? extends VariedParameter>)newValue);
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
			case TracewellPackage.VARIATION_STUDY__KIND:
				setKind(KIND_EDEFAULT);
				return;
			case TracewellPackage.VARIATION_STUDY__VARIANT_COUNT:
				setVariantCount(VARIANT_COUNT_EDEFAULT);
				return;
			case TracewellPackage.VARIATION_STUDY__SEED:
				setSeed(SEED_EDEFAULT);
				return;
			case TracewellPackage.VARIATION_STUDY__WORST_VARIANT_COUNT:
				setWorstVariantCount(WORST_VARIANT_COUNT_EDEFAULT);
				return;
			case TracewellPackage.VARIATION_STUDY__METRICS:
				getMetrics().clear();
				return;
			case TracewellPackage.VARIATION_STUDY__PARAMETERS:
				getParameters().clear();
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
			case TracewellPackage.VARIATION_STUDY__KIND:
				return kind != KIND_EDEFAULT;
			case TracewellPackage.VARIATION_STUDY__VARIANT_COUNT:
				return variantCount != VARIANT_COUNT_EDEFAULT;
			case TracewellPackage.VARIATION_STUDY__SEED:
				return seed != SEED_EDEFAULT;
			case TracewellPackage.VARIATION_STUDY__WORST_VARIANT_COUNT:
				return worstVariantCount != WORST_VARIANT_COUNT_EDEFAULT;
			case TracewellPackage.VARIATION_STUDY__METRICS:
				return metrics != null && !metrics.isEmpty();
			case TracewellPackage.VARIATION_STUDY__PARAMETERS:
				return parameters != null && !parameters.isEmpty();
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
		result.append(", variantCount: "); //$NON-NLS-1$
		result.append(variantCount);
		result.append(", seed: "); //$NON-NLS-1$
		result.append(seed);
		result.append(", worstVariantCount: "); //$NON-NLS-1$
		result.append(worstVariantCount);
		result.append(", metrics: "); //$NON-NLS-1$
		result.append(metrics);
		result.append(')');
		return result.toString();
	}

} //VariationStudyImpl
