package org.scalewright.app;

import java.util.Locale;
import java.util.stream.Collectors;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.StringBinding;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.SimpleBooleanProperty;
import org.scalewright.app.session.DisplayFormat;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.model.DisplayUnits;
import org.scalewright.model.KeyNames;
import org.scalewright.physics.ScaleAnalysis;
import org.scalewright.physics.SectionTotal;

/** The status line: total tension, flag count, the last message; section totals on demand. */
final class StatusViewModel {
    private final ScaleSession session;
    private final StringBinding totals;
    private final StringBinding sections;
    private final BooleanProperty showSections = new SimpleBooleanProperty(false);

    StatusViewModel(ScaleSession session) {
        this.session = session;
        totals = Bindings.createStringBinding(() -> totalsText(session.analysis(), session.units()),
                session.analysisProperty(), session.unitsProperty());
        sections = Bindings.createStringBinding(() -> sectionsText(session.analysis(), session.units()),
                session.analysisProperty(), session.unitsProperty());
    }

    StringBinding totalsProperty() {
        return totals;
    }

    StringBinding sectionsProperty() {
        return sections;
    }

    BooleanProperty showSectionsProperty() {
        return showSections;
    }

    ScaleSession session() {
        return session;
    }

    private String totalsText(ScaleAnalysis a, DisplayUnits u) {
        int strings = a.notes().stream().mapToInt(r -> r.strings()).sum();
        long flagged = a.flaggedNoteCount();
        return String.format(Locale.ROOT, "Total tension %s  ·  %d notes, %d strings  ·  %d flags on %d notes, %d "
                        + "in danger  ·  A4 = %s Hz  ·  strength: %s", DisplayFormat.total(a.totalTension(), u),
                a.notes().size(), strings, a.flags().size(), flagged, a.dangerNoteCount(),
                DisplayFormat.decimals(a.scale().pitch().a4(), 1, 2),
                session.strengthProperty().get().label());
    }

    private static String sectionsText(ScaleAnalysis a, DisplayUnits u) {
        if (a.sections().isEmpty()) {
            return "no notes";
        }
        return a.sections().stream().map(s -> sectionText(s, u)).collect(Collectors.joining("   ·   "));
    }

    private static String sectionText(SectionTotal s, DisplayUnits u) {
        String name = s.section().isEmpty() ? "(no section)" : s.section();
        return String.format(Locale.ROOT, "%s %d–%d (%s–%s): %s, %d strings", name, s.firstKey(), s.lastKey(),
                KeyNames.name(s.firstKey()), KeyNames.name(s.lastKey()), DisplayFormat.total(s.tension(), u),
                s.strings());
    }

    /** @return the last message of the window (what was done, or what went wrong) */
    ReadOnlyStringProperty messageProperty() {
        return session.messageProperty();
    }

    /** @return true when the last message is a problem */
    ReadOnlyBooleanProperty messageIsProblemProperty() {
        return session.messageIsProblemProperty();
    }
}
