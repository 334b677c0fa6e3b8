/** The units table: SI as stored, trade units at the edges, read from the metamodel's unit annotations. */
package org.tracewell.model.units;
