package dev.sigmawalk.sample;

import java.nio.file.Path;

/** The sample-universe module folder, where the committed demo files live. */
final class ModuleFolder {
    private ModuleFolder() {
    }

    /** Surefire sets {@code basedir} to the module folder and runs there by default. */
    static Path path() {
        return Path.of(System.getProperty("basedir", ".")).toAbsolutePath().normalize();
    }

    static Path file(String name) {
        return path().resolve(name);
    }
}
