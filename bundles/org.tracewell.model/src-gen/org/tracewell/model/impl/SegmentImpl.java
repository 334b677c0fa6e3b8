/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.ecore.EClass;

import org.tracewell.model.Segment;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Segment</b></em>'.
 * <!-- end-user-doc -->
 *
 * @generated
 */
public abstract class SegmentImpl extends IdentifiedImpl implements Segment {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected SegmentImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.SEGMENT;
	}

} //SegmentImpl
