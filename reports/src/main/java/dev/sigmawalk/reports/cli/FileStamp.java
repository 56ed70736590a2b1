package dev.sigmawalk.reports.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.zip.CRC32;

/**
 * What a file looks like at one moment, enough to tell that it was saved again: whether it
 * exists, its size, its modification time and its file key (a file replaced by a rename has a
 * new one), and for a small file (a study file, an alphas file) a checksum of its bytes, since a
 * file system with coarse timestamps can keep the same time across two saves of equal size.
 *
 * @param path the file
 * @param exists whether it exists (a missing file is a state too: it may appear)
 * @param bytes its size, -1 when missing
 * @param modifiedNanos its modification time in nanoseconds since the epoch, -1 when missing
 * @param key the file system's key of the file, empty when missing or unsupported
 * @param crc CRC-32 of a file of at most {@value #CHECKSUM_BYTES} bytes, -1 otherwise
 */
record FileStamp(Path path, boolean exists, long bytes, long modifiedNanos, String key, long crc) {
    /** Files up to this size also get a checksum of their bytes. */
    static final int CHECKSUM_BYTES = 1 << 20;

    FileStamp {
        Objects.requireNonNull(path, "path");
        Objects.requireNonNull(key, "key");
    }

    /** The stamp of {@code path} now; a file that cannot be read counts as missing. */
    static FileStamp of(Path path) {
        try {
            BasicFileAttributes a = Files.readAttributes(path, BasicFileAttributes.class);
            long nanos = a.lastModifiedTime().to(java.util.concurrent.TimeUnit.NANOSECONDS);
            String key = a.fileKey() == null ? "" : a.fileKey().toString();
            long crc = a.isRegularFile() && a.size() <= CHECKSUM_BYTES ? crc(path) : -1;
            return new FileStamp(path, true, a.size(), nanos, key, crc);
        } catch (IOException e) {
            return new FileStamp(path, false, -1, -1, "", -1);
        }
    }

    /** The stamps of every path, in order. */
    static List<FileStamp> of(List<Path> paths) {
        List<FileStamp> out = new ArrayList<>(paths.size());
        for (Path p : paths) {
            out.add(of(p));
        }
        return out;
    }

    private static long crc(Path path) throws IOException {
        CRC32 crc = new CRC32();
        try (InputStream in = Files.newInputStream(path)) {
            byte[] buf = new byte[8192];
            for (int n; (n = in.read(buf)) > 0; ) {
                crc.update(buf, 0, n);
            }
        }
        return crc.getValue();
    }
}
