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
import org.tracewell.model.Contour;
import org.tracewell.model.Segment;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Contour</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getFeed <em>Feed</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getPathAcceleration <em>Path Acceleration</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getPathJerk <em>Path Jerk</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getSamplePeriod <em>Sample Period</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getStartX <em>Start X</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getStartY <em>Start Y</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getAxisAssignment <em>Axis Assignment</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ContourImpl#getSegments <em>Segments</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ContourImpl extends NamedImpl implements Contour {
	/**
	 * The default value of the '{@link #getFeed() <em>Feed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFeed()
	 * @generated
	 * @ordered
	 */
	protected static final double FEED_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getFeed() <em>Feed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFeed()
	 * @generated
	 * @ordered
	 */
	protected double feed = FEED_EDEFAULT;

	/**
	 * The default value of the '{@link #getPathAcceleration() <em>Path Acceleration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathAcceleration()
	 * @generated
	 * @ordered
	 */
	protected static final double PATH_ACCELERATION_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPathAcceleration() <em>Path Acceleration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathAcceleration()
	 * @generated
	 * @ordered
	 */
	protected double pathAcceleration = PATH_ACCELERATION_EDEFAULT;

	/**
	 * The default value of the '{@link #getPathJerk() <em>Path Jerk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathJerk()
	 * @generated
	 * @ordered
	 */
	protected static final double PATH_JERK_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getPathJerk() <em>Path Jerk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPathJerk()
	 * @generated
	 * @ordered
	 */
	protected double pathJerk = PATH_JERK_EDEFAULT;

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
	 * The default value of the '{@link #getStartX() <em>Start X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartX()
	 * @generated
	 * @ordered
	 */
	protected static final double START_X_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStartX() <em>Start X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartX()
	 * @generated
	 * @ordered
	 */
	protected double startX = START_X_EDEFAULT;

	/**
	 * The default value of the '{@link #getStartY() <em>Start Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartY()
	 * @generated
	 * @ordered
	 */
	protected static final double START_Y_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getStartY() <em>Start Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getStartY()
	 * @generated
	 * @ordered
	 */
	protected double startY = START_Y_EDEFAULT;

	/**
	 * The cached value of the '{@link #getAxisAssignment() <em>Axis Assignment</em>}' reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getAxisAssignment()
	 * @generated
	 * @ordered
	 */
	protected EList<Axis> axisAssignment;

	/**
	 * The cached value of the '{@link #getSegments() <em>Segments</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSegments()
	 * @generated
	 * @ordered
	 */
	protected EList<Segment> segments;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ContourImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.CONTOUR;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getFeed() {
		return feed;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setFeed(double newFeed) {
		double oldFeed = feed;
		feed = newFeed;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CONTOUR__FEED, oldFeed, feed));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPathAcceleration() {
		return pathAcceleration;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPathAcceleration(double newPathAcceleration) {
		double oldPathAcceleration = pathAcceleration;
		pathAcceleration = newPathAcceleration;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CONTOUR__PATH_ACCELERATION, oldPathAcceleration, pathAcceleration));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getPathJerk() {
		return pathJerk;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setPathJerk(double newPathJerk) {
		double oldPathJerk = pathJerk;
		pathJerk = newPathJerk;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CONTOUR__PATH_JERK, oldPathJerk, pathJerk));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CONTOUR__SAMPLE_PERIOD, oldSamplePeriod, samplePeriod));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStartX() {
		return startX;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStartX(double newStartX) {
		double oldStartX = startX;
		startX = newStartX;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CONTOUR__START_X, oldStartX, startX));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getStartY() {
		return startY;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setStartY(double newStartY) {
		double oldStartY = startY;
		startY = newStartY;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.CONTOUR__START_Y, oldStartY, startY));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Axis> getAxisAssignment() {
		if (axisAssignment == null) {
			axisAssignment = new EObjectResolvingEList<Axis>(Axis.class, this, TracewellPackage.CONTOUR__AXIS_ASSIGNMENT);
		}
		return axisAssignment;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Segment> getSegments() {
		if (segments == null) {
			segments = new EObjectContainmentEList<Segment>(Segment.class, this, TracewellPackage.CONTOUR__SEGMENTS);
		}
		return segments;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case TracewellPackage.CONTOUR__SEGMENTS:
				return ((InternalEList<?>)getSegments()).basicRemove(otherEnd, msgs);
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
			case TracewellPackage.CONTOUR__FEED:
				return getFeed();
			case TracewellPackage.CONTOUR__PATH_ACCELERATION:
				return getPathAcceleration();
			case TracewellPackage.CONTOUR__PATH_JERK:
				return getPathJerk();
			case TracewellPackage.CONTOUR__SAMPLE_PERIOD:
				return getSamplePeriod();
			case TracewellPackage.CONTOUR__START_X:
				return getStartX();
			case TracewellPackage.CONTOUR__START_Y:
				return getStartY();
			case TracewellPackage.CONTOUR__AXIS_ASSIGNMENT:
				return getAxisAssignment();
			case TracewellPackage.CONTOUR__SEGMENTS:
				return getSegments();
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
			case TracewellPackage.CONTOUR__FEED:
				setFeed((Double)newValue);
				return;
			case TracewellPackage.CONTOUR__PATH_ACCELERATION:
				setPathAcceleration((Double)newValue);
				return;
			case TracewellPackage.CONTOUR__PATH_JERK:
				setPathJerk((Double)newValue);
				return;
			case TracewellPackage.CONTOUR__SAMPLE_PERIOD:
				setSamplePeriod((Double)newValue);
				return;
			case TracewellPackage.CONTOUR__START_X:
				setStartX((Double)newValue);
				return;
			case TracewellPackage.CONTOUR__START_Y:
				setStartY((Double)newValue);
				return;
			case TracewellPackage.CONTOUR__AXIS_ASSIGNMENT:
				getAxisAssignment().clear();
				getAxisAssignment().addAll((Collection<? extends Axis>)newValue);
				return;
			case TracewellPackage.CONTOUR__SEGMENTS:
				getSegments().clear();
				getSegments().addAll((Collection<? extends Segment>)newValue);
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
			case TracewellPackage.CONTOUR__FEED:
				setFeed(FEED_EDEFAULT);
				return;
			case TracewellPackage.CONTOUR__PATH_ACCELERATION:
				setPathAcceleration(PATH_ACCELERATION_EDEFAULT);
				return;
			case TracewellPackage.CONTOUR__PATH_JERK:
				setPathJerk(PATH_JERK_EDEFAULT);
				return;
			case TracewellPackage.CONTOUR__SAMPLE_PERIOD:
				setSamplePeriod(SAMPLE_PERIOD_EDEFAULT);
				return;
			case TracewellPackage.CONTOUR__START_X:
				setStartX(START_X_EDEFAULT);
				return;
			case TracewellPackage.CONTOUR__START_Y:
				setStartY(START_Y_EDEFAULT);
				return;
			case TracewellPackage.CONTOUR__AXIS_ASSIGNMENT:
				getAxisAssignment().clear();
				return;
			case TracewellPackage.CONTOUR__SEGMENTS:
				getSegments().clear();
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
			case TracewellPackage.CONTOUR__FEED:
				return feed != FEED_EDEFAULT;
			case TracewellPackage.CONTOUR__PATH_ACCELERATION:
				return pathAcceleration != PATH_ACCELERATION_EDEFAULT;
			case TracewellPackage.CONTOUR__PATH_JERK:
				return pathJerk != PATH_JERK_EDEFAULT;
			case TracewellPackage.CONTOUR__SAMPLE_PERIOD:
				return samplePeriod != SAMPLE_PERIOD_EDEFAULT;
			case TracewellPackage.CONTOUR__START_X:
				return startX != START_X_EDEFAULT;
			case TracewellPackage.CONTOUR__START_Y:
				return startY != START_Y_EDEFAULT;
			case TracewellPackage.CONTOUR__AXIS_ASSIGNMENT:
				return axisAssignment != null && !axisAssignment.isEmpty();
			case TracewellPackage.CONTOUR__SEGMENTS:
				return segments != null && !segments.isEmpty();
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
		result.append(" (feed: "); //$NON-NLS-1$
		result.append(feed);
		result.append(", pathAcceleration: "); //$NON-NLS-1$
		result.append(pathAcceleration);
		result.append(", pathJerk: "); //$NON-NLS-1$
		result.append(pathJerk);
		result.append(", samplePeriod: "); //$NON-NLS-1$
		result.append(samplePeriod);
		result.append(", startX: "); //$NON-NLS-1$
		result.append(startX);
		result.append(", startY: "); //$NON-NLS-1$
		result.append(startY);
		result.append(')');
		return result.toString();
	}

} //ContourImpl
