package org.scalewright.app.export;

import java.util.Locale;

/**
 * One file the window can export on its own: a table as CSV, a chart as PNG or SVG, or the
 * PDF report.
 */
enum ExportPiece {
    SCHEDULE("String schedule", "schedule", Format.CSV),
    WOUND_ORDER("Wound-string order", "wound-order", Format.CSV),
    WIRE_ORDER("Wire order", "wire-order", Format.CSV),
    STRETCH_CSV("Tuning stretch", "stretch", Format.CSV),
    RESULTS("Results per note", "results", Format.CSV),
    TENSION_PNG("Tension curve", "tension", Format.PNG),
    TENSION_SVG("Tension curve", "tension", Format.SVG),
    BREAK_PERCENT_PNG("Percent of breaking strength curve", "break-percent", Format.PNG),
    BREAK_PERCENT_SVG("Percent of breaking strength curve", "break-percent", Format.SVG),
    INHARMONICITY_PNG("Inharmonicity curve", "inharmonicity", Format.PNG),
    INHARMONICITY_SVG("Inharmonicity curve", "inharmonicity", Format.SVG),
    STRETCH_PNG("Tuning stretch curve", "stretch", Format.PNG),
    STRETCH_SVG("Tuning stretch curve", "stretch", Format.SVG),
    PDF("PDF report", "report", Format.PDF);

    /** The kinds of file written. */
    enum Format {
        CSV("CSV tables"), PNG("PNG images"), SVG("SVG drawings"), PDF("PDF documents");

        private final String description;

        Format(String description) {
            this.description = description;
        }

        /** @return the file name extension, without the dot: the format's name in lower case */
        String extension() {
            return name().toLowerCase(Locale.ROOT);
        }

        /** @return the kind of file in words, for the file chooser's filter */
        String description() {
            return description;
        }
    }

    private final String title;
    private final String fileStem;
    private final Format format;

    ExportPiece(String title, String fileStem, Format format) {
        this.title = title;
        this.fileStem = fileStem;
        this.format = format;
    }

    /** @return what the piece is, in words */
    String title() {
        return title;
    }

    /** @return the file name the whole report gives the piece, without extension */
    String fileStem() {
        return fileStem;
    }

    Format format() {
        return format;
    }

    /** @return true for the charts */
    boolean isChart() {
        return format == Format.PNG || format == Format.SVG;
    }

    /** @return the suggested file name for a sheet whose name (without extension) is {@code base} */
    String suggestedName(String base) {
        return (base.isBlank() ? "scale" : base) + "-" + fileStem + "." + format.extension();
    }
}
