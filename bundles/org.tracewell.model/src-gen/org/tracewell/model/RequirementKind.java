/**
 */
package org.tracewell.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Requirement Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage#getRequirementKind()
 * @model
 * @generated
 */
public enum RequirementKind implements Enumerator {
	/**
	 * The '<em><b>Contour Deviation</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #CONTOUR_DEVIATION_VALUE
	 * @generated
	 * @ordered
	 */
	CONTOUR_DEVIATION(0, "contourDeviation", "contourDeviation"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Following Error</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FOLLOWING_ERROR_VALUE
	 * @generated
	 * @ordered
	 */
	FOLLOWING_ERROR(1, "followingError", "followingError"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Phase Margin</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #PHASE_MARGIN_VALUE
	 * @generated
	 * @ordered
	 */
	PHASE_MARGIN(2, "phaseMargin", "phaseMargin"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Gain Margin</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #GAIN_MARGIN_VALUE
	 * @generated
	 * @ordered
	 */
	GAIN_MARGIN(3, "gainMargin", "gainMargin"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Bandwidth</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BANDWIDTH_VALUE
	 * @generated
	 * @ordered
	 */
	BANDWIDTH(4, "bandwidth", "bandwidth"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Settling Time</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SETTLING_TIME_VALUE
	 * @generated
	 * @ordered
	 */
	SETTLING_TIME(5, "settlingTime", "settlingTime"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Steady State Error</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #STEADY_STATE_ERROR_VALUE
	 * @generated
	 * @ordered
	 */
	STEADY_STATE_ERROR(6, "steadyStateError", "steadyStateError"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Position Gain</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #POSITION_GAIN_VALUE
	 * @generated
	 * @ordered
	 */
	POSITION_GAIN(7, "positionGain", "positionGain"); //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Contour Deviation</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #CONTOUR_DEVIATION
	 * @model name="contourDeviation"
	 * @generated
	 * @ordered
	 */
	public static final int CONTOUR_DEVIATION_VALUE = 0;

	/**
	 * The '<em><b>Following Error</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FOLLOWING_ERROR
	 * @model name="followingError"
	 * @generated
	 * @ordered
	 */
	public static final int FOLLOWING_ERROR_VALUE = 1;

	/**
	 * The '<em><b>Phase Margin</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #PHASE_MARGIN
	 * @model name="phaseMargin"
	 * @generated
	 * @ordered
	 */
	public static final int PHASE_MARGIN_VALUE = 2;

	/**
	 * The '<em><b>Gain Margin</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #GAIN_MARGIN
	 * @model name="gainMargin"
	 * @generated
	 * @ordered
	 */
	public static final int GAIN_MARGIN_VALUE = 3;

	/**
	 * The '<em><b>Bandwidth</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #BANDWIDTH
	 * @model name="bandwidth"
	 * @generated
	 * @ordered
	 */
	public static final int BANDWIDTH_VALUE = 4;

	/**
	 * The '<em><b>Settling Time</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SETTLING_TIME
	 * @model name="settlingTime"
	 * @generated
	 * @ordered
	 */
	public static final int SETTLING_TIME_VALUE = 5;

	/**
	 * The '<em><b>Steady State Error</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #STEADY_STATE_ERROR
	 * @model name="steadyStateError"
	 * @generated
	 * @ordered
	 */
	public static final int STEADY_STATE_ERROR_VALUE = 6;

	/**
	 * The '<em><b>Position Gain</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #POSITION_GAIN
	 * @model name="positionGain"
	 * @generated
	 * @ordered
	 */
	public static final int POSITION_GAIN_VALUE = 7;

	/**
	 * An array of all the '<em><b>Requirement Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final RequirementKind[] VALUES_ARRAY =
		new RequirementKind[] {
			CONTOUR_DEVIATION,
			FOLLOWING_ERROR,
			PHASE_MARGIN,
			GAIN_MARGIN,
			BANDWIDTH,
			SETTLING_TIME,
			STEADY_STATE_ERROR,
			POSITION_GAIN,
		};

	/**
	 * A public read-only list of all the '<em><b>Requirement Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<RequirementKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Requirement Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static RequirementKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			RequirementKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Requirement Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static RequirementKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			RequirementKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Requirement Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static RequirementKind get(int value) {
		switch (value) {
			case CONTOUR_DEVIATION_VALUE: return CONTOUR_DEVIATION;
			case FOLLOWING_ERROR_VALUE: return FOLLOWING_ERROR;
			case PHASE_MARGIN_VALUE: return PHASE_MARGIN;
			case GAIN_MARGIN_VALUE: return GAIN_MARGIN;
			case BANDWIDTH_VALUE: return BANDWIDTH;
			case SETTLING_TIME_VALUE: return SETTLING_TIME;
			case STEADY_STATE_ERROR_VALUE: return STEADY_STATE_ERROR;
			case POSITION_GAIN_VALUE: return POSITION_GAIN;
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
	private RequirementKind(int value, String name, String literal) {
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
	
} //RequirementKind
