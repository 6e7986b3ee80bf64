package org.scalewright.io;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.design.diagnosis.DiagnosisReport;
import org.scalewright.design.diagnosis.DiagnosisRequest;
import org.scalewright.design.diagnosis.SectionDiagnosis;
import org.scalewright.model.KeyRange;
import org.scalewright.model.Scale;

/** The diagnosis CSV's comment lines: every setting under its own name. */
class DiagnosisCsvTest {
    @Test
    void theStandOutMarginIsNotCalledACautionMarginAndTheTwoLengthColumnsAreTold() throws Exception {
        Scale s = ScaleSheetReader.standard().read(Path.of("demo-instruments", "grand-190", "grand-190.csv"));
        DiagnosisReport r = SectionDiagnosis.diagnose(DiagnosisRequest.of(s, new KeyRange(60, 80),
                BuiltInData.defaultSettings(), BuiltInData.musicWireSizes(), BuiltInData.metricPlainWire())
                .withMargin(12));
        List<String> comments = DiagnosisCsv.comments(r);
        assertTrue(comments.contains("stand-out margin: 12 % from the section's trend"), comments.toString());
        assertFalse(comments.stream().anyMatch(c -> c.contains("caution margin")), comments.toString());
        assertTrue(comments.stream().anyMatch(c -> c.startsWith("length_trend_mm: ")), comments.toString());
        assertTrue(comments.stream().anyMatch(c -> c.startsWith("length_for_trend_mm: ")), comments.toString());
    }
}
