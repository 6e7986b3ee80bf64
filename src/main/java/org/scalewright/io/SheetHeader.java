package org.scalewright.io;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.SheetColumn;
import org.scalewright.model.SheetLayout;

/** The header of a scale sheet: which column each cell position holds, and in what unit. */
final class SheetHeader {
    private final SheetColumn[] byPosition;
    private final String[] names;
    private final Map<SheetColumn, Integer> positions = new EnumMap<>(SheetColumn.class);
    private final Map<SheetColumn, LengthUnit> units = new EnumMap<>(SheetColumn.class);

    private SheetHeader(int width) {
        byPosition = new SheetColumn[width];
        names = new String[width];
    }

    static SheetHeader parse(Path file, List<String> header, int line, List<SheetProblem> problems) {
        SheetHeader h = new SheetHeader(header.size());
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i);
            h.names[i] = name;
            SheetColumn col = null;
            LengthUnit unit = null;
            for (SheetColumn c : SheetColumn.values()) {
                if (!c.isLength() && c.stem().equals(name)) {
                    col = c;
                }
                if (c.isLength()) {
                    for (LengthUnit u : LengthUnit.values()) {
                        if (c.header(u).equals(name)) {
                            col = c;
                            unit = u;
                        }
                    }
                }
            }
            if (col == null) {
                problems.add(new SheetProblem(file, line, name.isEmpty() ? "(blank)" : name,
                        name.isEmpty() ? "a column has no name" : "unknown column; expected one of " + known()));
                continue;
            }
            if (h.positions.containsKey(col)) {
                String msg = col.isLength()
                        ? "more than one unit for " + col.stem() + " (give either " + col.header(LengthUnit.MM)
                        + " or " + col.header(LengthUnit.IN) + ")"
                        : "the column appears more than once";
                problems.add(new SheetProblem(file, line, name, msg));
                continue;
            }
            h.positions.put(col, i);
            h.byPosition[i] = col;
            if (unit != null) {
                h.units.put(col, unit);
            }
        }
        for (SheetColumn required : List.of(SheetColumn.KEY, SheetColumn.STRINGS, SheetColumn.SPEAKING_LENGTH)) {
            if (!h.positions.containsKey(required) && header.stream().noneMatch(n -> n.startsWith(required.stem()))) {
                problems.add(new SheetProblem(file, line, "", "required column " + (required.isLength()
                        ? required.header(LengthUnit.MM) + " or " + required.header(LengthUnit.IN)
                        : required.stem()) + " is missing"));
            }
        }
        if (!h.positions.containsKey(SheetColumn.WIRE_SIZE) && !h.positions.containsKey(SheetColumn.WIRE_DIAMETER)
                && header.stream().noneMatch(n -> n.startsWith("wire"))) {
            problems.add(new SheetProblem(file, line, "", "no wire column; expected wire (size number), wire_mm or wire_in"));
        }
        if (h.positions.containsKey(SheetColumn.WRAP2) && !h.positions.containsKey(SheetColumn.WRAP1)) {
            problems.add(new SheetProblem(file, line, h.name(SheetColumn.WRAP2),
                    "a second wrap column needs a first wrap column (wrap1_mm or wrap1_in)"));
        }
        if (h.positions.containsKey(SheetColumn.OD1) && !h.positions.containsKey(SheetColumn.OD)) {
            problems.add(new SheetProblem(file, line, h.name(SheetColumn.OD1),
                    "a column of diameters over the first layer needs an outside-diameter column (od_mm or od_in)"));
        }
        return h;
    }

    private static String known() {
        List<String> all = new ArrayList<>();
        for (SheetColumn c : SheetColumn.values()) {
            if (c.isLength()) {
                all.add(c.header(LengthUnit.MM));
                all.add(c.header(LengthUnit.IN));
            } else if (!all.contains(c.stem())) {
                all.add(c.stem());
            }
        }
        return String.join(", ", all);
    }

    int width() {
        return byPosition.length;
    }

    /** @return the position of a column, or -1 */
    int position(SheetColumn c) {
        return positions.getOrDefault(c, -1);
    }

    String name(SheetColumn c) {
        int p = position(c);
        return p < 0 ? c.stem() : names[p];
    }

    LengthUnit unit(SheetColumn c) {
        return units.get(c);
    }

    SheetLayout layout() {
        List<SheetColumn> cols = new ArrayList<>();
        for (SheetColumn c : byPosition) {
            if (c != null) {
                cols.add(c);
            }
        }
        return new SheetLayout(cols, units);
    }
}
