package org.scalewright.report;

import java.util.Locale;
import java.util.function.Supplier;

/**
 * The charts could not be drawn because the machine cannot draw text: Java's AWT draws chart
 * labels with the system's fonts, found through fontconfig, and without them it fails deep
 * inside, often with an {@link Error} rather than an exception ({@code Fontconfig head is
 * null}, {@code Probable fatal error: No fonts found}, a font library that does not load). The
 * message is one line naming the cause and what to install; both front ends show it as it is.
 */
public final class ChartsNotDrawn extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** What to install, said after the cause. */
    static final String INSTALL = "Java draws the charts' text with the system's fonts; install fontconfig and a "
            + "font package such as fonts-dejavu-core (Debian, Ubuntu: apt-get install fontconfig fonts-dejavu-core)";

    ChartsNotDrawn(Throwable cause) {
        super("the charts could not be drawn (" + describe(cause) + "). " + INSTALL, cause);
    }

    /**
     * Draws through {@code drawing}, turning a failure of the machine's fonts or graphics into
     * {@link ChartsNotDrawn}. Any {@link Error} other than the JVM running out of memory or
     * stack is taken for one (AWT fails with errors such as {@code AWTError}, {@code
     * UnsatisfiedLinkError} or {@code NoClassDefFoundError} of its font manager), and so is an
     * exception that names fonts or comes from AWT's font code; any other exception is a
     * program error and passes unchanged.
     *
     * @return what {@code drawing} drew
     */
    public static <T> T guard(Supplier<T> drawing) {
        try {
            return drawing.get();
        } catch (VirtualMachineError e) {
            throw e;
        } catch (Error e) {
            throw new ChartsNotDrawn(e);
        } catch (RuntimeException e) {
            if (fromFonts(e)) {
                throw new ChartsNotDrawn(e);
            }
            throw e;
        }
    }

    /** @return true when the exception, or one of its causes, names fonts or comes from AWT's font code */
    static boolean fromFonts(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause() == c ? null : c.getCause()) {
            String m = c.getMessage();
            if (m != null && m.toLowerCase(Locale.ROOT).contains("font")) {
                return true;
            }
            for (StackTraceElement e : c.getStackTrace()) {
                String k = e.getClassName();
                if (k.startsWith("sun.font.") || k.startsWith("sun.awt.FontConfiguration")
                        || k.startsWith("sun.awt.FcFontConfiguration") || k.equals("java.awt.Font")) {
                    return true;
                }
            }
        }
        return false;
    }

    /** @return the failure in one line: its message, or its kind when it has none */
    private static String describe(Throwable t) {
        String m = t.getMessage();
        String line = m == null || m.isBlank() ? t.getClass().getSimpleName() : m.strip();
        return line.replaceAll("\\s+", " ");
    }
}
