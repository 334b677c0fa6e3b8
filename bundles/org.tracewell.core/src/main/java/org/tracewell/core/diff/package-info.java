/** Semantic difference of two versions of a model, matched by stable ids, values in display units. */
package org.tracewell.core.diff;
