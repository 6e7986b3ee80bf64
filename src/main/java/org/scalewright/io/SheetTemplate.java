package org.scalewright.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.OptionalDouble;
import org.scalewright.model.NumberText;

/**
 * The blank scale sheets bundled with the program (the same files as {@code scales/template-*.csv}
 * in the project): keys, sections and strings per note filled in, the measurements blank.
 */
public enum SheetTemplate {
    GRAND_88("Grand, 88 keys", "grand-88.csv"),
    UPRIGHT_88("Upright, 88 keys", "upright-88.csv");

    private static final String DIR = "/org/scalewright/templates/";
    private final String title;
    private final String suggestedName;

    SheetTemplate(String title, String suggestedName) {
        this.title = title;
        this.suggestedName = suggestedName;
    }

    /** @return what the template is for, in words: {@code Grand, 88 keys} */
    public String title() {
        return title;
    }

    /** @return the file name offered for a new sheet made from it */
    public String suggestedName() {
        return suggestedName;
    }

    /** @return the file name of the template in the program: {@code template-} and the suggested name */
    public String resourceName() {
        return "template-" + suggestedName;
    }

    /** @return the template's text as bundled */
    public String text() {
        try (InputStream in = SheetTemplate.class.getResourceAsStream(DIR + resourceName())) {
            if (in == null) {
                throw new IllegalStateException("the bundled template " + resourceName() + " is missing from the program");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * @param a4 the pitch standard for the new sheet, Hz, or empty to keep the template's
     * @return the template's text with its {@code # a4_hz:} line set to {@code a4}
     */
    public String text(OptionalDouble a4) {
        String t = text();
        return a4.isEmpty() ? t : t.replaceFirst("(?m)^# a4_hz: .*$", "# a4_hz: " + NumberText.plain(a4.getAsDouble()));
    }
}
