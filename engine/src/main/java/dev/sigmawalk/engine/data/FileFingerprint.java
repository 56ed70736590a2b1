package dev.sigmawalk.engine.data;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Objects;

/**
 * The identity of one input file for the run manifest: where it was, its size and its SHA-256.
 *
 * @param path the file as read (absolute)
 * @param bytes its size in bytes
 * @param sha256 64 lower-case hex digits of SHA-256 over the file's bytes
 */
public record FileFingerprint(Path path, long bytes, String sha256) {
    private static final int BUFFER = 1 << 16;

    public FileFingerprint {
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(sha256, "sha256");
        if (!(bytes >= 0)) {
            throw new IllegalArgumentException("bytes (" + bytes + ") must be >= 0");
        }
        if (!sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 '" + sha256 + "' must be 64 lower-case hex digits");
        }
    }

    /** The fingerprint from a SHA-256 digest taken while {@code file} was read for parsing. */
    static FileFingerprint of(Path file, long bytes, byte[] sha256) {
        return new FileFingerprint(file.toAbsolutePath(), bytes, HexFormat.of().formatHex(sha256));
    }

    /** Reads {@code file} once and digests it. */
    public static FileFingerprint of(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            byte[] buffer = new byte[BUFFER];
            long total = 0;
            int n;
            while ((n = in.read(buffer)) > 0) {
                digest.update(buffer, 0, n);
                total += n;
            }
            return new FileFingerprint(file.toAbsolutePath(), total, HexFormat.of().formatHex(digest.digest()));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file + " to fingerprint it", e);
        } catch (NoSuchAlgorithmException e) {
            // Every Java platform must provide SHA-256 (java.security.MessageDigest Javadoc).
            throw new IllegalStateException("SHA-256 is unavailable", e);
        }
    }
}
