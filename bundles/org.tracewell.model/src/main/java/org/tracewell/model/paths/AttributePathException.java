package org.tracewell.model.paths;

/**
 * A path does not lead to a numeric attribute. The message names the path, the segment that failed, the element
 * it was looked for in and what would be valid there.
 */
public final class AttributePathException extends IllegalArgumentException {

    private static final long serialVersionUID = 1L;

    private final String path;

    public AttributePathException(String path, String problem) {
        super("path '" + path + "': " + problem);
        this.path = path;
    }

    /** The path as given. */
    public String path() {
        return path;
    }
}
