/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Cascade Controller</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * P position loop around a PI velocity loop, with feedforward and command filters.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.CascadeController#getPositionGain <em>Position Gain</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getVelocityGain <em>Velocity Gain</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getVelocityIntegralTime <em>Velocity Integral Time</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getVelocityFeedforward <em>Velocity Feedforward</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getAccelerationFeedforward <em>Acceleration Feedforward</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getFilterStages <em>Filter Stages</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getPositionSamplePeriod <em>Position Sample Period</em>}</li>
 *   <li>{@link org.tracewell.model.CascadeController#getVelocitySamplePeriod <em>Velocity Sample Period</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getCascadeController()
 * @model
 * @generated
 */
public interface CascadeController extends Controller {
	/**
	 * Returns the value of the '<em><b>Position Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Position loop gain Kv.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Position Gain</em>' attribute.
	 * @see #setPositionGain(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_PositionGain()
	 * @model annotation="http://tracewell.org/units unit='1/s' displayUnit='(m/min)/mm' rotaryUnit='1/s' rotaryDisplayUnit='1/s'"
	 * @generated
	 */
	double getPositionGain();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getPositionGain <em>Position Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Position Gain</em>' attribute.
	 * @see #getPositionGain()
	 * @generated
	 */
	void setPositionGain(double value);

	/**
	 * Returns the value of the '<em><b>Velocity Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Proportional gain of the velocity PI controller, referred to the load.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Velocity Gain</em>' attribute.
	 * @see #setVelocityGain(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_VelocityGain()
	 * @model annotation="http://tracewell.org/units unit='N\267s/m' displayUnit='N\267s/m' rotaryUnit='N\267m\267s/rad' rotaryDisplayUnit='N\267m\267s/rad'"
	 * @generated
	 */
	double getVelocityGain();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getVelocityGain <em>Velocity Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Velocity Gain</em>' attribute.
	 * @see #getVelocityGain()
	 * @generated
	 */
	void setVelocityGain(double value);

	/**
	 * Returns the value of the '<em><b>Velocity Integral Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Integral time of the velocity PI controller.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Velocity Integral Time</em>' attribute.
	 * @see #setVelocityIntegralTime(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_VelocityIntegralTime()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getVelocityIntegralTime();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getVelocityIntegralTime <em>Velocity Integral Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Velocity Integral Time</em>' attribute.
	 * @see #getVelocityIntegralTime()
	 * @generated
	 */
	void setVelocityIntegralTime(double value);

	/**
	 * Returns the value of the '<em><b>Velocity Feedforward</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Velocity feedforward fraction, 0..1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Velocity Feedforward</em>' attribute.
	 * @see #setVelocityFeedforward(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_VelocityFeedforward()
	 * @model annotation="http://tracewell.org/units unit='1' displayUnit='%'"
	 * @generated
	 */
	double getVelocityFeedforward();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getVelocityFeedforward <em>Velocity Feedforward</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Velocity Feedforward</em>' attribute.
	 * @see #getVelocityFeedforward()
	 * @generated
	 */
	void setVelocityFeedforward(double value);

	/**
	 * Returns the value of the '<em><b>Acceleration Feedforward</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Acceleration (torque) feedforward fraction, 0..1.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Acceleration Feedforward</em>' attribute.
	 * @see #setAccelerationFeedforward(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_AccelerationFeedforward()
	 * @model annotation="http://tracewell.org/units unit='1' displayUnit='%'"
	 * @generated
	 */
	double getAccelerationFeedforward();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getAccelerationFeedforward <em>Acceleration Feedforward</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Acceleration Feedforward</em>' attribute.
	 * @see #getAccelerationFeedforward()
	 * @generated
	 */
	void setAccelerationFeedforward(double value);

	/**
	 * Returns the value of the '<em><b>Filter Stages</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.FilterStage}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Filters on the torque command, applied in order.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Filter Stages</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_FilterStages()
	 * @model containment="true"
	 * @generated
	 */
	EList<FilterStage> getFilterStages();

	/**
	 * Returns the value of the '<em><b>Position Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Position Sample Period</em>' attribute.
	 * @see #setPositionSamplePeriod(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_PositionSamplePeriod()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getPositionSamplePeriod();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getPositionSamplePeriod <em>Position Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Position Sample Period</em>' attribute.
	 * @see #getPositionSamplePeriod()
	 * @generated
	 */
	void setPositionSamplePeriod(double value);

	/**
	 * Returns the value of the '<em><b>Velocity Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Velocity Sample Period</em>' attribute.
	 * @see #setVelocitySamplePeriod(double)
	 * @see org.tracewell.model.TracewellPackage#getCascadeController_VelocitySamplePeriod()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getVelocitySamplePeriod();

	/**
	 * Sets the value of the '{@link org.tracewell.model.CascadeController#getVelocitySamplePeriod <em>Velocity Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Velocity Sample Period</em>' attribute.
	 * @see #getVelocitySamplePeriod()
	 * @generated
	 */
	void setVelocitySamplePeriod(double value);

} // CascadeController
