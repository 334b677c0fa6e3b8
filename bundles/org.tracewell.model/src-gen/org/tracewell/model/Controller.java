/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Controller</b></em>'.
 * <!-- end-user-doc -->
 *
 *
 * @see org.tracewell.model.TracewellPackage#getController()
 * @model abstract="true"
 * @generated
 */
public interface Controller extends Identified {
} // Controller
