package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.Scale;

/**
 * The analysis of sheets made here (none of them a demo instrument) against an independent
 * computation done in this test from the sheet's own numbers: the stiff-string tension of
 * DESIGN §3, T = 4 L² μ f² − K with K = π³ E d⁴ / (64 L²), σ = T / A, the breaking strength
 * log-log interpolated in the source's table as typed in {@link AstmA228Source} (ASTM A228/A228M
 * tensile requirements as republished by Interwire Group,
 * https://www.interwiregroup.com/product/tinned-coated-music-wire/), and the headroom
 * f_b = √((σ_b A + K) / (4 L² μ)), cents = 1200 log₂(f_b / f). The analysis must agree within
 * 0.5 % of the break percent and 2 cents of headroom (the staircase table this replaced was up
 * to 0.9 % and 7.8 cents off).
 *
 * <p>Constants typed here: steel 7850 kg/m³ (common practice, no source), E = 200 GPa
 * (Shigley's Table 10-5, from memory), music-wire size d[in] = (2·size + 5)/1000 (Music Wire
 * Gauge, Machinery's Handbook, from memory), 1 in = 0.0254 m and 1 lbf = 4.4482216152605 N
 * (NIST SP 811).
 */
class AnalyzeAgreementTest {
    private static final double RHO = 7850;
    private static final double E = 200e9;
    private static final double IN = 0.0254;
    private static final double KSI = 1000 * 4.4482216152605 / (IN * IN);

    /** One row of a hand-made sheet, in the sheet's own units. */
    private record Row(int key, double lengthMm, String wireColumn, double wireValue, Double pitchHz) {
        double diameterM() {
            return switch (wireColumn) {
                case "wire" -> (2 * wireValue + 5) / 1000 * IN;
                case "wire_in" -> wireValue * IN;
                default -> wireValue / 1000;
            };
        }
    }

    @Test
    @DisplayName("plain wire of the odd-thousandth sizes 13-17 (0.031-0.039 in)")
    void oddSizes13to17() throws Exception {
        List<Row> rows = new ArrayList<>();
        double[] sizes = {13, 14, 15, 16, 17};
        int key = 88;
        for (int rep = 0; rep < 3; rep++) {
            for (double size : sizes) {
                double f = 440 * Math.pow(2, (key - 49) / 12.0);
                // speaking lengths chosen so the notes sit between about 35 % and 65 %
                double lengthMm = Math.round((160 + 10 * rep + 2 * size) / f * 1e4) / 10.0;
                rows.add(new Row(key, lengthMm, "wire", size, null));
                key -= 3;
            }
        }
        check(rows, 440);
    }

    @Test
    @DisplayName("plain wire between other tabulated rows, given in inches, with explicit pitches")
    void otherInchSizes() throws Exception {
        List<Row> rows = new ArrayList<>();
        double[] inches = {0.041, 0.043, 0.044, 0.047, 0.049, 0.053, 0.057, 0.061, 0.065, 0.070, 0.074, 0.078,
            0.106, 0.118};
        int key = 50;
        for (double d : inches) {
            double f = 440 * Math.pow(2, (key - 49) / 12.0);
            double lengthMm = Math.round(185 / f * 1e4) / 10.0;
            rows.add(new Row(key, lengthMm, "wire_in", d, key % 3 == 0 ? f * 1.0123 : null));
            key -= 2;
        }
        check(rows, 440);
    }

    @Test
    @DisplayName("metric plain wire at A4 = 442 Hz")
    void metricWire() throws Exception {
        List<Row> rows = new ArrayList<>();
        double[] mm = {0.775, 0.825, 0.875, 0.925, 0.975, 1.025, 1.075, 1.125, 1.175, 1.225};
        int key = 80;
        for (double d : mm) {
            double f = 442 * Math.pow(2, (key - 49) / 12.0);
            double lengthMm = Math.round(178 / f * 1e4) / 10.0;
            rows.add(new Row(key, lengthMm, "wire_mm", d, null));
            key -= 4;
        }
        check(rows, 442);
    }

    private static void check(List<Row> rows, double a4) throws Exception {
        StringBuilder csv = new StringBuilder("# title: agreement check\n# a4_hz: " + a4 + "\n");
        String column = rows.get(0).wireColumn();
        csv.append("key,strings,length_mm,").append(column).append(",pitch_hz\n");
        for (Row r : rows) {
            assertEquals(column, r.wireColumn(), "one wire column per sheet");
            csv.append(r.key()).append(",3,").append(fmt(r.lengthMm())).append(',').append(fmt(r.wireValue()))
                    .append(',').append(r.pitchHz() == null ? "" : fmt(r.pitchHz())).append('\n');
        }
        Scale scale = ScaleSheetReader.standard().read(Path.of("agreement.csv"),
                csv.toString().getBytes(StandardCharsets.UTF_8));
        ScaleAnalysis analysis = ScaleAnalyzer.analyze(scale, BuiltInData.defaultSettings());
        assertEquals(rows.size(), analysis.notes().size());
        int checked = 0;
        for (Row r : rows) {
            NoteResult got = analysis.result(r.key()).orElseThrow();
            double f = r.pitchHz() != null ? r.pitchHz() : a4 * Math.pow(2, (r.key() - 49) / 12.0);
            double d = r.diameterM();
            double l = r.lengthMm() / 1000;
            double area = Math.PI * d * d / 4;
            double mu = RHO * area;
            double k = Math.pow(Math.PI, 3) * E * Math.pow(d, 4) / (64 * l * l);
            double t = 4 * l * l * mu * f * f - k;
            double sigma = t / area;
            double sigmaB = AstmA228Source.minimumKsi(d / IN) * KSI;
            double pct = 100 * sigma / sigmaB;
            double fb = Math.sqrt((sigmaB * area + k) / (4 * l * l * mu));
            double cents = 1200 * Math.log(fb / f) / Math.log(2);
            String what = String.format(Locale.ROOT, "key %d, %.4f in, %.1f mm: break %% %.3f (test) vs %.3f, "
                    + "headroom %.2f c vs %.2f c", r.key(), d / IN, r.lengthMm(), pct, got.breakPct(), cents,
                    got.headroomCents());
            assertTrue(pct > 20 && pct < 80, "the sheet is meant to stay in a working range: " + what);
            assertTrue(Math.abs(got.breakPct() / pct - 1) < 0.005, what);
            assertTrue(Math.abs(got.headroomCents() - cents) < 2, what);
            checked++;
        }
        assertEquals(rows.size(), checked);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.4f", v);
    }
}
