/**
 * Validation results of open machines as workspace problem markers (the Problems view), and the workspace links
 * that let files anywhere on disk carry markers.
 */
package org.tracewell.ui.problems;
