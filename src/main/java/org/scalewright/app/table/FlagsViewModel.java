package org.scalewright.app.table;

import java.util.ArrayList;
import java.util.List;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.model.KeyNames;
import org.scalewright.physics.Flag;
import org.scalewright.physics.FlagKind;

/** The list of flags of the working scale, bass to treble; choosing one selects its note. */
public final class FlagsViewModel {
    /** One line of the flags list; {@code severity} is the flag kind's own ({@link FlagKind#severity()}). */
    public record Item(int key, String noteName, String kind, String detail, FlagKind.Severity severity) {
        @Override
        public String toString() {
            return key + " " + noteName + "  " + kind + ": " + detail;
        }
    }

    private final ScaleSession session;
    private final ObservableList<Item> items = FXCollections.observableArrayList();

    public FlagsViewModel(ScaleSession session) {
        this.session = session;
        session.analysisProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    public ObservableList<Item> items() {
        return items;
    }

    /** Selects the flagged note (the table and the curves follow). */
    public void jumpTo(Item item) {
        if (item != null) {
            session.selectedKeyProperty().set(item.key());
        }
    }

    private void refresh() {
        List<Item> next = new ArrayList<>();
        for (Flag f : session.analysis().flags()) {
            next.add(new Item(f.key(), KeyNames.name(f.key()), f.kind().word(), f.detail(), f.kind().severity()));
        }
        if (!next.equals(items)) {
            items.setAll(next);
        }
    }
}
