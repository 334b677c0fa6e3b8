/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Pid Controller</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * PID from position error to force/torque command.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.PidController#getProportionalGain <em>Proportional Gain</em>}</li>
 *   <li>{@link org.tracewell.model.PidController#getIntegralGain <em>Integral Gain</em>}</li>
 *   <li>{@link org.tracewell.model.PidController#getDerivativeGain <em>Derivative Gain</em>}</li>
 *   <li>{@link org.tracewell.model.PidController#getDerivativeFilterTime <em>Derivative Filter Time</em>}</li>
 *   <li>{@link org.tracewell.model.PidController#getSamplePeriod <em>Sample Period</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getPidController()
 * @model
 * @generated
 */
public interface PidController extends Controller {
	/**
	 * Returns the value of the '<em><b>Proportional Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Proportional Gain</em>' attribute.
	 * @see #setProportionalGain(double)
	 * @see org.tracewell.model.TracewellPackage#getPidController_ProportionalGain()
	 * @model annotation="http://tracewell.org/units unit='N/m' displayUnit='N/\265m' rotaryUnit='N\267m/rad' rotaryDisplayUnit='N\267m/rad'"
	 * @generated
	 */
	double getProportionalGain();

	/**
	 * Sets the value of the '{@link org.tracewell.model.PidController#getProportionalGain <em>Proportional Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Proportional Gain</em>' attribute.
	 * @see #getProportionalGain()
	 * @generated
	 */
	void setProportionalGain(double value);

	/**
	 * Returns the value of the '<em><b>Integral Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Integral Gain</em>' attribute.
	 * @see #setIntegralGain(double)
	 * @see org.tracewell.model.TracewellPackage#getPidController_IntegralGain()
	 * @model annotation="http://tracewell.org/units unit='N/(m\267s)' displayUnit='N/(m\267s)' rotaryUnit='N\267m/(rad\267s)' rotaryDisplayUnit='N\267m/(rad\267s)'"
	 * @generated
	 */
	double getIntegralGain();

	/**
	 * Sets the value of the '{@link org.tracewell.model.PidController#getIntegralGain <em>Integral Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Integral Gain</em>' attribute.
	 * @see #getIntegralGain()
	 * @generated
	 */
	void setIntegralGain(double value);

	/**
	 * Returns the value of the '<em><b>Derivative Gain</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Derivative Gain</em>' attribute.
	 * @see #setDerivativeGain(double)
	 * @see org.tracewell.model.TracewellPackage#getPidController_DerivativeGain()
	 * @model annotation="http://tracewell.org/units unit='N\267s/m' displayUnit='N\267s/m' rotaryUnit='N\267m\267s/rad' rotaryDisplayUnit='N\267m\267s/rad'"
	 * @generated
	 */
	double getDerivativeGain();

	/**
	 * Sets the value of the '{@link org.tracewell.model.PidController#getDerivativeGain <em>Derivative Gain</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Derivative Gain</em>' attribute.
	 * @see #getDerivativeGain()
	 * @generated
	 */
	void setDerivativeGain(double value);

	/**
	 * Returns the value of the '<em><b>Derivative Filter Time</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Derivative Filter Time</em>' attribute.
	 * @see #setDerivativeFilterTime(double)
	 * @see org.tracewell.model.TracewellPackage#getPidController_DerivativeFilterTime()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getDerivativeFilterTime();

	/**
	 * Sets the value of the '{@link org.tracewell.model.PidController#getDerivativeFilterTime <em>Derivative Filter Time</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Derivative Filter Time</em>' attribute.
	 * @see #getDerivativeFilterTime()
	 * @generated
	 */
	void setDerivativeFilterTime(double value);

	/**
	 * Returns the value of the '<em><b>Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Sample Period</em>' attribute.
	 * @see #setSamplePeriod(double)
	 * @see org.tracewell.model.TracewellPackage#getPidController_SamplePeriod()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getSamplePeriod();

	/**
	 * Sets the value of the '{@link org.tracewell.model.PidController#getSamplePeriod <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sample Period</em>' attribute.
	 * @see #getSamplePeriod()
	 * @generated
	 */
	void setSamplePeriod(double value);

} // PidController
