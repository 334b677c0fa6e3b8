/**
 */
package org.tracewell.model.impl;

import org.eclipse.emf.ecore.EClass;

import org.tracewell.model.Plant;
import org.tracewell.model.TracewellPackage;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Plant</b></em>'.
 * <!-- end-user-doc -->
 *
 * @generated
 */
public abstract class PlantImpl extends IdentifiedImpl implements Plant {
	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected PlantImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return TracewellPackage.Literals.PLANT;
	}

} //PlantImpl
