/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.ToleranceShape;
import org.tracewell.model.TracewellPackage;
import org.tracewell.model.VariedParameter;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Varied Parameter</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getPath <em>Path</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getShape <em>Shape</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getSigma <em>Sigma</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getHalfWidth <em>Half Width</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getMinimum <em>Minimum</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getMaximum <em>Maximum</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getFrom <em>From</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getTo <em>To</em>}</li>
 *   <li>{@link org.tracewell.model.impl.VariedParameterImpl#getSteps <em>Steps</em>}</li>
 * </ul>
 *
 * @generated
 */
public class VariedParameterImpl extends IdentifiedImpl implements VariedParameter {
	/**
	 * The default value of the '{@link #getPath() <em>Path</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPath()
	 * @generated
	 * @ordered
	 */
	protected static final String PATH_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getPath() <em>Path</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPath()
	 * @generated
	 * @ordered
	 */
	protected String path = PATH_EDEFAULT;

	/**
	 * The default value of the '{@link #getShape() <em>Shape</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShape()
	 * @generated
	 * @ordered
	 */
	protected static final ToleranceShape SHAPE_EDEFAULT = ToleranceShape.NORMAL;

	/**
	 * The cached value of the '{@link #getShape() <em>Shape</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getShape()
	 * @generated
	 * @ordered
	 */
	protected ToleranceShape shape = SHAPE_EDEFAULT;

	/**
	 * The default value of the '{@link #getSigma() <em>Sigma</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSigma()
	 * @generated
	 * @ordered
	 */
	protected static final double SIGMA_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getSigma() <em>Sigma</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSigma()
	 * @generated
	 * @ordered
	 */
	protected double sigma = SIGMA_EDEFAULT;

	/**
	 * The default value of the '{@link #getHalfWidth() <em>Half Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHalfWidth()
	 * @generated
	 * @ordered
	 */
	protected static final double HALF_WIDTH_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getHalfWidth() <em>Half Width</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getHalfWidth()
	 * @generated
	 * @ordered
	 */
	protected double halfWidth = HALF_WIDTH_EDEFAULT;

	/**
	 * The default value of the '{@link #getMinimum() <em>Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimum()
	 * @generated
	 * @ordered
	 */
	protected static final double MINIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMinimum() <em>Minimum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMinimum()
	 * @generated
	 * @ordered
	 */
	protected double minimum = MINIMUM_EDEFAULT;

	/**
	 * This is true if the Minimum attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean minimumESet;

	/**
	 * The default value of the '{@link #getMaximum() <em>Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximum()
	 * @generated
	 * @ordered
	 */
	protected static final double MAXIMUM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getMaximum() <em>Maximum</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getMaximum()
	 * @generated
	 * @ordered
	 */
	protected double maximum = MAXIMUM_EDEFAULT;

	/**
	 * This is true if the Maximum attribute has been set.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 * @ordered
	 */
	protected boolean maximumESet;

	/**
	 * The default value of the '{@link #getFrom() <em>From</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFrom()
	 * @generated
	 * @ordered
	 */
	protected static final double FROM_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getFrom() <em>From</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFrom()
	 * @generated
	 * @ordered
	 */
	protected double from = FROM_EDEFAULT;

	/**
	 * The default value of the '{@link #getTo() <em>To</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTo()
	 * @generated
	 * @ordered
	 */
	protected static final double TO_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getTo() <em>To</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getTo()
	 * @generated
	 * @ordered
	 */
	protected double to = TO_EDEFAULT;

	/**
	 * The default value of the '{@link #getSteps() <em>Steps</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSteps()
	 * @generated
	 * @ordered
	 */
	protected static final int STEPS_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getSteps() <em>Steps</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSteps()
	 * @generated
	 * @ordered
	 */
	protected int steps = STEPS_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected VariedParameterImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.VARIED_PARAMETER;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getPath() {
		return path;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPath(String newPath) {
		String oldPath = path;
		path = newPath;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__PATH, oldPath, path));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ToleranceShape getShape() {
		return shape;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setShape(ToleranceShape newShape) {
		ToleranceShape oldShape = shape;
		shape = newShape == null ? SHAPE_EDEFAULT : newShape;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__SHAPE, oldShape, shape));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getSigma() {
		return sigma;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSigma(double newSigma) {
		double oldSigma = sigma;
		sigma = newSigma;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__SIGMA, oldSigma, sigma));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getHalfWidth() {
		return halfWidth;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setHalfWidth(double newHalfWidth) {
		double oldHalfWidth = halfWidth;
		halfWidth = newHalfWidth;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__HALF_WIDTH, oldHalfWidth, halfWidth));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMinimum() {
		return minimum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMinimum(double newMinimum) {
		double oldMinimum = minimum;
		minimum = newMinimum;
		boolean oldMinimumESet = minimumESet;
		minimumESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__MINIMUM, oldMinimum, minimum, !oldMinimumESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMinimum() {
		double oldMinimum = minimum;
		boolean oldMinimumESet = minimumESet;
		minimum = MINIMUM_EDEFAULT;
		minimumESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TracewellPackage.VARIED_PARAMETER__MINIMUM, oldMinimum, MINIMUM_EDEFAULT, oldMinimumESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMinimum() {
		return minimumESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getMaximum() {
		return maximum;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setMaximum(double newMaximum) {
		double oldMaximum = maximum;
		maximum = newMaximum;
		boolean oldMaximumESet = maximumESet;
		maximumESet = true;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__MAXIMUM, oldMaximum, maximum, !oldMaximumESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void unsetMaximum() {
		double oldMaximum = maximum;
		boolean oldMaximumESet = maximumESet;
		maximum = MAXIMUM_EDEFAULT;
		maximumESet = false;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.UNSET, TracewellPackage.VARIED_PARAMETER__MAXIMUM, oldMaximum, MAXIMUM_EDEFAULT, oldMaximumESet));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean isSetMaximum() {
		return maximumESet;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFrom() {
		return from;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFrom(double newFrom) {
		double oldFrom = from;
		from = newFrom;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__FROM, oldFrom, from));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getTo() {
		return to;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setTo(double newTo) {
		double oldTo = to;
		to = newTo;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__TO, oldTo, to));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getSteps() {
		return steps;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSteps(int newSteps) {
		int oldSteps = steps;
		steps = newSteps;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.VARIED_PARAMETER__STEPS, oldSteps, steps));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.VARIED_PARAMETER__PATH:
				return getPath();
			case TracewellPackage.VARIED_PARAMETER__SHAPE:
				return getShape();
			case TracewellPackage.VARIED_PARAMETER__SIGMA:
				return getSigma();
			case TracewellPackage.VARIED_PARAMETER__HALF_WIDTH:
				return getHalfWidth();
			case TracewellPackage.VARIED_PARAMETER__MINIMUM:
				return getMinimum();
			case TracewellPackage.VARIED_PARAMETER__MAXIMUM:
				return getMaximum();
			case TracewellPackage.VARIED_PARAMETER__FROM:
				return getFrom();
			case TracewellPackage.VARIED_PARAMETER__TO:
				return getTo();
			case TracewellPackage.VARIED_PARAMETER__STEPS:
				return getSteps();
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
			case TracewellPackage.VARIED_PARAMETER__PATH:
				setPath((String)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__SHAPE:
				setShape((ToleranceShape)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__SIGMA:
				setSigma((Double)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__HALF_WIDTH:
				setHalfWidth((Double)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__MINIMUM:
				setMinimum((Double)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__MAXIMUM:
				setMaximum((Double)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__FROM:
				setFrom((Double)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__TO:
				setTo((Double)newValue);
				return;
			case TracewellPackage.VARIED_PARAMETER__STEPS:
				setSteps((Integer)newValue);
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
			case TracewellPackage.VARIED_PARAMETER__PATH:
				setPath(PATH_EDEFAULT);
				return;
			case TracewellPackage.VARIED_PARAMETER__SHAPE:
				setShape(SHAPE_EDEFAULT);
				return;
			case TracewellPackage.VARIED_PARAMETER__SIGMA:
				setSigma(SIGMA_EDEFAULT);
				return;
			case TracewellPackage.VARIED_PARAMETER__HALF_WIDTH:
				setHalfWidth(HALF_WIDTH_EDEFAULT);
				return;
			case TracewellPackage.VARIED_PARAMETER__MINIMUM:
				unsetMinimum();
				return;
			case TracewellPackage.VARIED_PARAMETER__MAXIMUM:
				unsetMaximum();
				return;
			case TracewellPackage.VARIED_PARAMETER__FROM:
				setFrom(FROM_EDEFAULT);
				return;
			case TracewellPackage.VARIED_PARAMETER__TO:
				setTo(TO_EDEFAULT);
				return;
			case TracewellPackage.VARIED_PARAMETER__STEPS:
				setSteps(STEPS_EDEFAULT);
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
			case TracewellPackage.VARIED_PARAMETER__PATH:
				return PATH_EDEFAULT == null ? path != null : !PATH_EDEFAULT.equals(path);
			case TracewellPackage.VARIED_PARAMETER__SHAPE:
				return shape != SHAPE_EDEFAULT;
			case TracewellPackage.VARIED_PARAMETER__SIGMA:
				return sigma != SIGMA_EDEFAULT;
			case TracewellPackage.VARIED_PARAMETER__HALF_WIDTH:
				return halfWidth != HALF_WIDTH_EDEFAULT;
			case TracewellPackage.VARIED_PARAMETER__MINIMUM:
				return isSetMinimum();
			case TracewellPackage.VARIED_PARAMETER__MAXIMUM:
				return isSetMaximum();
			case TracewellPackage.VARIED_PARAMETER__FROM:
				return from != FROM_EDEFAULT;
			case TracewellPackage.VARIED_PARAMETER__TO:
				return to != TO_EDEFAULT;
			case TracewellPackage.VARIED_PARAMETER__STEPS:
				return steps != STEPS_EDEFAULT;
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
		result.append(" (path: "); //$NON-NLS-1$
		result.append(path);
		result.append(", shape: "); //$NON-NLS-1$
		result.append(shape);
		result.append(", sigma: "); //$NON-NLS-1$
		result.append(sigma);
		result.append(", halfWidth: "); //$NON-NLS-1$
		result.append(halfWidth);
		result.append(", minimum: "); //$NON-NLS-1$
		if (minimumESet) result.append(minimum); else result.append("<unset>"); //$NON-NLS-1$
		result.append(", maximum: "); //$NON-NLS-1$
		if (maximumESet) result.append(maximum); else result.append("<unset>"); //$NON-NLS-1$
		result.append(", from: "); //$NON-NLS-1$
		result.append(from);
		result.append(", to: "); //$NON-NLS-1$
		result.append(to);
		result.append(", steps: "); //$NON-NLS-1$
		result.append(steps);
		result.append(')');
		return result.toString();
	}

} //VariedParameterImpl
