/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.ecore.EClass;

import org.tracewell.model.Controller;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Controller</b></em>'.
 * <!-- end-user-doc -->
 *
 * @generated
 */
public abstract class ControllerImpl extends IdentifiedImpl implements Controller {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ControllerImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.CONTROLLER;
	}

} //ControllerImpl
