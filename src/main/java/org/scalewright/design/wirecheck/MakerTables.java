package org.scalewright.design.wirecheck;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.scalewright.physics.StrengthTable;

/**
 * The wire makers' strength tables a user has loaded, in the order loaded, each under its own
 * name. Immutable: adding or removing gives a new set.
 *
 * @param tables the tables, names unique
 */
public record MakerTables(List<StrengthTable> tables) {

    public MakerTables {
        tables = List.copyOf(tables);
        for (int i = 0; i < tables.size(); i++) {
            for (int j = 0; j < i; j++) {
                if (tables.get(i).name().equals(tables.get(j).name())) {
                    throw new IllegalArgumentException("a strength table named '" + tables.get(i).name()
                            + "' is loaded twice");
                }
            }
        }
    }

    /** @return an empty set */
    public static MakerTables empty() {
        return new MakerTables(List.of());
    }

    /** @return a set with {@code table} added, or replacing the one of the same name */
    public MakerTables with(StrengthTable table) {
        List<StrengthTable> list = new ArrayList<>(tables.size() + 1);
        boolean replaced = false;
        for (StrengthTable t : tables) {
            if (t.name().equals(table.name())) {
                list.add(table);
                replaced = true;
            } else {
                list.add(t);
            }
        }
        if (!replaced) {
            list.add(table);
        }
        return new MakerTables(list);
    }

    /** @return a set without the table of that name */
    public MakerTables without(String name) {
        return new MakerTables(tables.stream().filter(t -> !t.name().equals(name)).toList());
    }

    /** @return the table of that name, if loaded */
    public Optional<StrengthTable> byName(String name) {
        return tables.stream().filter(t -> t.name().equals(name)).findFirst();
    }

    /** @return the names, in the order loaded */
    public List<String> names() {
        return tables.stream().map(StrengthTable::name).toList();
    }

    /** @return the number of tables */
    public int size() {
        return tables.size();
    }
}
