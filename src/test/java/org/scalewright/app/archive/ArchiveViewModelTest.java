package org.scalewright.app.archive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.scalewright.app.WorkstationViewModel;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.ScriptedPrompts;
import org.scalewright.app.session.TestSheets;
import org.scalewright.archive.Archive;
import org.scalewright.archive.Job;

/** The instruments panel through its view model, on a real archive file, without a display. */
class ArchiveViewModelTest {
    @TempDir
    Path dir;
    private final ScriptedPrompts prompts = new ScriptedPrompts();
    private final List<Path> remembered = new ArrayList<>();
    private WorkstationViewModel window;
    private ArchiveViewModel archive;
    private int settled;

    @BeforeEach
    void openTheDemoGrand() {
        window = new WorkstationViewModel(new ScaleSession(), prompts);
        assertTrue(window.openSheet(TestSheets.demoGrand(), false));
        archive = new ArchiveViewModel(window.session(), prompts, dir.resolve("a.db"), () -> {
            settled++;
            return true;
        }, remembered::add);
    }

    @Test
    void saveTheWorkingScaleOpenItAgainAndUseAVersionAsReference() {
        assertTrue(archive.refresh(), archive.problemProperty().get());
        assertTrue(Files.exists(dir.resolve("a.db")), "the archive is created on first use");
        archive.newInstrumentProperty().set("grand-190");
        assertTrue(archive.addInstrument(), archive.problemProperty().get());
        assertEquals("grand-190", archive.instrumentProperty().get());
        archive.labelProperty().set("as-measured");
        assertTrue(archive.saveWorkingScale(), archive.problemProperty().get());
        assertEquals(1, archive.versions().size());
        assertEquals("as measured", archive.versions().get(0).label());

        assertTrue(archive.openVersion(1), archive.problemProperty().get());
        assertEquals(1, settled, "unsaved changes are settled before a version replaces the working scale");
        assertEquals("grand-190, version 1 (as measured)", window.session().documentNameProperty().get());
        archive.labelProperty().set("planned");
        assertTrue(archive.saveWorkingScale());
        assertEquals("1", archive.versions().get(1).from(), "derived from the version it was opened from");
        assertTrue(archive.useAsReference(1));
        assertEquals("grand-190, version 1 (as measured)", window.session().referenceNameProperty().get());
    }

    @Test
    void aBreakNeedsASelectedKeyAndSaneEntries() throws Exception {
        archive.refresh();
        archive.newInstrumentProperty().set("grand-190");
        archive.addInstrument();
        archive.labelProperty().set("as measured");
        archive.saveWorkingScale();
        byte[] before = Files.readAllBytes(dir.resolve("a.db"));
        assertFalse(archive.logBreakOnSelectedKey());
        assertTrue(archive.problemProperty().get().contains("select the key"), archive.problemProperty().get());
        window.session().selectedKeyProperty().set(66);
        archive.pitchProperty().set("0");
        assertFalse(archive.logBreakOnSelectedKey());
        assertTrue(archive.problemProperty().get().contains("pitch at break must be more than 0"));
        archive.pitchProperty().set("1178");
        archive.dateProperty().set("2026-31-12");
        assertFalse(archive.logBreakOnSelectedKey());
        assertTrue(archive.problemProperty().get().contains("YYYY-MM-DD"));
        assertEquals(List.of(), archive.breaks());
        assertTrue(java.util.Arrays.equals(before, Files.readAllBytes(dir.resolve("a.db"))), "nothing written");
        archive.dateProperty().set("2026-11-10");
        assertTrue(archive.logBreakOnSelectedKey(), archive.problemProperty().get());
        assertEquals(1, archive.breaks().size());
        assertEquals("66", Integer.toString(archive.breaks().get(0).key()));
        try (Archive a = Archive.open(dir.resolve("a.db"))) {
            assertEquals(1, a.breaks("grand-190").size());
        }
    }

