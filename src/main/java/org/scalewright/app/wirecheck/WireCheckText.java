package org.scalewright.app.wirecheck;

import java.util.ArrayList;
import java.util.List;
import org.scalewright.design.wirecheck.StageWords;
import org.scalewright.design.wirecheck.WireCheckReport;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Note;
import org.scalewright.model.WireNotation;

/** The words of a wire check shown in the panel: the wire of a note and the advice on stages. */
final class WireCheckText {
    private WireCheckText() {
    }

    /** @return the wire in the program's one notation ({@link WireNotation}), diameters in {@code unit} */
    static String wire(Note n, LengthUnit unit) {
        return WireNotation.of(n, unit);
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
