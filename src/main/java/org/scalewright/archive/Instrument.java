package org.scalewright.archive;

import java.util.ArrayList;
import java.util.List;

/**
 * An instrument in the archive, with free-text description fields ("" when not given).
 *
 * @param name     the short name the instrument is found by, unique in the archive
 * @param maker    who built it
 * @param model    the maker's model
 * @param serial   serial number
 * @param owner    whose it is
 * @param location where it stands
 */
public record Instrument(String name, String maker, String model, String serial, String owner, String location) {
    /** The longest name accepted, characters. */
    public static final int LONGEST_NAME = 200;

    /** @throws ArchiveRefused when the name is blank or longer than {@link #LONGEST_NAME} */
    public Instrument {
        name = name == null ? "" : name.strip();
        if (name.isEmpty() || name.length() > LONGEST_NAME) {
            throw new ArchiveRefused("an instrument's name must be 1 to " + LONGEST_NAME + " characters, was '"
                    + name + "'");
        }
        maker = clean(maker);
        model = clean(model);
        serial = clean(serial);
        owner = clean(owner);
        location = clean(location);
    }

    /** @return an instrument with only its name */
    public static Instrument named(String name) {
        return new Instrument(name, "", "", "", "", "");
    }

    /**
     * @return the description fields given, in words, as the history and the window show them:
     *         {@code Marrowby & Fenn, 190, serial 40117, owner the school, at the hall}
     *         (maker, model, serial, owner, place); "" when none is given
     */
    public String description() {
        List<String> parts = new ArrayList<>();
        for (String[] field : new String[][] {{"", maker}, {"", model}, {"serial ", serial}, {"owner ", owner},
                {"at ", location}}) {
            if (!field[1].isEmpty()) {
                parts.add(field[0] + field[1]);
            }
        }
        return String.join(", ", parts);
    }

    private static String clean(String s) {
        return s == null ? "" : s.strip();
    }
}
