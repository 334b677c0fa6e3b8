/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.common.notify.Notification;

import org.eclipse.emf.ecore.EClass;

import org.eclipse.emf.ecore.impl.ENotificationImpl;

import org.tracewell.model.Direction;
import org.tracewell.model.FullCircle;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Full Circle</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.impl.FullCircleImpl#getCentreX <em>Centre X</em>}</li>
 *   <li>{@link org.tracewell.model.impl.FullCircleImpl#getCentreY <em>Centre Y</em>}</li>
 *   <li>{@link org.tracewell.model.impl.FullCircleImpl#getDirection <em>Direction</em>}</li>
 * </ul>
 *
 * @generated
 */
public class FullCircleImpl extends SegmentImpl implements FullCircle {
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
	protected FullCircleImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.FULL_CIRCLE;
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.FULL_CIRCLE__CENTRE_X, oldCentreX, centreX));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.FULL_CIRCLE__CENTRE_Y, oldCentreY, centreY));
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
			eNotify(new ENotificationImpl(this, Notification.SET, TracewellPackage.FULL_CIRCLE__DIRECTION, oldDirection, direction));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case TracewellPackage.FULL_CIRCLE__CENTRE_X:
				return getCentreX();
			case TracewellPackage.FULL_CIRCLE__CENTRE_Y:
				return getCentreY();
			case TracewellPackage.FULL_CIRCLE__DIRECTION:
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
			case TracewellPackage.FULL_CIRCLE__CENTRE_X:
				setCentreX((Double)newValue);
				return;
			case TracewellPackage.FULL_CIRCLE__CENTRE_Y:
				setCentreY((Double)newValue);
				return;
			case TracewellPackage.FULL_CIRCLE__DIRECTION:
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
			case TracewellPackage.FULL_CIRCLE__CENTRE_X:
				setCentreX(CENTRE_X_EDEFAULT);
				return;
			case TracewellPackage.FULL_CIRCLE__CENTRE_Y:
				setCentreY(CENTRE_Y_EDEFAULT);
				return;
			case TracewellPackage.FULL_CIRCLE__DIRECTION:
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
			case TracewellPackage.FULL_CIRCLE__CENTRE_X:
				return centreX != CENTRE_X_EDEFAULT;
			case TracewellPackage.FULL_CIRCLE__CENTRE_Y:
				return centreY != CENTRE_Y_EDEFAULT;
			case TracewellPackage.FULL_CIRCLE__DIRECTION:
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
		result.append(" (centreX: "); //$NON-NLS-1$
		result.append(centreX);
		result.append(", centreY: "); //$NON-NLS-1$
		result.append(centreY);
		result.append(", direction: "); //$NON-NLS-1$
		result.append(direction);
		result.append(')');
		return result.toString();
	}

} //FullCircleImpl
