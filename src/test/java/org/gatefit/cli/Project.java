package org.gatefit.cli;

import java.nio.file.Path;

/** Files of the project checkout, relative to the Maven basedir. */
final class Project {
    private Project() {
    }

    static Path file(String relative) {
        String base = System.getProperty("basedir", System.getProperty("user.dir"));
        return Path.of(base).resolve(relative);
    }
}
