package org.scalewright.io;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.LongPredicate;

/**
 * The one way a user's file is written (DESIGN §5, "No half-written output"), so that nothing the
 * user has is lost:
 * <ul>
 * <li>a file is written to a temporary file beside it, then moved over it; a failure leaves the old
 * file as it was and removes the temporary file;</li>
 * <li>a target that is a symbolic link, a named pipe (FIFO), a device or anything else but a
 * regular file is refused, as is a read-only file (also for root, who could replace it) — each with
 * {@link OutputRefused} naming why, and nothing written;</li>
 * <li>on request the file replaced is kept as {@code NAME.bak} (itself written the same way);</li>
 * <li>a folder of files (a report) is written whole into a new folder beside the target, which is
 * then swapped in: the old folder is renamed away, the new one renamed in, the old one deleted —
 * so at any moment the target holds the old files or the new ones;</li>
 * <li>temporary files and folders are named {@code .scalewright-KIND-PID-RANDOM-NAME}; those of a
 * process that no longer runs (killed during a write) are removed on the next write into the same
 * folder, and an old report renamed away but not yet replaced is put back.</li>
 * </ul>
 */
public final class AtomicFiles {
    /** Every temporary file or folder the program makes begins with this. */
    public static final String TEMP_PREFIX = ".scalewright-";
    private static final String TMP = "tmp";
    private static final String NEW = "new";
    private static final String OLD = "old";
    private static final SecureRandom RANDOM = new SecureRandom();

    private AtomicFiles() {
    }

    /** Called between the steps of a folder swap (tests inject failures and take snapshots there). */
    @FunctionalInterface
    interface Steps {
        /** @param step what has just been done */
        void after(String step) throws IOException;
    }

    // ---- single files ----

