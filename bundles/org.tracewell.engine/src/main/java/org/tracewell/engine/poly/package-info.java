/** Real polynomials in s: arithmetic, Horner evaluation on complex numbers, roots. */
package org.tracewell.engine.poly;
