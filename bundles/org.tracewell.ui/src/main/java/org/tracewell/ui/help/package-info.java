/** Help → Getting Started. */
package org.tracewell.ui.help;
