/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Plant</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * The mechanics and motor seen by the servo loops (input force/torque, output load position).
 * <!-- end-model-doc -->
 *
 *
 * @see org.tracewell.model.TracewellPackage#getPlant()
 * @model abstract="true"
 * @generated
 */
public interface Plant extends Identified {
} // Plant
