package dev.sigmawalk.reports.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sigmawalk.engine.data.FileFingerprint;
import dev.sigmawalk.reports.files.OutputFolder;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * Decides whether a grid point's folder already holds the complete outputs of the same study on
 * the same inputs, so that a re-run of the sweep can keep it: the folder was published by
 * sigmawalk (its marker lists the files written, and every one is there), its {@code point.yaml}
 * is the same text, its manifest was written by this version, and every input file the manifest
 * fingerprints still has that size and SHA-256.
 */
final class PointReuse {
    private static final String MANIFEST = "manifest.json";

    private final String version;

    /** @param version this tool's version; outputs of another version are run again */
    PointReuse(String version) {
        this.version = version;
    }

    boolean reusable(GridPoint point) {
        Path dir = point.folder();
        try {
            Path marker = dir.resolve(OutputFolder.MARKER);
            if (!Files.isRegularFile(marker) || !Files.isRegularFile(point.studyFile())
                    || !Files.readString(point.studyFile(), StandardCharsets.UTF_8).equals(point.yaml())) {
                return false;
            }
            List<String> written = Files.readAllLines(marker, StandardCharsets.UTF_8);
            if (!written.contains(MANIFEST) || !written.stream().allMatch(f -> f.isBlank() || Files.isRegularFile(dir.resolve(f)))) {
                return false;
            }
            return sameInputs(new ObjectMapper().readTree(dir.resolve(MANIFEST).toFile()));
        } catch (IOException | RuntimeException e) {
            // An unreadable or damaged folder is simply run again.
            return false;
        }
    }

    private boolean sameInputs(JsonNode manifest) {
        if (!version.equals(manifest.path("version").asText()) || !manifest.path("inputs").isArray()
                || manifest.path("inputs").isEmpty()) {
            return false;
        }
        for (JsonNode input : manifest.path("inputs")) {
            Path file = Path.of(input.path("path").asText());
            if (!Files.isRegularFile(file)) {
                return false;
            }
            FileFingerprint now = FileFingerprint.of(file);
            if (now.bytes() != input.path("bytes").asLong(-1) || !now.sha256().equals(input.path("sha256").asText())) {
                return false;
            }
        }
        return true;
    }
}
