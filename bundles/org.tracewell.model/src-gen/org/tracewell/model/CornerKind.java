/**
 */
package org.tracewell.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Corner Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage#getCornerKind()
 * @model
 * @generated
 */
public enum CornerKind implements Enumerator {
	/**
	 * The '<em><b>Sharp</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SHARP_VALUE
	 * @generated
	 * @ordered
	 */
	SHARP(0, "sharp", "sharp"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Exact Stop</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #EXACT_STOP_VALUE
	 * @generated
	 * @ordered
	 */
	EXACT_STOP(1, "exactStop", "exactStop"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Rounded</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ROUNDED_VALUE
	 * @generated
	 * @ordered
	 */
	ROUNDED(2, "rounded", "rounded"); //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Sharp</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SHARP
	 * @model name="sharp"
	 * @generated
	 * @ordered
	 */
	public static final int SHARP_VALUE = 0;

	/**
	 * The '<em><b>Exact Stop</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #EXACT_STOP
	 * @model name="exactStop"
	 * @generated
	 * @ordered
	 */
	public static final int EXACT_STOP_VALUE = 1;

	/**
	 * The '<em><b>Rounded</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #ROUNDED
	 * @model name="rounded"
	 * @generated
	 * @ordered
	 */
	public static final int ROUNDED_VALUE = 2;

	/**
	 * An array of all the '<em><b>Corner Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final CornerKind[] VALUES_ARRAY =
		new CornerKind[] {
			SHARP,
			EXACT_STOP,
			ROUNDED,
		};

	/**
	 * A public read-only list of all the '<em><b>Corner Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<CornerKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Corner Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static CornerKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			CornerKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Corner Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static CornerKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			CornerKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Corner Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static CornerKind get(int value) {
		switch (value) {
			case SHARP_VALUE: return SHARP;
			case EXACT_STOP_VALUE: return EXACT_STOP;
			case ROUNDED_VALUE: return ROUNDED;
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
	private CornerKind(int value, String name, String literal) {
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
	
} //CornerKind
