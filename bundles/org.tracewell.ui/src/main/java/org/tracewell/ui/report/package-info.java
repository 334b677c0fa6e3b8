/** Analysis → Write Design Review Report: the report of the machine in the editor, written by a job. */
package org.tracewell.ui.report;
