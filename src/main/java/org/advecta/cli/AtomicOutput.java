package org.advecta.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes a file so that it is either complete or absent: the content goes to a temporary file
 * in the same directory, which is then moved over the target in one step. A failure removes
 * the temporary file and leaves any earlier target untouched.
 */
final class AtomicOutput {

    /** Writes the content of a file to a stream. */
    @FunctionalInterface
    interface Body {
        /**
         * Writes the content.
         *
         * @param out the stream (closed by the caller)
         * @throws IOException if writing fails
         */
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicOutput() {
    }

    /**
     * Writes a file atomically.
     *
     * @param target the file to create or replace
     * @param body writes the content
     * @throws UserError if the file cannot be written (naming the file and the reason)
     */
    static void write(Path target, Body body) {
        final Path absolute = target.toAbsolutePath();
        final Path dir = absolute.getParent();
        Path temp = null;
        try {
            temp = Files.createTempFile(dir, "." + absolute.getFileName(), ".part");
            if (Files.getFileStore(temp).supportsFileAttributeView("posix")) {
                // A temporary file is private (rw-------); an output file is readable by all.
                Files.setPosixFilePermissions(temp, PosixFilePermissions.fromString("rw-r--r--"));
            }
            try (OutputStream out = Files.newOutputStream(temp)) {
                body.writeTo(out);
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE,
                    StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            temp = null;
        } catch (IOException e) {
            throw new UserError("cannot write " + target + ": " + Main.reason(e), e);
        } finally {
            if (temp != null) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // Nothing more can be done; the name ends in .part, so it does not look
                    // like a finished output.
                }
            }
        }
    }
}
