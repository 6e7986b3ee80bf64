package org.scalewright.app.wirecheck;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.design.wirecheck.StageWords;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.model.Note;

/** The words of a wire check shown in the panel: the wire of a note and the advice on stages. */
final class WireCheckText {
    private WireCheckText() {
    }

    /** @return the core wire as a size number ({@code #18}) or a diameter in mm */
    static String wire(Note n) {
        String core = n.wire().musicWireSize().isPresent()
                ? "#" + DisplayFormat.size(n.wire().musicWireSize().getAsDouble())
                : DisplayFormat.fixed(n.wire().diameter() * 1e3, 3) + " mm";
        return core;
    }

    /** @return the advice on raising in stages laid out one item a line: reasons as bullets, passes indented */
    static String stages(WireCheckReport r) {
        StageWords words = r.stageWords();
        List<String> lines = new ArrayList<>();
        lines.add(words.headline());
        words.reasons().forEach(reason -> lines.add("  • " + reason));
        if (!words.plan().isEmpty()) {
            lines.add(words.plan());
        }
        words.passes().forEach(pass -> lines.add("  " + pass));
        if (!words.closing().isEmpty()) {
            lines.add(words.closing());
        }
        return String.join("\n", lines);
    }
}