    @Test
    void anotherArchiveFileIsRememberedAndABadOneRefused() throws Exception {
        Path notArchive = dir.resolve("notes.txt");
        Files.writeString(notArchive, "not a database");
        assertFalse(archive.useArchive(notArchive));
        assertTrue(archive.problemProperty().get().contains("not a Scalewright archive"));
        assertEquals(dir.resolve("a.db"), archive.fileProperty().get(), "the archive in use is kept");
        assertEquals(List.of(), remembered);
        assertTrue(archive.useArchive(dir.resolve("other.db")));
        assertEquals(List.of(dir.resolve("other.db")), remembered);
    }

    private void aGrandWithOneVersion() {
        assertTrue(archive.refresh(), archive.problemProperty().get());
        archive.newInstrumentProperty().set("grand-190");
        assertTrue(archive.addInstrument(), archive.problemProperty().get());
        archive.labelProperty().set("as strung");
        assertTrue(archive.saveWorkingScale(), archive.problemProperty().get());
    }

    @Test
    void aJobIsLoggedWithThePitchAndTableOfTheWorkAndListed() throws Exception {
        aGrandWithOneVersion();
        String table = window.session().settingsProperty().get().strength().name();
        assertEquals("440", archive.jobA4Property().get(), "the form starts from the working A4");
        assertEquals(table, archive.jobTableProperty().get(), "and from the working strength table");
        assertEquals(List.of("", "1 (as strung)"), archive.jobVersions().stream().map(v -> v.text()).toList());
        archive.jobKindProperty().set("restringing");
        archive.jobDateProperty().set("2026-11-20");
        archive.jobNotesProperty().set("treble section, new wire");
        archive.jobVersionProperty().set(archive.jobVersions().get(1));
        assertTrue(archive.logJob(), archive.problemProperty().get());

        assertEquals(List.of(new ArchiveViewModel.JobRow("2026-11-20", "restringing", "440", table, "1",
                "treble section, new wire")), archive.jobs());
        try (Archive a = Archive.open(dir.resolve("a.db"))) {
            assertEquals(List.of(new Job(LocalDate.of(2026, 11, 20), "restringing", "treble section, new wire",
                    OptionalDouble.of(440), table, OptionalInt.of(1))), a.jobs("grand-190"));
        }
        assertEquals("", archive.jobKindProperty().get(), "the form is ready for the next job");
        assertEquals("", archive.jobNotesProperty().get());
        assertTrue(archive.messageProperty().get().contains("logged job 'restringing'"),
                archive.messageProperty().get());
    }

    @Test
    void aJobWithoutItsKindOrWithAPitchOutOfRangeIsRefusedAndNothingWritten() throws Exception {
        aGrandWithOneVersion();
        byte[] before = Files.readAllBytes(dir.resolve("a.db"));
        assertFalse(archive.logJob());
        assertTrue(archive.problemProperty().get().contains("a job needs its kind"), archive.problemProperty().get());
        archive.jobKindProperty().set("pitch raise");
        archive.jobA4Property().set("1200");
        assertFalse(archive.logJob());
        assertEquals("pitch standard A4 must be 300 to 600 Hz, was 1200", archive.problemProperty().get(),
                "the same words as the A4 field above and the command line");
        archive.jobA4Property().set("four-forty");
        assertFalse(archive.logJob());
        assertEquals("A4: expected a number in Hz, was 'four-forty'", archive.problemProperty().get());
        archive.jobA4Property().set("440");
        archive.jobDateProperty().set("2026-31-12");
        assertFalse(archive.logJob());
        assertTrue(archive.problemProperty().get().contains("YYYY-MM-DD"), archive.problemProperty().get());
        assertEquals(List.of(), archive.jobs());
        assertTrue(Arrays.equals(before, Files.readAllBytes(dir.resolve("a.db"))), "nothing written");

        archive.jobDateProperty().set("2026-12-01");
        archive.jobA4Property().set("442,5 Hz");
        archive.jobTableProperty().set("");
        assertTrue(archive.logJob(), archive.problemProperty().get());
        try (Archive a = Archive.open(dir.resolve("a.db"))) {
            Job j = a.jobs("grand-190").get(0);
            assertEquals(OptionalDouble.of(442.5), j.a4(), "a decimal comma and the unit are taken, as in every field");
            assertEquals("", j.strengthTable(), "a blank table is not recorded");
            assertEquals(OptionalInt.empty(), j.version(), "no version chosen");
        }
    }

