package org.scalewright.cli;

import org.scalewright.io.CsvDialect;
import picocli.CommandLine.Option;

/** {@code --decimal-comma}: CSV written for spreadsheets that use a decimal comma. */
public final class DecimalCommaOption {
    @Option(names = "--decimal-comma", description = "write CSV for spreadsheets in decimal-comma locales "
            + "(German, French, …): ';' between cells, decimal commas, a UTF-8 byte-order mark. Without it CSV "
            + "has ',' and decimal points, for other programs; the program reads both. No effect on .xlsx")
    boolean decimalComma;

    /** @return the CSV dialect chosen */
    CsvDialect dialect() {
        return decimalComma ? CsvDialect.DECIMAL_COMMA : CsvDialect.PLAIN;
    }
}
