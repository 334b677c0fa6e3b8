/**
 * Measured data from the prototype: strict CSV imports (frequency responses, circular tests, ISO 230-2 positioning
 * runs) that either succeed completely or fail with file, line, column, the bad text and what is valid; ISO 230-4
 * figures of measured circles from the same {@code CircleTest} code as the predictions; ISO 230-2 positioning
 * figures; a Levenberg–Marquardt fit of a rigid or two-mass plant to a measured response, offered as an update of
 * an axis's plant; and measured results as error-budget lines with the file and date as evidence. SI inside.
 */
package org.tracewell.engine.measured;
