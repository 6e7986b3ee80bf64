package org.scalewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.AWTError;
import org.junit.jupiter.api.Test;

/** A machine without fonts, simulated by a chart drawer that fails the way AWT does there. */
class ChartsNotDrawnTest {
    private static final ReportContent CONTENT = ReportFixtures.content(ReportUnits.METRIC);

    private static ChartsNotDrawn failsWith(Throwable t) {
        return assertThrows(ChartsNotDrawn.class, () -> Reports.make(CONTENT, c -> {
            throw sneaky(t);
        }));
    }

    @SuppressWarnings("unchecked")
    private static <T extends Throwable> RuntimeException sneaky(Throwable t) throws T {
        throw (T) t;
    }

    @Test
    void aFontconfigErrorBecomesOneLineNamingTheCauseAndWhatToInstall() {
        ChartsNotDrawn e = failsWith(new Error("Fontconfig head is null, check your fonts or fonts configuration"));
        String m = e.getMessage();
        assertTrue(m.startsWith("the charts could not be drawn (Fontconfig head is null, check your fonts or fonts "
                + "configuration). "), m);
        assertTrue(m.contains("install fontconfig and a font package such as fonts-dejavu-core"), m);
        assertEquals(1, m.lines().count(), m);
    }

    @Test
    void otherErrorsOfTheGraphicsAndExceptionsNamingFontsAreCaughtToo() {
        assertTrue(failsWith(new AWTError("Probable fatal error: No fonts found.")).getMessage()
                .contains("(Probable fatal error: No fonts found.)"));
        assertTrue(failsWith(new NoClassDefFoundError("Could not initialize class sun.awt.X11FontManager"))
                .getMessage().contains("X11FontManager"));
        assertTrue(failsWith(new UnsatisfiedLinkError("libfontmanager.so: libfreetype.so.6: cannot open shared "
                + "object file\n(no such file)")).getMessage().contains("libfreetype.so.6: cannot open shared "
                + "object file (no such file)"), "a message of several lines is put on one");
        assertTrue(failsWith(new RuntimeException("Fontconfig head is null")).getMessage().contains("Fontconfig"));
        assertTrue(failsWith(new IllegalStateException(new InternalError("no fonts"))).getMessage()
                .contains("fonts-dejavu-core"), "a font failure as the cause");
    }

    @Test
    void aProgramErrorAndTheJvmRunningOutOfMemoryPassUnchanged() {
        IllegalStateException bug = new IllegalStateException("curve has no points");
        assertSame(bug, assertThrows(IllegalStateException.class,
                () -> Reports.make(CONTENT, c -> { throw bug; })));
        OutOfMemoryError oom = new OutOfMemoryError("Java heap space");
        assertSame(oom, assertThrows(OutOfMemoryError.class,
                () -> Reports.make(CONTENT, c -> { throw oom; })));
        assertFalse(ChartsNotDrawn.fromFonts(bug));
    }

    @Test
    void drawnChartsGoIntoTheReport() {
        ReportFiles f = Reports.make(CONTENT, c -> ReportFixtures.charts());
        assertTrue(f.names().contains("report.pdf") && f.names().contains("tension.png"), f.names().toString());
    }
}
