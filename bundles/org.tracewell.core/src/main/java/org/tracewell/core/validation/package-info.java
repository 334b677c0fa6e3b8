/** Model rules as an EMF EValidator, for the command line and the workbench's problem markers. */
package org.tracewell.core.validation;
