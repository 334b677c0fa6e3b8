/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Two Mass Drive</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * Ball-screw drive with the compliant chain screw / nut / bearing between motor and load.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getScrewRootDiameter <em>Screw Root Diameter</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getScrewMounting <em>Screw Mounting</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getBearingSpan <em>Bearing Span</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getNutStiffness <em>Nut Stiffness</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getBearingStiffness <em>Bearing Stiffness</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getDampingRatio <em>Damping Ratio</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getNutPositionMin <em>Nut Position Min</em>}</li>
 *   <li>{@link org.tracewell.model.TwoMassDrive#getNutPositionMax <em>Nut Position Max</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive()
 * @model
 * @generated
 */
public interface TwoMassDrive extends RigidScrewDrive {
	/**
	 * Returns the value of the '<em><b>Screw Root Diameter</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Root diameter used for the axial stiffness E·A/L of the screw.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Screw Root Diameter</em>' attribute.
	 * @see #setScrewRootDiameter(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_ScrewRootDiameter()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getScrewRootDiameter();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getScrewRootDiameter <em>Screw Root Diameter</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Screw Root Diameter</em>' attribute.
	 * @see #getScrewRootDiameter()
	 * @generated
	 */
	void setScrewRootDiameter(double value);

	/**
	 * Returns the value of the '<em><b>Screw Mounting</b></em>' attribute.
	 * The literals are from the enumeration {@link org.tracewell.model.ScrewMounting}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Screw Mounting</em>' attribute.
	 * @see org.tracewell.model.ScrewMounting
	 * @see #setScrewMounting(ScrewMounting)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_ScrewMounting()
	 * @model
	 * @generated
	 */
	ScrewMounting getScrewMounting();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getScrewMounting <em>Screw Mounting</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Screw Mounting</em>' attribute.
	 * @see org.tracewell.model.ScrewMounting
	 * @see #getScrewMounting()
	 * @generated
	 */
	void setScrewMounting(ScrewMounting value);

	/**
	 * Returns the value of the '<em><b>Bearing Span</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Distance between the screw bearings (fixed-fixed) or from the fixed bearing to the screw end (fixed-free).
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Bearing Span</em>' attribute.
	 * @see #setBearingSpan(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_BearingSpan()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getBearingSpan();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getBearingSpan <em>Bearing Span</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bearing Span</em>' attribute.
	 * @see #getBearingSpan()
	 * @generated
	 */
	void setBearingSpan(double value);

	/**
	 * Returns the value of the '<em><b>Nut Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Nut Stiffness</em>' attribute.
	 * @see #setNutStiffness(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_NutStiffness()
	 * @model annotation="http://tracewell.org/units unit='N/m' displayUnit='N/\265m'"
	 * @generated
	 */
	double getNutStiffness();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getNutStiffness <em>Nut Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Nut Stiffness</em>' attribute.
	 * @see #getNutStiffness()
	 * @generated
	 */
	void setNutStiffness(double value);

	/**
	 * Returns the value of the '<em><b>Bearing Stiffness</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Bearing Stiffness</em>' attribute.
	 * @see #setBearingStiffness(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_BearingStiffness()
	 * @model annotation="http://tracewell.org/units unit='N/m' displayUnit='N/\265m'"
	 * @generated
	 */
	double getBearingStiffness();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getBearingStiffness <em>Bearing Stiffness</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Bearing Stiffness</em>' attribute.
	 * @see #getBearingStiffness()
	 * @generated
	 */
	void setBearingStiffness(double value);

	/**
	 * Returns the value of the '<em><b>Damping Ratio</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Modal damping ratio of the first axial mode.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Damping Ratio</em>' attribute.
	 * @see #setDampingRatio(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_DampingRatio()
	 * @model annotation="http://tracewell.org/units unit='1' displayUnit='%'"
	 * @generated
	 */
	double getDampingRatio();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getDampingRatio <em>Damping Ratio</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Damping Ratio</em>' attribute.
	 * @see #getDampingRatio()
	 * @generated
	 */
	void setDampingRatio(double value);

	/**
	 * Returns the value of the '<em><b>Nut Position Min</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Nearest nut position, measured from the fixed bearing.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Nut Position Min</em>' attribute.
	 * @see #setNutPositionMin(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_NutPositionMin()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getNutPositionMin();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getNutPositionMin <em>Nut Position Min</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Nut Position Min</em>' attribute.
	 * @see #getNutPositionMin()
	 * @generated
	 */
	void setNutPositionMin(double value);

	/**
	 * Returns the value of the '<em><b>Nut Position Max</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Farthest nut position, measured from the fixed bearing.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Nut Position Max</em>' attribute.
	 * @see #setNutPositionMax(double)
	 * @see org.tracewell.model.TracewellPackage#getTwoMassDrive_NutPositionMax()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getNutPositionMax();

	/**
	 * Sets the value of the '{@link org.tracewell.model.TwoMassDrive#getNutPositionMax <em>Nut Position Max</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Nut Position Max</em>' attribute.
	 * @see #getNutPositionMax()
	 * @generated
	 */
	void setNutPositionMax(double value);

} // TwoMassDrive
