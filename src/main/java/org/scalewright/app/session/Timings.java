package org.scalewright.app.session;

import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javafx.animation.AnimationTimer;
import org.jfree.chart.fx.ChartViewer;
import org.scalewright.io.LogFiles;

/**
 * Measurements of the live window, taken only with {@code -Dscalewright.timingReport=FILE}:
 * appends to FILE one line with the milliseconds from the launch of the program to the first
 * frame in which all three curves have been drawn, and one line per edit with the time from
 * the edit to the three curves redrawn (recompute, table rows, chart data, and the drawing
 * of the three chart canvases after the event). Nothing is measured without the property.
 */
public final class Timings {
    static final String PROPERTY = "scalewright.timingReport";
    /** The epoch milliseconds at which a measuring harness launched the program. */
    static final String LAUNCHED_AT_PROPERTY = "scalewright.launchedAt";

    private Timings() {
    }

    private static String reportFile() {
        String file = System.getProperty(PROPERTY);
        return file == null || file.isBlank() ? null : file;
    }

    private static long editStarted;
    private static String editName = "";

    /** Notes the start of an edit (called on the JavaFX thread). */
    static void editStarted(String what) {
        if (reportFile() != null && editStarted == 0) {
            editStarted = System.nanoTime();
            editName = what;
        }
    }

    /** Records the time from the edit noted by {@link #editStarted} to the curves redrawn now. */
    public static void curvesShown(int notes) {
        String file = reportFile();
        if (file != null && editStarted != 0) {
            double ms = (System.nanoTime() - editStarted) / 1e6;
            editStarted = 0;
            write(Path.of(file), String.format(Locale.ROOT, "edit to table and curves redrawn: %.2f ms (%s, %d notes)%n",
                    ms, editName, notes));
        }
    }

    /**
     * @return milliseconds from the launch of the program to now when measuring (see the class
     *         comment), else -1 without any work. The launch is the instant given by the harness
     *         in {@code -Dscalewright.launchedAt=EPOCH_MS} (taken just before it starts the
     *         launcher), else the start of the JVM. Not the operating system's process start
     *         time: on Linux that is derived from a boot time counted in whole seconds, so it
     *         runs up to a second early.
     */
    public static long sinceLaunch() {
        if (reportFile() == null) {
            return -1;
        }
        return System.currentTimeMillis() - launchedAt();
    }

    private static long launchedAt() {
        String given = System.getProperty(LAUNCHED_AT_PROPERTY, "");
        if (given.matches("\\d{10,16}")) {
            return Long.parseLong(given);
        }
        return ManagementFactory.getRuntimeMXBean().getStartTime();
    }

    /**
     * Starts watching for the first frame with all curves drawn.
     *
     * @param fxStarted  milliseconds from launch to the application's start method
     * @param windowBuilt milliseconds from launch to the window built with its sheet open
     */
    public static void watch(List<ChartViewer> viewers, long fxStarted, long windowBuilt) {
        watch(viewers, fxStarted, windowBuilt, new long[1]);
    }

    /**
     * @param shown set by the caller to the milliseconds at which {@code stage.show()} returned
     */
    public static void watch(List<ChartViewer> viewers, long fxStarted, long windowBuilt, long[] shown) {
        String file = reportFile();
        if (file == null) {
            return;
        }
        new AnimationTimer() {
            @Override
            public void handle(long now) {
                boolean drawn = viewers.stream().allMatch(v -> v.getRenderingInfo() != null
                        && v.getRenderingInfo().getChartArea().getWidth() > 0);
                if (drawn) {
                    stop();
                    long ms = sinceLaunch();
                    write(Path.of(file), String.format(Locale.ROOT, "cold start to a window with curves: %d ms "
                            + "from launch (%s; JavaFX start method entered at %d ms, window built with the "
                            + "sheet open at %d ms, shown at %d ms)%n", ms, launchSource(), fxStarted, windowBuilt, shown[0]));
                }
            }
        }.start();
    }

    private static String launchSource() {
        return System.getProperty(LAUNCHED_AT_PROPERTY, "").isEmpty() ? "the JVM's start" : "the harness's clock";
    }

    private static void write(Path file, String line) {
        LogFiles.append(file, line); // a measurement that cannot be written is simply not taken
    }
}