    @Test
    void theJobFormFollowsTheWorkingPitchAndTheChosenInstrument() {
        aGrandWithOneVersion();
        assertTrue(window.session().setA4(442));
        assertEquals("442", archive.jobA4Property().get());
        archive.jobKindProperty().set("tuning");
        assertTrue(archive.logJob(), archive.problemProperty().get());
        archive.newInstrumentProperty().set("upright");
        assertTrue(archive.addInstrument(), archive.problemProperty().get());
        assertEquals(List.of(), archive.jobs(), "the jobs listed are the chosen instrument's");
        assertEquals(List.of(""), archive.jobVersions().stream().map(v -> v.text()).toList());
        archive.instrumentProperty().set("grand-190");
        assertEquals(1, archive.jobs().size());
    }

    @Test
    void theChosenInstrumentIsDescribedInWords() throws Exception {
        try (Archive a = Archive.create(dir.resolve("a.db"))) {
            a.addInstrument(new org.scalewright.archive.Instrument("grand-190", "Marrowby & Fenn", "190", "40117",
                    "", "the hall"));
            a.addInstrument(org.scalewright.archive.Instrument.named("upright"));
        }
        assertTrue(archive.refresh(), archive.problemProperty().get());
        assertEquals("grand-190", archive.instrumentProperty().get());
        assertEquals("Marrowby & Fenn, 190, serial 40117, at the hall", archive.descriptionProperty().get());
        archive.instrumentProperty().set("upright");
        assertEquals("", archive.descriptionProperty().get(), "an instrument given by name alone");
    }

    @Test
    void theVersionChosenForAJobStaysShownAndIsForgottenWithItsInstrument() {
        aGrandWithOneVersion();
        archive.jobVersionProperty().set(archive.jobVersions().get(1));
        archive.jobKindProperty().set("restringing");
        assertTrue(archive.logJob(), archive.problemProperty().get());
        assertSame(archive.jobVersions().get(1), archive.jobVersionProperty().get(),
                "after the list is made anew the choice is its own entry, so the box can show it");
        archive.newInstrumentProperty().set("upright");
        assertTrue(archive.addInstrument(), archive.problemProperty().get());
        assertEquals(OptionalInt.empty(), archive.jobVersionProperty().get().number(),
                "another instrument's version 1 is another version");
        archive.instrumentProperty().set("grand-190");
        assertEquals(OptionalInt.empty(), archive.jobVersionProperty().get().number());
    }

    @Test
    void aRefusalTakesThePlaceOfTheLastSuccessLine() {
        aGrandWithOneVersion();
        archive.jobKindProperty().set("tuning");
        assertTrue(archive.logJob(), archive.problemProperty().get());
        assertFalse(archive.messageProperty().get().isEmpty());
        assertFalse(archive.logJob(), "the kind was cleared for the next job");
        assertEquals("", archive.messageProperty().get(), "no success line beside the refusal");
        assertFalse(archive.problemProperty().get().isEmpty());
    }

    @Test
    void aTypedPitchOrTableIsNeverOverwrittenByTheWorkingOne() {
        aGrandWithOneVersion();
        archive.jobA4Property().set("435");
        archive.jobTableProperty().set("the maker's table of 1962");
        assertTrue(window.session().setA4(442));
        assertEquals("435", archive.jobA4Property().get(), "typed, so kept");
        window.session().setStrength(org.scalewright.app.session.StrengthChoice.maximum());
        assertEquals("the maker's table of 1962", archive.jobTableProperty().get(), "typed, so kept");
        archive.jobA4Property().set("442");
        assertTrue(window.session().setA4(443));
        assertEquals("443", archive.jobA4Property().get(), "showing the working A4, so it follows");
    }
}
