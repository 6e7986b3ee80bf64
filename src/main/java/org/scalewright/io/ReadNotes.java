package org.scalewright.io;

import java.nio.file.Path;
import java.util.function.Consumer;

/**
 * Where the readers tell how they read a file when that is worth knowing (DESIGN §4): read as
 * Windows-1252 or UTF-16, cells separated by semicolons with decimal commas, the first of several
 * sheets of a workbook. The command line prints the notes, the window shows them; a reading with no
 * one listening on its thread tells no one.
 */
public final class ReadNotes {
    private static final ThreadLocal<Consumer<String>> LISTENER = new ThreadLocal<>();

    /** Work that reads files. */
    @FunctionalInterface
    public interface Reading<T, E extends Exception> {
        T run() throws E;
    }

    private ReadNotes() {
    }

    /**
     * Runs {@code reading} on this thread with {@code listener} told every note of the files it reads,
     * each as {@code FILE: note}.
     */
    public static <T, E extends Exception> T toldTo(Consumer<String> listener, Reading<T, E> reading) throws E {
        Consumer<String> before = LISTENER.get();
        LISTENER.set(listener);
        try {
            return reading.run();
        } finally {
            if (before == null) {
                LISTENER.remove();
            } else {
                LISTENER.set(before);
            }
        }
    }

    static void tell(Path file, String note) {
        Consumer<String> l = LISTENER.get();
        if (l != null) {
            l.accept(file.getFileName() + ": " + note);
        }
    }
}
