/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.ecore.EClass;

import org.tracewell.model.FilterStage;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Filter Stage</b></em>'.
 * <!-- end-user-doc -->
 *
 * @generated
 */
public abstract class FilterStageImpl extends IdentifiedImpl implements FilterStage {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected FilterStageImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.FILTER_STAGE;
	}

} //FilterStageImpl
