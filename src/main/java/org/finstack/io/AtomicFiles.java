package org.finstack.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes files so that a crash, a full disk or a bad input never loses the previous version:
 * the new content goes to a temporary file in the same folder and is forced to the disk; the
 * old file is kept as {@code NAME.bak}; then the temporary file is moved atomically into place.
 * At every moment the target holds either the complete old or the complete new content.
 */
public final class AtomicFiles {

    /** Suffix of the kept previous version. */
    public static final String BACKUP_SUFFIX = ".bak";

    private AtomicFiles() {
    }

    /**
     * @param target a file
     * @return where {@link #write} keeps its previous version ({@code NAME.bak} beside it)
     */
    public static Path backupOf(Path target) {
        return target.resolveSibling(target.getFileName() + BACKUP_SUFFIX);
    }

    /**
     * Replaces a file's content atomically, keeping the old file as {@code NAME.bak}.
     *
     * @param target  the file to write
     * @param content its new content
     * @throws IOException when the file cannot be written; the target is then unchanged
     */
    public static void write(Path target, byte[] content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Files.createDirectories(dir);
        Path temp = Files.createTempFile(dir, "." + absolute.getFileName(), ".tmp");
        try {
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer buf = ByteBuffer.wrap(content);
                while (buf.hasRemaining()) {
                    ch.write(buf);
                }
                ch.force(true);
            }
            if (Files.exists(absolute)) {
                keepBackup(absolute);
            }
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            syncDirectory(dir);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /**
     * Makes NAME.bak the old file. A hard link keeps the old file in place until the new one
     * replaces it; where links are not supported the old content is copied.
     */
    private static void keepBackup(Path target) throws IOException {
        Path bak = backupOf(target);
        Files.deleteIfExists(bak);
        try {
            Files.createLink(bak, target);
        } catch (UnsupportedOperationException | IOException | SecurityException e) {
            Files.copy(target, bak, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
        }
    }

    /** Forces the folder entry to disk where the platform allows it (not on Windows). */
    private static void syncDirectory(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Opening a folder as a channel is not supported everywhere; the move is still atomic.
            return;
        }
    }
}
