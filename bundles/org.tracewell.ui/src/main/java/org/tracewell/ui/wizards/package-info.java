/** Getting a machine to work on: the New Machine wizard (template or example) and the example scenario import. */
package org.tracewell.ui.wizards;
