package org.tracewell.core.mapping;

/**
 * A model element cannot be turned into engine inputs (an unsupported element, or values the engine rejects). The
 * message names the element and what would be accepted. Validate first: most causes are validation errors.
 */
public final class MappingException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String elementId;

    public MappingException(String elementId, String message) {
        super(message);
        this.elementId = elementId;
    }

    public MappingException(String elementId, String message, Throwable cause) {
        super(message, cause);
        this.elementId = elementId;
    }

    /** Id of the element that could not be mapped. */
    public String elementId() {
        return elementId;
    }
}
