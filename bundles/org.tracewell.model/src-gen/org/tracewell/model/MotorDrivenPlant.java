/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Motor Driven Plant</b></em>'.
 * <!-- end-user-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.MotorDrivenPlant#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}</li>
 *   <li>{@link org.tracewell.model.MotorDrivenPlant#getViscousFriction <em>Viscous Friction</em>}</li>
 *   <li>{@link org.tracewell.model.MotorDrivenPlant#getCoulombFriction <em>Coulomb Friction</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getMotorDrivenPlant()
 * @model abstract="true"
 * @generated
 */
public interface MotorDrivenPlant extends Plant {
	/**
	 * Returns the value of the '<em><b>Current Loop Bandwidth</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Closed current (torque) loop bandwidth.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Current Loop Bandwidth</em>' attribute.
	 * @see #setCurrentLoopBandwidth(double)
	 * @see org.tracewell.model.TracewellPackage#getMotorDrivenPlant_CurrentLoopBandwidth()
	 * @model annotation="http://tracewell.org/units unit='Hz' displayUnit='Hz'"
	 * @generated
	 */
	double getCurrentLoopBandwidth();

	/**
	 * Sets the value of the '{@link org.tracewell.model.MotorDrivenPlant#getCurrentLoopBandwidth <em>Current Loop Bandwidth</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Current Loop Bandwidth</em>' attribute.
	 * @see #getCurrentLoopBandwidth()
	 * @generated
	 */
	void setCurrentLoopBandwidth(double value);

	/**
	 * Returns the value of the '<em><b>Viscous Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Viscous friction referred to the load.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Viscous Friction</em>' attribute.
	 * @see #setViscousFriction(double)
	 * @see org.tracewell.model.TracewellPackage#getMotorDrivenPlant_ViscousFriction()
	 * @model annotation="http://tracewell.org/units unit='N\267s/m' displayUnit='N\267s/m' rotaryUnit='N\267m\267s/rad' rotaryDisplayUnit='N\267m\267s/rad'"
	 * @generated
	 */
	double getViscousFriction();

	/**
	 * Sets the value of the '{@link org.tracewell.model.MotorDrivenPlant#getViscousFriction <em>Viscous Friction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Viscous Friction</em>' attribute.
	 * @see #getViscousFriction()
	 * @generated
	 */
	void setViscousFriction(double value);

	/**
	 * Returns the value of the '<em><b>Coulomb Friction</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Coulomb friction referred to the load.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Coulomb Friction</em>' attribute.
	 * @see #setCoulombFriction(double)
	 * @see org.tracewell.model.TracewellPackage#getMotorDrivenPlant_CoulombFriction()
	 * @model annotation="http://tracewell.org/units unit='N' displayUnit='N' rotaryUnit='N\267m' rotaryDisplayUnit='N\267m'"
	 * @generated
	 */
	double getCoulombFriction();

	/**
	 * Sets the value of the '{@link org.tracewell.model.MotorDrivenPlant#getCoulombFriction <em>Coulomb Friction</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Coulomb Friction</em>' attribute.
	 * @see #getCoulombFriction()
	 * @generated
	 */
	void setCoulombFriction(double value);

} // MotorDrivenPlant
