/**
 * Addresses of single numeric attributes inside a machine ({@code axis[X1].plant.loadMass}), resolved by EMF
 * reflection so any numeric attribute of the metamodel can be varied by a study without code per attribute.
 */
package org.tracewell.model.paths;
