package org.scalewright.io;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Writes files so that a reader never sees a half-written one: the content goes to a
 * temporary file beside the target, which is then moved over it. A failure leaves the
 * target as it was.
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    /**
     * A temporary file is created readable by its owner only; give the new file the old one's
     * permissions, or the usual rw-r--r-- for a new file, where the file system has them.
     */
    private static void keepPermissions(Path target, Path tmp) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target) ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    /**
     * @param target the file to write
     * @param content its new content
     * @param keepBackup when true and the target exists, it is kept as {@code NAME.bak} first
     * @throws IOException when the file cannot be written; the target is then unchanged
     */
    public static void write(Path target, byte[] content, boolean keepBackup) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName(), ".tmp");
        try {
            Files.write(tmp, content);
            keepPermissions(abs, tmp);
            if (keepBackup && Files.exists(abs)) {
                Files.copy(abs, dir.resolve(abs.getFileName() + ".bak"), StandardCopyOption.REPLACE_EXISTING);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
