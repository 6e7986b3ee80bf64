package org.scalewright.app.export;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One file the window can export on its own: a content in one of its formats.
 *
 * @param content what is written
 * @param format  the kind of file, one of {@code content.formats()}
 */
record ExportPiece(ExportContent content, ExportFormat format) {
    /** The PDF report alone. */
    static final ExportPiece PDF = new ExportPiece(ExportContent.REPORT, ExportFormat.PDF);

    ExportPiece {
        if (!content.formats().contains(format)) {
            throw new IllegalArgumentException(content + " is not exported as " + format);
        }
    }

    /** @return every piece: each content in each of its formats, in the order of the menus */
    static List<ExportPiece> all() {
        List<ExportPiece> all = new ArrayList<>();
        for (ExportContent c : ExportContent.values()) {
            c.formats().forEach(f -> all.add(new ExportPiece(c, f)));
        }
        return List.copyOf(all);
    }

    /** @param content a table or the report @return its one piece */
    static ExportPiece of(ExportContent content) {
        if (content.formats().size() != 1) {
            throw new IllegalArgumentException(content + " comes in " + content.formats());
        }
        return new ExportPiece(content, content.formats().get(0));
    }

    /** @return what the piece is, in words */
    String title() {
        return content.title();
    }

    /** @return the stem of the file name offered for the piece, without extension */
    String fileStem() {
        return content.fileStem();
    }

    /** @return a name for the piece's controls: content and format, e.g. {@code tension-curve-png} */
    String id() {
        String c = content.name().toLowerCase(Locale.ROOT).replace('_', '-');
        return content.formats().size() == 1 ? c : c + "-" + format.extension();
    }

    /** @return the suggested file name for a sheet whose name (without extension) is {@code base} */
    String suggestedName(String base) {
        return (base.isBlank() ? "scale" : base) + "-" + fileStem() + "." + format.extension();
    }
}
