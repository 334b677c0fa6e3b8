/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Axis</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * One servo axis: plant, controller, encoder and motion limits. Linear axes use metres, rotary axes radians.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Axis#getKind <em>Kind</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getPlant <em>Plant</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getController <em>Controller</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getEncoder <em>Encoder</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getMaxVelocity <em>Max Velocity</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getMaxAcceleration <em>Max Acceleration</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getMaxJerk <em>Max Jerk</em>}</li>
 *   <li>{@link org.tracewell.model.Axis#getGantryPartner <em>Gantry Partner</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getAxis()
 * @model
 * @generated
 */
public interface Axis extends Named {
	/**
	 * Returns the value of the '<em><b>Kind</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.AxisKind}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.AxisKind
	 * @see #setKind(AxisKind)
	 * @see org.tracewell.model.TracewellPackage#getAxis_Kind()
	 * @model
	 * @generated
	 */
	AxisKind getKind();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getKind <em>Kind</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Kind</em>' attribute.
	 * @see org.tracewell.model.AxisKind
	 * @see #getKind()
	 * @generated
	 */
	void setKind(AxisKind value);

	/**
	 * Returns the value of the '<em><b>Plant</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Plant</em>' containment reference.
	 * @see #setPlant(Plant)
	 * @see org.tracewell.model.TracewellPackage#getAxis_Plant()
	 * @model containment="true"
	 * @generated
	 */
	Plant getPlant();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getPlant <em>Plant</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Plant</em>' containment reference.
	 * @see #getPlant()
	 * @generated
	 */
	void setPlant(Plant value);

	/**
	 * Returns the value of the '<em><b>Controller</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Controller</em>' containment reference.
	 * @see #setController(Controller)
	 * @see org.tracewell.model.TracewellPackage#getAxis_Controller()
	 * @model containment="true"
	 * @generated
	 */
	Controller getController();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getController <em>Controller</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Controller</em>' containment reference.
	 * @see #getController()
	 * @generated
	 */
	void setController(Controller value);

	/**
	 * Returns the value of the '<em><b>Encoder</b></em>' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Encoder</em>' containment reference.
	 * @see #setEncoder(Encoder)
	 * @see org.tracewell.model.TracewellPackage#getAxis_Encoder()
	 * @model containment="true"
	 * @generated
	 */
	Encoder getEncoder();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getEncoder <em>Encoder</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Encoder</em>' containment reference.
	 * @see #getEncoder()
	 * @generated
	 */
	void setEncoder(Encoder value);

	/**
	 * Returns the value of the '<em><b>Max Velocity</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Velocity limit of the axis.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Velocity</em>' attribute.
	 * @see #setMaxVelocity(double)
	 * @see org.tracewell.model.TracewellPackage#getAxis_MaxVelocity()
	 * @model annotation="http://tracewell.org/units unit='m/s' displayUnit='m/min' rotaryUnit='rad/s' rotaryDisplayUnit='rev/min'"
	 * @generated
	 */
	double getMaxVelocity();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getMaxVelocity <em>Max Velocity</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Velocity</em>' attribute.
	 * @see #getMaxVelocity()
	 * @generated
	 */
	void setMaxVelocity(double value);

	/**
	 * Returns the value of the '<em><b>Max Acceleration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Acceleration limit of the axis.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Acceleration</em>' attribute.
	 * @see #setMaxAcceleration(double)
	 * @see org.tracewell.model.TracewellPackage#getAxis_MaxAcceleration()
	 * @model annotation="http://tracewell.org/units unit='m/s\262' displayUnit='m/s\262' rotaryUnit='rad/s\262' rotaryDisplayUnit='rad/s\262'"
	 * @generated
	 */
	double getMaxAcceleration();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getMaxAcceleration <em>Max Acceleration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Acceleration</em>' attribute.
	 * @see #getMaxAcceleration()
	 * @generated
	 */
	void setMaxAcceleration(double value);

	/**
	 * Returns the value of the '<em><b>Max Jerk</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Jerk limit of the axis.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Max Jerk</em>' attribute.
	 * @see #setMaxJerk(double)
	 * @see org.tracewell.model.TracewellPackage#getAxis_MaxJerk()
	 * @model annotation="http://tracewell.org/units unit='m/s\263' displayUnit='m/s\263' rotaryUnit='rad/s\263' rotaryDisplayUnit='rad/s\263'"
	 * @generated
	 */
	double getMaxJerk();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getMaxJerk <em>Max Jerk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Max Jerk</em>' attribute.
	 * @see #getMaxJerk()
	 * @generated
	 */
	void setMaxJerk(double value);

	/**
	 * Returns the value of the '<em><b>Gantry Partner</b></em>' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The other motor of a gantry pair; the partner must point back.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Gantry Partner</em>' reference.
	 * @see #setGantryPartner(Axis)
	 * @see org.tracewell.model.TracewellPackage#getAxis_GantryPartner()
	 * @model
	 * @generated
	 */
	Axis getGantryPartner();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Axis#getGantryPartner <em>Gantry Partner</em>}' reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Gantry Partner</em>' reference.
	 * @see #getGantryPartner()
	 * @generated
	 */
	void setGantryPartner(Axis value);

} // Axis
