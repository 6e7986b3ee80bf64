package org.scalewright.app.export;

import java.util.Locale;

/** The kinds of file the window exports. */
enum ExportFormat {
    CSV, PNG, SVG, PDF;

    /** @return the file name extension, without the dot: the format's name in lower case */
    String extension() {
        return name().toLowerCase(Locale.ROOT);
    }
}
