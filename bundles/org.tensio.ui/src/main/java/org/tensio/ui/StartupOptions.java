package org.tensio.ui;

import java.nio.file.Path;
import java.util.Optional;

/**
 * Start-up options of the workbench. The program argument {@code -tensio.project <path>} wins over the system
 * property {@code tensio.project}; relative paths resolve against the working directory.
 */
final class StartupOptions {

    static final String PROJECT_OPTION = "-tensio.project";
    static final String PROJECT_PROPERTY = "tensio.project";

    private StartupOptions() {
    }

    /**
     * @param args          application arguments, may be null
     * @param propertyValue value of the system property, may be null
     * @return the project file to open at start-up, if one was given
     */
    static Optional<Path> projectFile(String[] args, String propertyValue) {
        if (args != null) {
            for (int i = 0; i < args.length - 1; i++) {
                if (PROJECT_OPTION.equals(args[i]) && !args[i + 1].isBlank()) {
                    return Optional.of(Path.of(args[i + 1]).toAbsolutePath());
                }
            }
        }
        if (propertyValue != null && !propertyValue.isBlank()) {
            return Optional.of(Path.of(propertyValue).toAbsolutePath());
        }
        return Optional.empty();
    }
}
