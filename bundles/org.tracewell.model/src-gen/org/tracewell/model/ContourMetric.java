/**
 */
package org.tracewell.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Contour Metric</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * <!-- begin-model-doc -->
 * Max normal deviation; circular deviation G and radial deviation F (ISO 230-4).
 * <!-- end-model-doc -->
 * @see org.tracewell.model.TracewellPackage#getContourMetric()
 * @model
 * @generated
 */
public enum ContourMetric implements Enumerator {
	/**
	 * The '<em><b>Max Normal Deviation</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #MAX_NORMAL_DEVIATION_VALUE
	 * @generated
	 * @ordered
	 */
	MAX_NORMAL_DEVIATION(0, "maxNormalDeviation", "maxNormalDeviation"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Circular Deviation</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #CIRCULAR_DEVIATION_VALUE
	 * @generated
	 * @ordered
	 */
	CIRCULAR_DEVIATION(1, "circularDeviation", "circularDeviation"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Radial Deviation</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RADIAL_DEVIATION_VALUE
	 * @generated
	 * @ordered
	 */
	RADIAL_DEVIATION(2, "radialDeviation", "radialDeviation"); //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Max Normal Deviation</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #MAX_NORMAL_DEVIATION
	 * @model name="maxNormalDeviation"
	 * @generated
	 * @ordered
	 */
	public static final int MAX_NORMAL_DEVIATION_VALUE = 0;

	/**
	 * The '<em><b>Circular Deviation</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #CIRCULAR_DEVIATION
	 * @model name="circularDeviation"
	 * @generated
	 * @ordered
	 */
	public static final int CIRCULAR_DEVIATION_VALUE = 1;

	/**
	 * The '<em><b>Radial Deviation</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #RADIAL_DEVIATION
	 * @model name="radialDeviation"
	 * @generated
	 * @ordered
	 */
	public static final int RADIAL_DEVIATION_VALUE = 2;

	/**
	 * An array of all the '<em><b>Contour Metric</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ContourMetric[] VALUES_ARRAY =
		new ContourMetric[] {
			MAX_NORMAL_DEVIATION,
			CIRCULAR_DEVIATION,
			RADIAL_DEVIATION,
		};

	/**
	 * A public read-only list of all the '<em><b>Contour Metric</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ContourMetric> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Contour Metric</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ContourMetric get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ContourMetric result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Contour Metric</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ContourMetric getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ContourMetric result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Contour Metric</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ContourMetric get(int value) {
		switch (value) {
			case MAX_NORMAL_DEVIATION_VALUE: return MAX_NORMAL_DEVIATION;
			case CIRCULAR_DEVIATION_VALUE: return CIRCULAR_DEVIATION;
			case RADIAL_DEVIATION_VALUE: return RADIAL_DEVIATION;
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
	private ContourMetric(int value, String name, String literal) {
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
	
} //ContourMetric
