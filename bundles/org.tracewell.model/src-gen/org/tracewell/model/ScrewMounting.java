/**
 */
package org.tracewell.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Screw Mounting</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage#getScrewMounting()
 * @model
 * @generated
 */
public enum ScrewMounting implements Enumerator {
	/**
	 * The '<em><b>Fixed Free</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FIXED_FREE_VALUE
	 * @generated
	 * @ordered
	 */
	FIXED_FREE(0, "fixedFree", "fixedFree"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Fixed Fixed</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FIXED_FIXED_VALUE
	 * @generated
	 * @ordered
	 */
	FIXED_FIXED(1, "fixedFixed", "fixedFixed"); //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Fixed Free</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FIXED_FREE
	 * @model name="fixedFree"
	 * @generated
	 * @ordered
	 */
	public static final int FIXED_FREE_VALUE = 0;

	/**
	 * The '<em><b>Fixed Fixed</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #FIXED_FIXED
	 * @model name="fixedFixed"
	 * @generated
	 * @ordered
	 */
	public static final int FIXED_FIXED_VALUE = 1;

	/**
	 * An array of all the '<em><b>Screw Mounting</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final ScrewMounting[] VALUES_ARRAY =
		new ScrewMounting[] {
			FIXED_FREE,
			FIXED_FIXED,
		};

	/**
	 * A public read-only list of all the '<em><b>Screw Mounting</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<ScrewMounting> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Screw Mounting</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ScrewMounting get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ScrewMounting result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Screw Mounting</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ScrewMounting getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			ScrewMounting result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Screw Mounting</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static ScrewMounting get(int value) {
		switch (value) {
			case FIXED_FREE_VALUE: return FIXED_FREE;
			case FIXED_FIXED_VALUE: return FIXED_FIXED;
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
	private ScrewMounting(int value, String name, String literal) {
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
	
} //ScrewMounting
