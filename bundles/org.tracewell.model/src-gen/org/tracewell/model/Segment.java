/**
 */
package org.tracewell.model;


/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Segment</b></em>'.
 * <!-- end-user-doc -->
 *
 *
 * @see org.tracewell.model.TracewellPackage#getSegment()
 * @model abstract="true"
 * @generated
 */
public interface Segment extends Identified {
} // Segment