    /**
     * @param target     the file to write
     * @param content    its new content
     * @param keepBackup when true and the target exists, it is kept as {@code NAME.bak} first
     * @throws OutputRefused when the target is not a file that may be replaced; nothing is written
     * @throws IOException   when the file cannot be written; the target is then unchanged
     */
    public static void write(Path target, byte[] content, boolean keepBackup) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        String problem = problemWithFile(abs);
        if (problem != null) {
            throw new OutputRefused(target, problem);
        }
        Path dir = abs.getParent();
        Path bak = dir.resolve(abs.getFileName() + ".bak");
        boolean backup = keepBackup && Files.exists(abs, LinkOption.NOFOLLOW_LINKS);
        if (backup) {
            String bakProblem = problemWithFile(bak);
            if (bakProblem != null) {
                throw new OutputRefused(target, "the previous file cannot be kept as " + bak.getFileName() + ": "
                        + bakProblem);
            }
        }
        cleanStale(dir);
        Path tmp = tempPath(dir, TMP, abs.getFileName().toString());
        try {
            Files.createFile(tmp);
            writeSynced(tmp, content);
            keepPermissions(abs, tmp);
            if (backup) {
                Path bakTmp = tempPath(dir, TMP, bak.getFileName().toString());
                try {
                    Files.copy(abs, bakTmp, StandardCopyOption.COPY_ATTRIBUTES);
                    move(bakTmp, bak, true);
                } finally {
                    Files.deleteIfExists(bakTmp);
                }
            }
            move(tmp, abs, true);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * Says why {@code target} may not be written as a file, or null when it may: it exists and is a
     * symbolic link, a folder, a named pipe, a device or something else that is not a regular file,
     * or is read-only; or the folder it would go into does not exist.
     *
     * @return a problem in words (to follow "cannot write FILE: "), or null
     */
    public static String problemWithFile(Path target) {
        Path abs = target.toAbsolutePath().normalize();
        if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
            String kind = notPlain(abs, false);
            if (kind != null) {
                return kind;
            }
            if (readOnly(abs)) {
                return "the file is read-only, so it is left as it is; make it writable or give another name";
            }
            return null;
        }
        Path dir = abs.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            return "the folder " + dir + " does not exist";
        }
        return null;
    }

    // ---- folders ----

    /**
     * Writes a folder of files whole: into a new folder beside {@code target}, which then replaces
     * the target (the old folder is renamed away, the new one renamed in, the old one deleted). A
     * failure at any step leaves the old folder (or none, where there was none) and no temporary
     * files; a kill leaves the old folder or the new one, and the next write into the same parent
     * folder tidies up after it.
     *
     * @param target the folder to write; when it exists it must hold only files named in {@code files}
     * @param files  file names (plain names, no folders) and their content, in the order to write
     * @throws OutputRefused when the target may not be replaced; nothing is written
     */
    public static void writeFolder(Path target, Map<String, byte[]> files) throws IOException {
        writeFolder(target, files, step -> { });
    }

    static void writeFolder(Path target, Map<String, byte[]> files, Steps steps) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        String problem = problemWithFolder(abs, files.keySet());
        if (problem != null) {
            throw new OutputRefused(target, problem);
        }
        Path parent = abs.getParent();
        String name = abs.getFileName().toString();
        cleanStale(parent);
        Path fresh = tempPath(parent, NEW, name);
        Path aside = null;
        boolean swapped = false;
        try {
            Files.createDirectory(fresh);
            if (Files.isDirectory(abs, LinkOption.NOFOLLOW_LINKS)) {
                keepPermissions(abs, fresh);
            }
            steps.after("created the new folder");
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                Path f = fresh.resolve(plainName(e.getKey()));
                Files.createFile(f);
                writeSynced(f, e.getValue());
                keepPermissions(abs.resolve(e.getKey()), f);
                steps.after("wrote " + e.getKey());
            }
            if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
                aside = tempPath(parent, OLD, name);
                move(abs, aside, false);
                steps.after("renamed the old folder away");
            }
            move(fresh, abs, false);
            swapped = true;
            steps.after("renamed the new folder in");
        } catch (IOException | RuntimeException | Error e) {
            if (swapped && aside != null) {
                deleteQuietly(aside);
            } else if (aside != null && Files.notExists(abs, LinkOption.NOFOLLOW_LINKS)) {
                try {
                    move(aside, abs, false);
                    aside = null;
                } catch (IOException restore) {
                    e.addSuppressed(restore);
                }
            }
            deleteQuietly(fresh);
            throw e;
        }
        if (aside != null) {
            deleteQuietly(aside);
        }
        steps.after("deleted the old folder");
    }

    /**
     * Says why {@code target} may not be replaced by a folder of files, or null when it may: it is a
     * symbolic link or not a folder, the folder is read-only, it holds anything but the files to be
     * written (those would be lost with the old folder), or its parent folder does not exist.
     *
     * @param names the names of the files to be written, or null to leave the folder's content unchecked
     * @return a problem in words (to follow "cannot write FOLDER: "), or null
     */
    public static String problemWithFolder(Path target, Collection<String> names) {
        Path abs = target.toAbsolutePath().normalize();
        Path parent = abs.getParent();
        if (parent == null) {
            return "the root folder cannot be replaced; give a folder inside it";
        }
        if (Files.exists(abs, LinkOption.NOFOLLOW_LINKS)) {
            if (!Files.isDirectory(abs, LinkOption.NOFOLLOW_LINKS)) {
                String kind = notPlain(abs, true);
                return kind != null ? kind : "it is a file, not a directory";
            }
            if (readOnly(abs)) {
                return "the folder is read-only, so it is left as it is; make it writable or give another name";
            }
            if (names != null) {
                List<String> others = new ArrayList<>();
                try (DirectoryStream<Path> s = Files.newDirectoryStream(abs)) {
                    for (Path p : s) {
                        String n = p.getFileName().toString();
                        if (!names.contains(n) || !Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS)) {
                            others.add(n);
                        }
                    }
                } catch (IOException e) {
                    return "its content cannot be listed (" + e.getMessage() + ")";
                }
                if (!others.isEmpty()) {
                    others.sort(null);
                    return "the folder is replaced as a whole, and it holds " + others.size() + " "
                            + (others.size() == 1 ? "entry" : "entries") + " that " + (others.size() == 1 ? "is" : "are")
                            + " not part of a report (" + String.join(", ", others.subList(0, Math.min(3, others.size())))
                            + (others.size() > 3 ? ", …" : "") + "); give a new folder or one holding only an earlier report";
                }
            }
            return null;
        }
        if (!Files.isDirectory(parent)) {
            return "the parent directory " + parent + " does not exist";
        }
        return null;
    }

    // ---- stale temporary files ----

    /**
     * Tidies a folder after earlier writes that were killed: removes the temporary files and new
     * folders of processes that no longer run, and deletes an old folder renamed away — or puts it
     * back where its replacement never arrived. Best effort: what cannot be removed stays.
     */
    static void cleanStale(Path dir) {
        long self = ProcessHandle.current().pid();
        cleanStale(dir, pid -> pid == self || ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false));
    }

    /** @param running whether the process of a given id still runs (tests pretend) */
    static void cleanStale(Path dir, LongPredicate running) {
        List<Path> stale = new ArrayList<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, TEMP_PREFIX + "*")) {
            s.forEach(stale::add);
        } catch (IOException e) {
            return;
        }
        for (Path p : stale) {
            TempName t = TempName.parse(p.getFileName().toString());
            if (t == null || running.test(t.pid)) {
                continue;
            }
            try {
                if (t.kind.equals(OLD) && Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)
                        && Files.notExists(dir.resolve(t.name), LinkOption.NOFOLLOW_LINKS)) {
                    move(p, dir.resolve(t.name), false);
                } else {
                    deleteQuietly(p);
                }
            } catch (IOException e) {
                // left for a later write
            }
        }
    }

    /** A parsed temporary name {@code .scalewright-KIND-PID-RANDOM-NAME}. */
    private record TempName(String kind, long pid, String name) {
        static TempName parse(String fileName) {
            if (!fileName.startsWith(TEMP_PREFIX)) {
                return null;
            }
            String[] parts = fileName.substring(TEMP_PREFIX.length()).split("-", 4);
            if (parts.length != 4 || !List.of(TMP, NEW, OLD).contains(parts[0]) || parts[3].isEmpty()) {
                return null;
            }
            try {
                return new TempName(parts[0], Long.parseLong(parts[1]), parts[3]);
            } catch (NumberFormatException e) {
                return null;
            }
        }
    }

    private static Path tempPath(Path dir, String kind, String name) {
        String random = Long.toString(RANDOM.nextLong() & Long.MAX_VALUE, 36);
        return dir.resolve(TEMP_PREFIX + kind + "-" + ProcessHandle.current().pid() + "-" + random + "-" + name);
    }

    // ---- helpers ----

    /** @return why an existing path is not a regular file (or folder, where allowed), or null */
    private static String notPlain(Path abs, boolean folderWanted) {
        if (Files.isSymbolicLink(abs)) {
            String to;
            try {
                to = Files.readSymbolicLink(abs).toString();
            } catch (IOException | UnsupportedOperationException e) {
                to = "?";
            }
            return "it is a symbolic link (to " + to + "); links are not written through — give the "
                    + (folderWanted ? "folder" : "file") + " it points to, or another name";
        }
        if (Files.isDirectory(abs, LinkOption.NOFOLLOW_LINKS)) {
            return folderWanted ? null : "it is a folder; give a file name";
        }
        if (Files.isRegularFile(abs, LinkOption.NOFOLLOW_LINKS)) {
            return folderWanted ? "it is a file, not a directory" : null;
        }
        return "it is " + specialKind(abs) + ", not a regular file; nothing was written to it";
    }

    /** @return "a named pipe (FIFO)", "a device", "a socket" or "a special file" */
    private static String specialKind(Path abs) {
        try {
            Object mode = Files.getAttribute(abs, "unix:mode", LinkOption.NOFOLLOW_LINKS);
            int type = ((Integer) mode) & 0170000;
            return switch (type) {
                case 0010000 -> "a named pipe (FIFO)";
                case 0020000, 0060000 -> "a device";
                case 0140000 -> "a socket";
                default -> "a special file";
            };
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException | ClassCastException e) {
            return "a special file";
        }
    }

    /**
     * Read-only: not writable for this process, or — where the file system has POSIX permissions —
     * writable by nobody, which root could otherwise replace.
     */
    private static boolean readOnly(Path abs) {
        if (!Files.isWritable(abs)) {
            return true;
        }
        try {
            if (Files.getFileStore(abs).supportsFileAttributeView(PosixFileAttributeView.class)) {
                Set<PosixFilePermission> p = Files.getPosixFilePermissions(abs, LinkOption.NOFOLLOW_LINKS);
                return !p.contains(PosixFilePermission.OWNER_WRITE) && !p.contains(PosixFilePermission.GROUP_WRITE)
                        && !p.contains(PosixFilePermission.OTHERS_WRITE);
            }
        } catch (IOException | UnsupportedOperationException e) {
            return false;
        }
        return false;
    }

    private static String plainName(String name) {
        if (name == null || name.isBlank() || name.contains("/") || name.contains("\\") || name.equals(".")
                || name.equals("..") || name.startsWith(TEMP_PREFIX)) {
            throw new IllegalArgumentException("a file of a folder must have a plain name, was '" + name + "'");
        }
        return name;
    }

    private static void writeSynced(Path file, byte[] content) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
            java.nio.ByteBuffer b = java.nio.ByteBuffer.wrap(content);
            while (b.hasRemaining()) {
                ch.write(b);
            }
            ch.force(true);
        }
    }

    private static void move(Path from, Path to, boolean replace) throws IOException {
        try {
            if (replace) {
                Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } else {
                Files.move(from, to, StandardCopyOption.ATOMIC_MOVE);
            }
        } catch (AtomicMoveNotSupportedException e) {
            if (replace) {
                Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
            } else {
                Files.move(from, to);
            }
        }
    }

    /**
     * A temporary file is created readable by its owner only; give the new file the old one's
     * permissions, or the usual rw-r--r-- (rwxr-xr-x for a folder) for a new one, where the file
     * system has them.
     */
    private static void keepPermissions(Path target, Path tmp) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        boolean folder = Files.isDirectory(tmp, LinkOption.NOFOLLOW_LINKS);
        Set<PosixFilePermission> perms = Files.exists(target, LinkOption.NOFOLLOW_LINKS)
                ? Files.getPosixFilePermissions(target, LinkOption.NOFOLLOW_LINKS)
                : PosixFilePermissions.fromString(folder ? "rwxr-xr-x" : "rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    /** Deletes a file or a folder tree without following links; what cannot be deleted stays. */
    private static void deleteQuietly(Path p) {
        if (!Files.exists(p, LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        try {
            Files.walkFileTree(p, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.deleteIfExists(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path d, IOException exc) throws IOException {
                    Files.deleteIfExists(d);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            // best effort: a later write tries again
        }
    }
}
