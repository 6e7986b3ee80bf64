package org.scalewright.design.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.scalewright.design.SmoothTrend;

class SectionTrendTest {
    private static double smooth(double k) {
        return 50 + 0.2 * (k - 50) + 0.004 * (k - 50) * (k - 50);
    }

    @Test
    void aGroupOfHighNotesDoesNotDragTheTrend() {
        int n = 36;
        double[] keys = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            keys[i] = 53 + i;
            v[i] = smooth(keys[i]) * (keys[i] >= 64 && keys[i] <= 71 ? 1.25 : 1.0);
        }
        SectionTrend t = SectionTrend.fit(keys, v, 8);
        double[] trend = t.trend();
        for (int i = 0; i < n; i++) {
            assertEquals(smooth(keys[i]), trend[i], 0.01 * smooth(keys[i]), "key " + keys[i]);
        }
        // why the leaving out is needed: one robust LOESS pass follows the group
        double[] plain = SmoothTrend.fit(keys, v);
        int middle = 68 - 53;
        assertTrue(plain[middle] > 1.05 * smooth(68), "plain LOESS at key 68: " + plain[middle]);
        assertTrue(t.leftOut()[middle]);
    }

    @Test
    void aSmoothSectionLosesNoNote() {
        double[] keys = new double[30];
        double[] v = new double[30];
        for (int i = 0; i < 30; i++) {
            keys[i] = 40 + i;
            v[i] = smooth(keys[i]);
        }
        SectionTrend t = SectionTrend.fit(keys, v, 8);
        for (boolean out : t.leftOut()) {
            assertFalse(out);
        }
    }

    @Test
    void aCurvedSmoothSectionLosesNoNoteAndAGroupAtItsEdgeIsFound() {
        // a whole plain-wire run rising fast then flattening, 32 % to 57 % over 60 keys
        int n = 60;
        double[] keys = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            keys[i] = 29 + i;
            v[i] = 32 + 25 * (1 - Math.exp(-i / 30.0)) / (1 - Math.exp(-59 / 30.0));
        }
        for (boolean out : SectionTrend.fit(keys, v, 8).leftOut()) {
            assertFalse(out);
        }
        double[] high = v.clone();
        for (int i = n - 6; i < n; i++) {
            high[i] *= 1.2;
        }
        SectionTrend t = SectionTrend.fit(keys, high, 8);
        double[] trend = t.trend();
        for (int i = 0; i < n; i++) {
            assertEquals(i >= n - 6, SectionTrend.deviationPct(high[i], trend[i]) > 8, "key " + keys[i]);
        }
    }

    @Test
    void atMostHalfTheSectionIsLeftOut() {
        double[] keys = new double[10];
        double[] v = new double[10];
        for (int i = 0; i < 10; i++) {
            keys[i] = i;
            v[i] = i % 2 == 0 ? 10 : 20;
        }
        int out = 0;
        for (boolean o : SectionTrend.fit(keys, v, 1).leftOut()) {
            out += o ? 1 : 0;
        }
        assertTrue(out <= 5, "left out " + out);
    }
}
