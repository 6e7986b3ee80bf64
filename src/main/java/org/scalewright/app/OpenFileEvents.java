package org.scalewright.app;

import java.awt.Desktop;
import java.io.File;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Executor;
import java.util.function.Consumer;

/**
 * Sheets the system asks the program to open while it runs: on macOS, a double-click on a sheet
 * in the Finder (or dropping one on the Dock icon) arrives as an open-file event, not as an
 * argument. Events that come before the window is ready are kept and handed over when it is.
 * Elsewhere the system starts the program with the path as its argument, and nothing is listened to.
 */
final class OpenFileEvents {
    private static final OpenFileEvents SHARED = new OpenFileEvents();

    private final List<Path> pending = new ArrayList<>();
    private Consumer<Path> window;
    private Executor windowThread;

    OpenFileEvents() {
    }

    static OpenFileEvents shared() {
        return SHARED;
    }

    /**
     * Listens to the system's open-file events where it sends them (macOS); does nothing
     * elsewhere, without starting AWT there. Call before JavaFX starts, so the events sent at
     * launch are not missed.
     */
    static void listenOnMacOs() {
        if (!System.getProperty("os.name", "").toLowerCase(Locale.ROOT).startsWith("mac")) {
            return;
        }
        try {
            if (Desktop.isDesktopSupported() && Desktop.getDesktop().isSupported(Desktop.Action.APP_OPEN_FILE)) {
                Desktop.getDesktop().setOpenFileHandler(e -> {
                    for (File f : e.getFiles()) {
                        SHARED.arrived(f.toPath());
                    }
                });
            }
        } catch (UnsupportedOperationException | SecurityException e) {
            // headless or refused (HeadlessException is one of these): no events then; File > Open still works
        }
    }

    /** A sheet the system asked to open: to the window when it is ready, else kept for it. */
    synchronized void arrived(Path sheet) {
        if (window == null) {
            pending.add(sheet);
        } else {
            Consumer<Path> target = window;
            windowThread.execute(() -> target.accept(sheet));
        }
    }

    /**
     * The window is ready: {@code open} receives every sheet asked for so far and from now on,
     * each run by {@code windowThread} (JavaFX's thread).
     */
    synchronized void attach(Consumer<Path> open, Executor windowThread) {
        this.window = open;
        this.windowThread = windowThread;
        List<Path> waiting = List.copyOf(pending);
        pending.clear();
        for (Path p : waiting) {
            windowThread.execute(() -> open.accept(p));
        }
    }
}
