/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Filter Stage</b></em>'.
 * <!-- end-user-doc -->
 *
 *
 * @see org.tracewell.model.TracewellPackage#getFilterStage()
 * @model abstract="true"
 * @generated
 */
public interface FilterStage extends Identified {
} // FilterStage
