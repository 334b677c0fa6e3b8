/**
 * Contour error (exact shortest distance from the actual motion to the programmed path, by a monotone
 * search), circle-test metrics after ISO 230-4 (least-squares centre, circular deviation G, radial
 * deviation F, bidirectional G(b)), and the closed-form estimates used beside simulated figures.
 */
package org.tracewell.engine.contour;
