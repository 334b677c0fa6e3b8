/** Labels of model elements in trade units, used by the generated item providers. */
package org.tracewell.model.edit.units;
