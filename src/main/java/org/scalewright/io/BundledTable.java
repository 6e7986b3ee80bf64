package org.scalewright.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;

/** Reads a table bundled with the program as a class-path resource, with a reader's own parser. */
final class BundledTable {
    /** A reader's parser of a read CSV table. */
    interface Parser<T> {
        T parse(Path file, CsvTable table) throws BadInputException;
    }

    private BundledTable() {
    }

    /**
     * @param resource the absolute resource path ({@code /org/scalewright/data/…csv})
     * @return the parsed table; a missing or broken bundled table is an internal error
     */
    static <T> T read(String resource, Parser<T> parser) {
        try (InputStream in = BundledTable.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing built-in table " + resource);
            }
            Path name = Path.of(resource.substring(resource.lastIndexOf('/') + 1));
            return parser.parse(name, CsvTable.parse(name, in.readAllBytes(),
                    CsvTable.RowLimit.TABLE));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (BadInputException e) {
            throw new IllegalStateException("built-in table " + resource + " is broken: " + e.getMessage(), e);
        }
    }
}
