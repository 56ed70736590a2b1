package dev.sigmawalk.reports.html;

import java.util.Objects;

/**
 * One input file of a run and its fingerprint.
 *
 * @param name the file's name or path as the user gave it (shown as text)
 * @param sha256 the SHA-256 of its bytes, 64 lower-case hexadecimal digits
 */
public record InputFile(String name, String sha256) {
    public InputFile {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(sha256, "sha256");
        if (!sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 of '" + name + "' (" + sha256
                    + ") must be 64 lower-case hexadecimal digits");
        }
    }
}
