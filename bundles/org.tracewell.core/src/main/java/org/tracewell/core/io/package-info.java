/** Safe loading and deterministic, atomic saving of Tracewell model files (*.machine, *.axis); plain Java and EMF, no Eclipse runtime. */
package org.tracewell.core.io;
