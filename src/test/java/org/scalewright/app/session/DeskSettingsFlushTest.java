package org.scalewright.app.session;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.prefs.AbstractPreferences;
import org.junit.jupiter.api.Test;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.ForceUnit;
import org.scalewright.model.LengthUnit;

/**
 * Settings reach lasting storage once, when the window closes, not on every change: the JDK's
 * preferences keep a change at once and write it out by themselves (java.util.prefs.Preferences,
 * Java SE 17 API documentation: "flush" and the note on asynchronous persistence).
 */
class DeskSettingsFlushTest {
    /** A preferences node kept in a map that counts the times it is written to lasting storage. */
    private static final class CountingNode extends AbstractPreferences {
        final Map<String, String> values = new HashMap<>();
        int flushes;

        CountingNode() {
            super(null, "");
        }

        @Override
        protected void putSpi(String key, String value) {
            values.put(key, value);
        }

        @Override
        protected String getSpi(String key) {
            return values.get(key);
        }

        @Override
        protected void removeSpi(String key) {
            values.remove(key);
        }

        @Override
        protected void removeNodeSpi() {
        }

        @Override
        protected String[] keysSpi() {
            return values.keySet().toArray(String[]::new);
        }

        @Override
        protected String[] childrenNamesSpi() {
            return new String[0];
        }

        @Override
        protected AbstractPreferences childSpi(String name) {
            throw new UnsupportedOperationException("no children");
        }

        @Override
        protected void syncSpi() {
        }

        @Override
        protected void flushSpi() {
            flushes++;
        }
    }

    @Test
    void changesAreKeptAtOnceAndWrittenOutOnlyWhenAsked() {
        CountingNode node = new CountingNode();
        DeskSettings s = new DeskSettings(SettingsStore.of(node));
        s.units(new DisplayUnits(LengthUnit.IN, ForceUnit.LBF));
        s.a4(442);
        s.windowSize(1366, 700);
        s.recentFiles(List.of(Path.of("a.csv")));
        s.recentFiles(List.of());
        assertEquals(0, node.flushes, "no write-out per change");
        DeskSettings again = new DeskSettings(SettingsStore.of(node));
        assertEquals(442.0, again.a4().getAsDouble());
        assertEquals(List.of(), again.recentFiles());
        s.flush();
        assertEquals(1, node.flushes, "one write-out at close");
    }
}
