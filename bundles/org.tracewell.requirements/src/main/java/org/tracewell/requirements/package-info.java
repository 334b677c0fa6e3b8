/**
 * Requirement evaluation and trace: every model requirement against the machine analysis (value, limit, margin,
 * status), parent ↔ children ↔ the computed result that verifies it, coverage findings, top-down apportionment of
 * machine targets, inverse-design limits as derived axis requirement suggestions, and the compliance matrix.
 */
package org.tracewell.requirements;
