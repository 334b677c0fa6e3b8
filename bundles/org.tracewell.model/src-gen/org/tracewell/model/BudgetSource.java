/**
 */
package org.tracewell.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Budget Source</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage#getBudgetSource()
 * @model
 * @generated
 */
public enum BudgetSource implements Enumerator {
	/**
	 * The '<em><b>Servo Lag</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SERVO_LAG_VALUE
	 * @generated
	 * @ordered
	 */
	SERVO_LAG(0, "servoLag", "servoLag"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Gain Mismatch</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #GAIN_MISMATCH_VALUE
	 * @generated
	 * @ordered
	 */
	GAIN_MISMATCH(1, "gainMismatch", "gainMismatch"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Quantisation</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #QUANTISATION_VALUE
	 * @generated
	 * @ordered
	 */
	QUANTISATION(2, "quantisation", "quantisation"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Resonance</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RESONANCE_VALUE
	 * @generated
	 * @ordered
	 */
	RESONANCE(3, "resonance", "resonance"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Friction Reversal</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FRICTION_REVERSAL_VALUE
	 * @generated
	 * @ordered
	 */
	FRICTION_REVERSAL(4, "frictionReversal", "frictionReversal"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Thermal</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #THERMAL_VALUE
	 * @generated
	 * @ordered
	 */
	THERMAL(5, "thermal", "thermal"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Geometric</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #GEOMETRIC_VALUE
	 * @generated
	 * @ordered
	 */
	GEOMETRIC(6, "geometric", "geometric"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>User Entered</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #USER_ENTERED_VALUE
	 * @generated
	 * @ordered
	 */
	USER_ENTERED(7, "userEntered", "userEntered"); //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Servo Lag</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SERVO_LAG
	 * @model name="servoLag"
	 * @generated
	 * @ordered
	 */
	public static final int SERVO_LAG_VALUE = 0;

	/**
	 * The '<em><b>Gain Mismatch</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #GAIN_MISMATCH
	 * @model name="gainMismatch"
	 * @generated
	 * @ordered
	 */
	public static final int GAIN_MISMATCH_VALUE = 1;

	/**
	 * The '<em><b>Quantisation</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #QUANTISATION
	 * @model name="quantisation"
	 * @generated
	 * @ordered
	 */
	public static final int QUANTISATION_VALUE = 2;

	/**
	 * The '<em><b>Resonance</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RESONANCE
	 * @model name="resonance"
	 * @generated
	 * @ordered
	 */
	public static final int RESONANCE_VALUE = 3;

	/**
	 * The '<em><b>Friction Reversal</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FRICTION_REVERSAL
	 * @model name="frictionReversal"
	 * @generated
	 * @ordered
	 */
	public static final int FRICTION_REVERSAL_VALUE = 4;

	/**
	 * The '<em><b>Thermal</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #THERMAL
	 * @model name="thermal"
	 * @generated
	 * @ordered
	 */
	public static final int THERMAL_VALUE = 5;

	/**
	 * The '<em><b>Geometric</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #GEOMETRIC
	 * @model name="geometric"
	 * @generated
	 * @ordered
	 */
	public static final int GEOMETRIC_VALUE = 6;

	/**
	 * The '<em><b>User Entered</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #USER_ENTERED
	 * @model name="userEntered"
	 * @generated
	 * @ordered
	 */
	public static final int USER_ENTERED_VALUE = 7;

	/**
	 * An array of all the '<em><b>Budget Source</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final BudgetSource[] VALUES_ARRAY =
		new BudgetSource[] {
			SERVO_LAG,
			GAIN_MISMATCH,
			QUANTISATION,
			RESONANCE,
			FRICTION_REVERSAL,
			THERMAL,
			GEOMETRIC,
			USER_ENTERED,
		};

	/**
	 * A public read-only list of all the '<em><b>Budget Source</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<BudgetSource> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Budget Source</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static BudgetSource get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			BudgetSource result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Budget Source</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static BudgetSource getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			BudgetSource result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Budget Source</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static BudgetSource get(int value) {
		switch (value) {
			case SERVO_LAG_VALUE: return SERVO_LAG;
			case GAIN_MISMATCH_VALUE: return GAIN_MISMATCH;
			case QUANTISATION_VALUE: return QUANTISATION;
			case RESONANCE_VALUE: return RESONANCE;
			case FRICTION_REVERSAL_VALUE: return FRICTION_REVERSAL;
			case THERMAL_VALUE: return THERMAL;
			case GEOMETRIC_VALUE: return GEOMETRIC;
			case USER_ENTERED_VALUE: return USER_ENTERED;
		}
		return null;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final int value;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String name;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private final String literal;

	/**
	 * Only this class can construct instances.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private BudgetSource(int value, String name, String literal) {
		this.value = value;
		this.name = name;
		this.literal = literal;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getValue() {
	  return value;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
	  return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getLiteral() {
	  return literal;
	}

	/**
	 * Returns the literal value of the enumerator, which is its string representation.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		return literal;
	}
	
} //BudgetSource
