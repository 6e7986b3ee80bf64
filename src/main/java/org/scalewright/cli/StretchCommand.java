package org.scalewright.cli;

import java.io.PrintWriter;
import java.util.List;
import org.scalewright.design.stretch.OctaveType;
import org.scalewright.design.stretch.StretchCurve;
import org.scalewright.design.stretch.StretchPoint;
import org.scalewright.design.stretch.TuningStretch;
import org.scalewright.model.NumberText;
import org.scalewright.model.Scale;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.io.CsvSheet;
import org.scalewright.report.StretchCsv;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

/** {@code stretch}: the tuning stretch a scale's inharmonicity asks for. */
@Command(name = "stretch", mixinStandardHelpOptions = true,
        description = {"Tuning stretch from the scale's inharmonicity, cents from equal temperament.",
                "Keys A3-A4 (37-49) stay at equal temperament; each octave outward is tuned so that the lower "
                        + "note's partial 2m sounds with the upper note's partial m, with each note's B at its "
                        + "working pitch."})
public final class StretchCommand extends ScaleCommand {
    @Mixin
    OctaveOption octave;

    @Mixin
    CsvOutput out;

    @Override
    public Integer call() throws Exception {
        OctaveType type = octave.type();
        ScaleAnalysis a = inputs.analysis();
        Scale scale = a.scale();
        StretchCurve curve = TuningStretch.of(a, type);
        CsvSheet sheet = StretchCsv.sheet(curve, List.of(), header(scale));
        return out.writeThenPrint(sheet.comments(), sheet.header(), sheet.rows(), w -> print(scale, curve, w));
    }

    private static List<String> header(Scale s) {
        return s.title().isEmpty() ? List.of() : List.of("scale: " + s.title());
    }

    private static void print(Scale s, StretchCurve c, PrintWriter w) {
        w.println((s.title().isEmpty() ? "Scale" : s.title()) + ": tuning stretch for " + c.octave().label()
                + " octaves, A4 = " + Formats.trim(c.a4()) + " Hz, keys 37-49 (A3-A4) at equal temperament");
        w.println();
        TextTable t = new TextTable(">key", "note", ">B", ">equal tempered Hz", ">tuned Hz", ">stretch cents");
        for (StretchPoint p : c.points()) {
            t.row(p.key(), p.noteName(), Formats.b(p.inharmonicity()), Formats.f(p.equalTemperedHz(), 3),
                    p.tunedHz().isPresent() ? Formats.f(p.tunedHz().getAsDouble(), 3) : "-",
                    p.stretchCents().isPresent() ? String.format(java.util.Locale.ROOT, "%+.2f",
                            p.stretchCents().getAsDouble()) : "-");
        }
        t.print(w);
        for (String p : c.problems()) {
            w.println(p);
        }
        StretchPoint low = c.points().get(0);
        StretchPoint high = c.points().get(c.points().size() - 1);
        if (low.stretchCents().isPresent() && high.stretchCents().isPresent()) {
            w.println();
            w.println("Stretch from " + NumberText.rounded(low.stretchCents().getAsDouble(), 1) + " cents at "
                    + low.noteName() + " to " + NumberText.rounded(high.stretchCents().getAsDouble(), 1) + " cents at "
                    + high.noteName() + ".");
        }
    }
}
