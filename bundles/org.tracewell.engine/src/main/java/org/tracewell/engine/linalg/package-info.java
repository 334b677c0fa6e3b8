/**
 * General dense linear algebra that Commons Math lacks: the matrix exponential (Higham 2005)
 * and zero-order-hold discretisation (Van Loan 1978). Inputs and outputs are Commons Math
 * {@code RealMatrix}.
 */
package org.tracewell.engine.linalg;
