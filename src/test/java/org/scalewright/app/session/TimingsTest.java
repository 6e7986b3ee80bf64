package org.scalewright.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The start-up clock of the window's timing report (DEVELOPERS.md, "Measured figures"). */
class TimingsTest {
    @TempDir
    Path dir;

    @AfterEach
    void clear() {
        System.clearProperty(Timings.PROPERTY);
        System.clearProperty(Timings.LAUNCHED_AT_PROPERTY);
    }

    @Test
    void withoutATimingReportNothingIsMeasured() {
        assertEquals(-1, Timings.sinceLaunch());
    }

    @Test
    void theLaunchInstantGivenByTheHarnessIsTheOrigin() {
        System.setProperty(Timings.PROPERTY, dir.resolve("t.txt").toString());
        System.setProperty(Timings.LAUNCHED_AT_PROPERTY, Long.toString(System.currentTimeMillis() - 5_000));
        long ms = Timings.sinceLaunch();
        assertTrue(ms >= 5_000 && ms < 60_000, "5 s ago, give or take the test's own time: " + ms);
    }

    @Test
    void withoutAGivenInstantTheJvmStartIsTheOrigin() {
        System.setProperty(Timings.PROPERTY, dir.resolve("t.txt").toString());
        long ms = Timings.sinceLaunch();
        long jvmUp = java.lang.management.ManagementFactory.getRuntimeMXBean().getUptime();
        assertTrue(Math.abs(ms - jvmUp) < 1_000, "about the JVM's uptime " + jvmUp + " ms: " + ms);
    }
}
