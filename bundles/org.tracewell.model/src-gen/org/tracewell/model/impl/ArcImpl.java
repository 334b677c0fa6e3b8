/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.Arc;
import org.tracewell.model.Direction;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Arc</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.ArcImpl#getEndX <em>End X</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ArcImpl#getEndY <em>End Y</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ArcImpl#getCentreX <em>Centre X</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ArcImpl#getCentreY <em>Centre Y</em>}</li>
 *   <li>{@link org.tracewell.model.impl.ArcImpl#getDirection <em>Direction</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ArcImpl extends SegmentImpl implements Arc {
	/**
	 * The default value of the '{@link #getEndX() <em>End X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEndX()
	 * @generated
	 * @ordered
	 */
	protected static final double END_X_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getEndX() <em>End X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEndX()
	 * @generated
	 * @ordered
	 */
	protected double endX = END_X_EDEFAULT;

	/**
	 * The default value of the '{@link #getEndY() <em>End Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEndY()
	 * @generated
	 * @ordered
	 */
	protected static final double END_Y_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getEndY() <em>End Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getEndY()
	 * @generated
	 * @ordered
	 */
	protected double endY = END_Y_EDEFAULT;

	/**
	 * The default value of the '{@link #getCentreX() <em>Centre X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCentreX()
	 * @generated
	 * @ordered
	 */
	protected static final double CENTRE_X_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCentreX() <em>Centre X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCentreX()
	 * @generated
	 * @ordered
	 */
	protected double centreX = CENTRE_X_EDEFAULT;

	/**
	 * The default value of the '{@link #getCentreY() <em>Centre Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCentreY()
	 * @generated
	 * @ordered
	 */
	protected static final double CENTRE_Y_EDEFAULT = 0.0;

	/**
	 * The cached value of the '{@link #getCentreY() <em>Centre Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCentreY()
	 * @generated
	 * @ordered
	 */
	protected double centreY = CENTRE_Y_EDEFAULT;

	/**
	 * The default value of the '{@link #getDirection() <em>Direction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDirection()
	 * @generated
	 * @ordered
	 */
	protected static final Direction DIRECTION_EDEFAULT = Direction.COUNTER_CLOCKWISE;

	/**
	 * The cached value of the '{@link #getDirection() <em>Direction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDirection()
	 * @generated
	 * @ordered
	 */
	protected Direction direction = DIRECTION_EDEFAULT;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ArcImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.ARC;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEndX() {
		return endX;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEndX(double newEndX) {
		double oldEndX = endX;
		endX = newEndX;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ARC__END_X, oldEndX, endX));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getEndY() {
		return endY;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setEndY(double newEndY) {
		double oldEndY = endY;
		endY = newEndY;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ARC__END_Y, oldEndY, endY));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCentreX() {
		return centreX;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCentreX(double newCentreX) {
		double oldCentreX = centreX;
		centreX = newCentreX;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ARC__CENTRE_X, oldCentreX, centreX));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public double getCentreY() {
		return centreY;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setCentreY(double newCentreY) {
		double oldCentreY = centreY;
		centreY = newCentreY;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ARC__CENTRE_Y, oldCentreY, centreY));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Direction getDirection() {
		return direction;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDirection(Direction newDirection) {
		Direction oldDirection = direction;
		direction = newDirection == null ? DIRECTION_EDEFAULT : newDirection;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.ARC__DIRECTION, oldDirection, direction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.ARC__END_X:
				return getEndX();
			case TracewellPackage.ARC__END_Y:
				return getEndY();
			case TracewellPackage.ARC__CENTRE_X:
				return getCentreX();
			case TracewellPackage.ARC__CENTRE_Y:
				return getCentreY();
			case TracewellPackage.ARC__DIRECTION:
				return getDirection();
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
			case TracewellPackage.ARC__END_X:
				setEndX((Double)newValue);
				return;
			case TracewellPackage.ARC__END_Y:
				setEndY((Double)newValue);
				return;
			case TracewellPackage.ARC__CENTRE_X:
				setCentreX((Double)newValue);
				return;
			case TracewellPackage.ARC__CENTRE_Y:
				setCentreY((Double)newValue);
				return;
			case TracewellPackage.ARC__DIRECTION:
				setDirection((Direction)newValue);
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
			case TracewellPackage.ARC__END_X:
				setEndX(END_X_EDEFAULT);
				return;
			case TracewellPackage.ARC__END_Y:
				setEndY(END_Y_EDEFAULT);
				return;
			case TracewellPackage.ARC__CENTRE_X:
				setCentreX(CENTRE_X_EDEFAULT);
				return;
			case TracewellPackage.ARC__CENTRE_Y:
				setCentreY(CENTRE_Y_EDEFAULT);
				return;
			case TracewellPackage.ARC__DIRECTION:
				setDirection(DIRECTION_EDEFAULT);
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
			case TracewellPackage.ARC__END_X:
				return endX != END_X_EDEFAULT;
			case TracewellPackage.ARC__END_Y:
				return endY != END_Y_EDEFAULT;
			case TracewellPackage.ARC__CENTRE_X:
				return centreX != CENTRE_X_EDEFAULT;
			case TracewellPackage.ARC__CENTRE_Y:
				return centreY != CENTRE_Y_EDEFAULT;
			case TracewellPackage.ARC__DIRECTION:
				return direction != DIRECTION_EDEFAULT;
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
		result.append(" (endX: "); //$NON-NLS-1$
		result.append(endX);
		result.append(", endY: "); //$NON-NLS-1$
		result.append(endY);
		result.append(", centreX: "); //$NON-NLS-1$
		result.append(centreX);
		result.append(", centreY: "); //$NON-NLS-1$
		result.append(centreY);
		result.append(", direction: "); //$NON-NLS-1$
		result.append(direction);
		result.append(')');
		return result.toString();
	}

} //ArcImpl
