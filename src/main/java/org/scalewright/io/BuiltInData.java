package org.scalewright.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.scalewright.design.rescale.WrapWires;
import org.scalewright.model.LengthUnit;
import org.scalewright.model.Materials;
import org.scalewright.model.UnitConversions;
import org.scalewright.model.WireSize;
import org.scalewright.model.WireSizeTable;
import org.scalewright.physics.AnalysisSettings;
import org.scalewright.physics.StrengthTable;

/**
 * The data tables bundled with the program as CSV resources under
 * {@code org/scalewright/data/}, each with its source in a header comment. Loaded once.
 */
public final class BuiltInData {
    private static final String DIR = "/org/scalewright/data/";
    private static volatile Materials materials;
    private static volatile StrengthTable minimum;
    private static volatile StrengthTable maximum;
    private static volatile WireSizeTable sizes;
    private static volatile List<Double> metric;
    private static volatile WrapWires wraps;

    private BuiltInData() {
    }

    /** @return ASTM A228 minimum tensile strength by diameter (the default strength table) */
    public static StrengthTable astmMinimum() {
        if (minimum == null) {
            minimum = BundledTable.read(DIR + "astm-a228-minimum.csv", StrengthTableReader::parse);
        }
        return minimum;
    }

    /** @return ASTM A228 maximum tensile strength by diameter */
    public static StrengthTable astmMaximum() {
        if (maximum == null) {
            maximum = BundledTable.read(DIR + "astm-a228-maximum.csv", StrengthTableReader::parse);
        }
        return maximum;
    }

    /** @return the default materials: densities and Young's modulus (sources in materials.csv) */
    public static Materials materials() {
        if (materials == null) {
            Map<String, Double> v = new HashMap<>();
            for (CsvTable.Row r : resource("materials.csv").rows()) {
                double value = Double.parseDouble(r.cells().get(1));
                v.put(r.cells().get(0), r.cells().get(2).equals("GPa") ? value * 1e9 : value);
            }
            materials = new Materials(v.get("steel_density"), v.get("copper_density"), v.get("iron_density"),
                    v.get("youngs_modulus"));
        }
        return materials;
    }

    /** @return music-wire sizes 12 to 23 in half steps with their diameters */
    public static WireSizeTable musicWireSizes() {
        if (sizes == null) {
            List<WireSize> list = new ArrayList<>();
            for (CsvTable.Row r : resource("music-wire-sizes.csv").rows()) {
                list.add(new WireSize(Double.parseDouble(r.cells().get(0)),
                        Double.parseDouble(r.cells().get(1)) * UnitConversions.METRES_PER_INCH));
            }
            sizes = new WireSizeTable(list);
        }
        return sizes;
    }

    /** @return metric plain-wire diameters in 0.025 mm steps, m, thinnest first */
    public static List<Double> metricPlainWire() {
        if (metric == null) {
            metric = resource("metric-plain-wire.csv").rows().stream()
                    .map(r -> LengthUnit.MM.toMetres(Double.parseDouble(r.cells().get(0)))).sorted().toList();
        }
        return metric;
    }

    /**
     * @return the wrap wire the wound-string designer plans with by default: copper and soft iron,
     *         0.10-2.00 mm in 0.01 mm steps (source and reasons in wrap-wire.csv)
     */
    public static WrapWires wrapWire() {
        if (wraps == null) {
            wraps = BundledTable.read(DIR + "wrap-wire.csv", WrapCatalogueReader::parse);
        }
        return wraps;
    }

    /** @return the safety cautions shown to the user (DESIGN §8), one paragraph each */
    public static List<String> cautions() {
        try (InputStream in = BuiltInData.class.getResourceAsStream(DIR + "cautions.txt")) {
            if (in == null) {
                throw new IllegalStateException("missing built-in text cautions.txt");
            }
            return new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8).lines()
                    .filter(l -> !l.isBlank()).toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** @return the default analysis settings: built-in materials, ASTM minimum strength, default bands */
    public static AnalysisSettings defaultSettings() {
        return AnalysisSettings.of(materials(), astmMinimum());
    }

    /** @return a bundled table of {@code data/} as it is read */
    static CsvTable table(String name) {
        return resource(name);
    }

    private static CsvTable resource(String name) {
        try (InputStream in = BuiltInData.class.getResourceAsStream(DIR + name)) {
            if (in == null) {
                throw new IllegalStateException("missing built-in table " + name);
            }
            return CsvTable.parse(Path.of(name), in.readAllBytes(),
                    CsvTable.RowLimit.TABLE);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (BadInputException e) {
            throw new IllegalStateException("built-in table " + name + " is broken: " + e.getMessage(), e);
        }
    }
}
