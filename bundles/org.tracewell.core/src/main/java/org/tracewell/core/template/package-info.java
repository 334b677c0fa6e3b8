/** Starting points for new models: a complete, analysable machine built through the model API. */
package org.tracewell.core.template;
