package org.cellwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a file through a temporary sibling and renames it into place, so that a reader never sees a
 * half-written file and a failed write leaves nothing behind.
 */
public final class AtomicFile {

    /** Writes the content of a file to a stream. */
    @FunctionalInterface
    public interface Content {
        /**
         * @param out the stream to write to
         * @throws IOException when writing fails
         */
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFile() {
    }

    /**
     * @param target the file to create or replace
     * @param content what to write
     * @throws IOException when the file cannot be written; the target is then unchanged
     */
    public static void write(Path target, Content content) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new IOException("folder does not exist: " + dir);
        }
        // Not Files.createTempFile: that makes the file readable by its owner only, and the result would keep
        // those rights; a plain new file gets the usual rights of the folder's user.
        Path tmp = abs.resolveSibling("." + abs.getFileName() + "." + Long.toHexString(System.nanoTime()) + ".part");
        try {
            try (OutputStream out = Files.newOutputStream(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
                content.writeTo(out);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
