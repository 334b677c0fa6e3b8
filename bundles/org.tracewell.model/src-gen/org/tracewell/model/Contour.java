/**
 */
package org.tracewell.model;

import org.eclipse.emf.common.util.EList;

/**
 * <!-- begin-user-doc -->
 * A representation of the model object '<em><b>Contour</b></em>'.
 * <!-- end-user-doc -->
 *
 * <!-- begin-model-doc -->
 * A test path in the plane of two axes.
 * <!-- end-model-doc -->
 *
 * <p>
 * The following features are supported:
 * </p>
 * <ul>
 *   <li>{@link org.tracewell.model.Contour#getFeed <em>Feed</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getPathAcceleration <em>Path Acceleration</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getPathJerk <em>Path Jerk</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getSamplePeriod <em>Sample Period</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getStartX <em>Start X</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getStartY <em>Start Y</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getAxisAssignment <em>Axis Assignment</em>}</li>
 *   <li>{@link org.tracewell.model.Contour#getSegments <em>Segments</em>}</li>
 * </ul>
 *
 * @see org.tracewell.model.TracewellPackage#getContour()
 * @model
 * @generated
 */
public interface Contour extends Named {
	/**
	 * Returns the value of the '<em><b>Feed</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Programmed path feed.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Feed</em>' attribute.
	 * @see #setFeed(double)
	 * @see org.tracewell.model.TracewellPackage#getContour_Feed()
	 * @model annotation="http://tracewell.org/units unit='m/s' displayUnit='m/min'"
	 * @generated
	 */
	double getFeed();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Contour#getFeed <em>Feed</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Feed</em>' attribute.
	 * @see #getFeed()
	 * @generated
	 */
	void setFeed(double value);

	/**
	 * Returns the value of the '<em><b>Path Acceleration</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Path Acceleration</em>' attribute.
	 * @see #setPathAcceleration(double)
	 * @see org.tracewell.model.TracewellPackage#getContour_PathAcceleration()
	 * @model annotation="http://tracewell.org/units unit='m/s\262' displayUnit='m/s\262'"
	 * @generated
	 */
	double getPathAcceleration();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Contour#getPathAcceleration <em>Path Acceleration</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Path Acceleration</em>' attribute.
	 * @see #getPathAcceleration()
	 * @generated
	 */
	void setPathAcceleration(double value);

	/**
	 * Returns the value of the '<em><b>Path Jerk</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Path Jerk</em>' attribute.
	 * @see #setPathJerk(double)
	 * @see org.tracewell.model.TracewellPackage#getContour_PathJerk()
	 * @model annotation="http://tracewell.org/units unit='m/s\263' displayUnit='m/s\263'"
	 * @generated
	 */
	double getPathJerk();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Contour#getPathJerk <em>Path Jerk</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Path Jerk</em>' attribute.
	 * @see #getPathJerk()
	 * @generated
	 */
	void setPathJerk(double value);

	/**
	 * Returns the value of the '<em><b>Sample Period</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * Period at which the reference path is sampled for simulation.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Sample Period</em>' attribute.
	 * @see #setSamplePeriod(double)
	 * @see org.tracewell.model.TracewellPackage#getContour_SamplePeriod()
	 * @model annotation="http://tracewell.org/units unit='s' displayUnit='ms'"
	 * @generated
	 */
	double getSamplePeriod();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Contour#getSamplePeriod <em>Sample Period</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Sample Period</em>' attribute.
	 * @see #getSamplePeriod()
	 * @generated
	 */
	void setSamplePeriod(double value);

	/**
	 * Returns the value of the '<em><b>Start X</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Start X</em>' attribute.
	 * @see #setStartX(double)
	 * @see org.tracewell.model.TracewellPackage#getContour_StartX()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getStartX();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Contour#getStartX <em>Start X</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Start X</em>' attribute.
	 * @see #getStartX()
	 * @generated
	 */
	void setStartX(double value);

	/**
	 * Returns the value of the '<em><b>Start Y</b></em>' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Start Y</em>' attribute.
	 * @see #setStartY(double)
	 * @see org.tracewell.model.TracewellPackage#getContour_StartY()
	 * @model annotation="http://tracewell.org/units unit='m' displayUnit='mm'"
	 * @generated
	 */
	double getStartY();

	/**
	 * Sets the value of the '{@link org.tracewell.model.Contour#getStartY <em>Start Y</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @param value the new value of the '<em>Start Y</em>' attribute.
	 * @see #getStartY()
	 * @generated
	 */
	void setStartY(double value);

	/**
	 * Returns the value of the '<em><b>Axis Assignment</b></em>' reference list.
	 * The list contents are of type {@link org.tracewell.model.Axis}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * <!-- begin-model-doc -->
	 * The axes forming the contour plane: first = path x, second = path y.
	 * <!-- end-model-doc -->
	 * @return the value of the '<em>Axis Assignment</em>' reference list.
	 * @see org.tracewell.model.TracewellPackage#getContour_AxisAssignment()
	 * @model lower="2" upper="2"
	 * @generated
	 */
	EList<Axis> getAxisAssignment();

	/**
	 * Returns the value of the '<em><b>Segments</b></em>' containment reference list.
	 * The list contents are of type {@link org.tracewell.model.Segment}.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @return the value of the '<em>Segments</em>' containment reference list.
	 * @see org.tracewell.model.TracewellPackage#getContour_Segments()
	 * @model containment="true"
	 * @generated
	 */
	EList<Segment> getSegments();

} // Contour
