package dev.sigmawalk.engine.data;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;

/**
 * A file read in large chunks into one reused byte array, with the SHA-256 of every byte taken
 * on the way, so a data file is read from disk once for both parsing and its fingerprint. The
 * caller consumes {@code bytes()[position .. limit)} and asks for more, keeping the bytes from a
 * mark on (an unfinished record) at the front of the array.
 */
final class ByteChunks implements AutoCloseable {
    private static final int INITIAL = 1 << 20;

    private final Path file;
    private final FileChannel channel;
    private final MessageDigest digest;
    private byte[] buf = new byte[INITIAL];
    private int limit;
    private long total;
    private boolean eof;

    ByteChunks(Path file, String what) {
        this.file = file;
        this.channel = InputFile.open(file, what);
        try {
            this.digest = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            // Every Java platform must provide SHA-256 (java.security.MessageDigest Javadoc).
            throw new IllegalStateException("SHA-256 is unavailable", e);
        }
    }

    byte[] bytes() {
        return buf;
    }

    int limit() {
        return limit;
    }

    /** Whether the whole file has been read (then {@link #limit} is its end). */
    boolean atEnd() {
        return eof;
    }

    /**
     * Moves {@code [keepFrom, limit)} to the front, growing the array when it is full, and
     * reads more bytes after it.
     *
     * @return how far the kept bytes moved back (subtract it from positions at or after {@code keepFrom})
     */
    int refill(int keepFrom) {
        int kept = limit - keepFrom;
        if (keepFrom == 0 && kept == buf.length) {
            buf = Arrays.copyOf(buf, buf.length * 2);
        } else {
            System.arraycopy(buf, keepFrom, buf, 0, kept);
        }
        limit = kept;
        try {
            while (limit < buf.length && !eof) {
                int n = channel.read(ByteBuffer.wrap(buf, limit, buf.length - limit));
                if (n < 0) {
                    eof = true;
                } else {
                    digest.update(buf, limit, n);
                    limit += n;
                    total += n;
                }
            }
        } catch (IOException e) {
            throw InputFile.unreadable(file, e);
        }
        return keepFrom;
    }

    /** The file's fingerprint; only once the whole file has been read. */
    FileFingerprint fingerprint() {
        if (!eof) {
            throw new IllegalStateException("fingerprint of " + file + " before its end was read");
        }
        return FileFingerprint.of(file, total, digest.digest());
    }

    /** The file's size in bytes, as the file system reports it before reading. */
    long size() {
        try {
            return channel.size();
        } catch (IOException e) {
            throw InputFile.unreadable(file, e);
        }
    }

    @Override
    public void close() {
        try {
            channel.close();
        } catch (IOException e) {
            throw InputFile.unreadable(file, e);
        }
    }
}
