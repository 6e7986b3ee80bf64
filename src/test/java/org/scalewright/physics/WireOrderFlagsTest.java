package org.scalewright.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.scalewright.io.BuiltInData;
import org.scalewright.io.ScaleSheetReader;
import org.scalewright.model.CoreWire;
import org.scalewright.model.Note;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.Wrap;
import org.scalewright.model.WrapMetal;

/**
 * The two flags on the order of plain-wire sizes: a size growing toward the treble within a
 * section, and a single odd string between two neighbours that agree. Plain sizes stepping down
 * toward the treble, with runs of equal sizes, is how plain-wire scales are built (common
 * practice, no source): such a scale raises neither flag. Sizes and lengths are made up for the test.
 */
class WireOrderFlagsTest {
    private static final AnalysisSettings S = BuiltInData.defaultSettings();

    /** Music-wire size → diameter, DESIGN §3: d[in] = (2·size + 5)/1000 (Machinery's Handbook, from memory). */
    private static double inches(double size) {
        return (2 * size + 5) / 1000 * 0.0254;
    }

    /** Plain notes from key {@code first} on, one size each, in one section, lengths falling smoothly. */
    private static List<Note> run(int first, String section, double... sizes) {
        List<Note> notes = new ArrayList<>();
        for (int i = 0; i < sizes.length; i++) {
            int key = first + i;
            notes.add(Note.plain(key, 3, 1.2 * Math.pow(2, -(key - 28) / 12.0 * 0.9),
                    CoreWire.ofSize(sizes[i], inches(sizes[i]))).withSection(section));
        }
        return notes;
    }

    private static ScaleAnalysis analyze(List<Note> notes) {
        return ScaleAnalyzer.analyze(new Scale("test", PitchStandard.ISO_16, notes, null), S);
    }

    private static List<Integer> keys(ScaleAnalysis a, FlagKind kind) {
        return a.flags().stream().filter(f -> f.kind() == kind).map(Flag::key).toList();
    }

    @Test
    void anOrdinaryScaleSteppingDownWithTiesRaisesNeither() {
        List<Note> notes = new ArrayList<>(run(29, "tenor", 20, 20, 19.5, 19.5, 19, 19, 18.5, 18.5, 18, 18, 17.5, 17.5));
        // a new section may start on a thicker size than the last of the section below
        notes.addAll(run(41, "treble", 18, 17.5, 17.5, 17.5, 17, 17, 17, 16.5, 16.5, 16, 16, 16));
        ScaleAnalysis a = analyze(notes);
        assertEquals(List.of(), keys(a, FlagKind.SIZE_GROWS));
        assertEquals(List.of(), keys(a, FlagKind.ODD_SIZE));
    }

    @Test
    void aThickerSizeOnAHigherKeyWithinASectionIsFlaggedOnTheTrebleSideNote() {
        ScaleAnalysis a = analyze(run(40, "treble", 17, 17, 17.5, 17.5, 17, 16.5));
        assertEquals(List.of(42), keys(a, FlagKind.SIZE_GROWS));
        assertEquals(List.of(), keys(a, FlagKind.ODD_SIZE), "17.5 then 17.5: not a single odd string");
        Flag f = a.flags().stream().filter(x -> x.kind() == FlagKind.SIZE_GROWS).findFirst().orElseThrow();
        assertEquals("plain wire #17.5 is thicker than #17 on key 41 (C#4), its bass-side neighbour in section "
                + "'treble': plain sizes normally stay or step down toward the treble", f.detail());
    }

    @Test
    void thickerIsByDiameterWhateverTheNotationAndEqualDiametersAreATie() {
        List<Note> notes = new ArrayList<>(run(40, "treble", 16, 16));
        // size 16 written as its diameter in mm: the same wire, a tie; then 1.000 mm, thicker than #16 (0.940 mm)
        notes.add(Note.plain(42, 3, 0.5, CoreWire.ofDiameter(inches(16))).withSection("treble"));
        notes.add(Note.plain(43, 3, 0.48, CoreWire.ofDiameter(1.000e-3)).withSection("treble"));
        notes.add(Note.plain(44, 3, 0.46, CoreWire.ofDiameter(1.000e-3)).withSection("treble"));
        ScaleAnalysis a = analyze(notes);
        assertEquals(List.of(43), keys(a, FlagKind.SIZE_GROWS));
    }

