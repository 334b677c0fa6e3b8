/**
 */
package org.tracewell.model;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import org.eclipse.emf.common.util.Enumerator;

/**
 * <!-- begin-user-doc -->
 * A representation of the literals of the enumeration '<em><b>Study Kind</b></em>',
 * and utility methods for working with them.
 * <!-- end-user-doc -->
 * @see org.tracewell.model.TracewellPackage#getStudyKind()
 * @model
 * @generated
 */
public enum StudyKind implements Enumerator {
	/**
	 * The '<em><b>Monte Carlo</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #MONTE_CARLO_VALUE
	 * @generated
	 * @ordered
	 */
	MONTE_CARLO(0, "monteCarlo", "monteCarlo"), //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Sweep</b></em>' literal object.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SWEEP_VALUE
	 * @generated
	 * @ordered
	 */
	SWEEP(1, "sweep", "sweep"); //$NON-NLS-1$ //$NON-NLS-2$

	/**
	 * The '<em><b>Monte Carlo</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #MONTE_CARLO
	 * @model name="monteCarlo"
	 * @generated
	 * @ordered
	 */
	public static final int MONTE_CARLO_VALUE = 0;

	/**
	 * The '<em><b>Sweep</b></em>' literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #SWEEP
	 * @model name="sweep"
	 * @generated
	 * @ordered
	 */
	public static final int SWEEP_VALUE = 1;

	/**
	 * An array of all the '<em><b>Study Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	private static final StudyKind[] VALUES_ARRAY =
		new StudyKind[] {
			MONTE_CARLO,
			SWEEP,
		};

	/**
	 * A public read-only list of all the '<em><b>Study Kind</b></em>' enumerators.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public static final List<StudyKind> VALUES = Collections.unmodifiableList(Arrays.asList(VALUES_ARRAY));

	/**
	 * Returns the '<em><b>Study Kind</b></em>' literal with the specified literal value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param literal the literal.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StudyKind get(String literal) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			StudyKind result = VALUES_ARRAY[i];
			if (result.toString().equals(literal)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Study Kind</b></em>' literal with the specified name.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param name the name.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StudyKind getByName(String name) {
		for (int i = 0; i < VALUES_ARRAY.length; ++i) {
			StudyKind result = VALUES_ARRAY[i];
			if (result.getName().equals(name)) {
				return result;
			}
		}
		return null;
	}

	/**
	 * Returns the '<em><b>Study Kind</b></em>' literal with the specified integer value.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the integer value.
	 * @return the matching enumerator or <code>null</code>.
	 * @generated
	 */
	public static StudyKind get(int value) {
		switch (value) {
			case MONTE_CARLO_VALUE: return MONTE_CARLO;
			case SWEEP_VALUE: return SWEEP;
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
	private StudyKind(int value, String name, String literal) {
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
	
} //StudyKind
