package org.tensio.engine.io;

/**
 * A project file that cannot be read: malformed JSON, a wrong type, a missing or unknown key, a bad value,
 * or geometry that fails validation. The message is one line that names the JSON path and the value.
 *
 * @since 0.1
 */
public class ProjectFormatException extends Exception {

    private static final long serialVersionUID = 1L;

    private final String path;

    /**
     * @param path    JSON path of the offending value, e.g. {@code $.sections.shaft.profile.radius}
     * @param message what is wrong, naming the value
     */
    public ProjectFormatException(String path, String message) {
        super(path + ": " + message);
        this.path = path;
    }

    /** @return the JSON path of the offending value */
    public String path() {
        return path;
    }
}