    @Test
    void theFirstPlainNoteAfterTheWoundStringsHasNoPlainNeighbourOnItsBassSide() {
        List<Note> notes = new ArrayList<>();
        notes.add(Note.plain(28, 2, 1.0, CoreWire.ofDiameter(1.0e-3)).withWrap(new Wrap(0.3e-3, 0, WrapMetal.COPPER))
                .withSection("tenor"));
        notes.addAll(run(29, "tenor", 20, 20, 19.5));
        ScaleAnalysis a = analyze(notes);
        assertEquals(List.of(), keys(a, FlagKind.SIZE_GROWS), "#20 (1.143 mm) after a 1.0 mm core is no growth");
    }

    @Test
    void aSingleOddStringIsFlaggedAloneAndItsTrebleSideNeighbourIsNotCalledAGrowth() {
        ScaleAnalysis thicker = analyze(run(40, "treble", 16, 16, 17, 16, 16));
        assertEquals(List.of(42), keys(thicker, FlagKind.ODD_SIZE));
        assertEquals(List.of(), keys(thicker, FlagKind.SIZE_GROWS), "the odd string is one fault, flagged once");
        Flag f = thicker.flags().stream().filter(x -> x.kind() == FlagKind.ODD_SIZE).findFirst().orElseThrow();
        assertEquals("plain wire #17 between #16 on both sides (keys 41 C#4 and 43 D#4): a single odd string, "
                + "perhaps a replacement of another size", f.detail());

        ScaleAnalysis thinner = analyze(run(40, "treble", 17, 17, 16, 17, 17));
        assertEquals(List.of(42), keys(thinner, FlagKind.ODD_SIZE));
        assertEquals(List.of(), keys(thinner, FlagKind.SIZE_GROWS),
                "key 43 goes back to the size of key 41, past the odd string: no growth");
    }

    @Test
    void neighboursThatDisagreeMakeNoOddStringAndSectionsAreNotCrossed() {
        assertEquals(List.of(), keys(analyze(run(40, "treble", 17, 16.5, 16)), FlagKind.ODD_SIZE));
        List<Note> notes = new ArrayList<>(run(40, "tenor", 16, 16));
        notes.addAll(run(42, "treble", 17, 16, 16));
        ScaleAnalysis a = analyze(notes);
        assertEquals(List.of(), keys(a, FlagKind.ODD_SIZE), "key 42 opens a new section");
        assertEquals(List.of(), keys(a, FlagKind.SIZE_GROWS));
    }

    @Test
    void severities() {
        // a size growing toward the treble goes against how a scale is built and carries a tension
        // step with it: a caution, like the tension step; a single odd string is most often a
        // replacement of a near size whose stress hardly differs (plain-wire stress does not depend
        // on the diameter): a notice
        assertEquals(FlagKind.Severity.CAUTION, FlagKind.SIZE_GROWS.severity());
        assertEquals(FlagKind.Severity.NOTICE, FlagKind.ODD_SIZE.severity());
    }

    @Test
    void theDemoInstrumentsRaiseNoneOfThem() throws Exception {
        // the demo plain sections step down with ties (their READMEs): an ordinary scale, no flag of either kind
        for (String demo : List.of("grand-190", "upright-131")) {
            Path file = Path.of("demo-instruments", demo, demo + ".csv");
            ScaleAnalysis a = ScaleAnalyzer.analyze(ScaleSheetReader.standard().read(file), S);
            assertTrue(Files.exists(file));
            assertEquals(List.of(), keys(a, FlagKind.SIZE_GROWS), demo);
            assertEquals(List.of(), keys(a, FlagKind.ODD_SIZE), demo);
        }
    }
}
