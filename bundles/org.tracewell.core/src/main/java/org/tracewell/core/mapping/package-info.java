/** The one place that knows both the model and the engine: a Machine turned into engine inputs. */
package org.tracewell.core.mapping;
