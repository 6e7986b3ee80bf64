package org.scalewright.app.archive;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.ObjectBinding;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.TypedEntry;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.archive.Archive;
import org.scalewright.archive.ArchiveLocation;
import org.scalewright.archive.ArchivedBreak;
import org.scalewright.archive.Instrument;
import org.scalewright.archive.Job;
import org.scalewright.archive.JudgedBreak;
import org.scalewright.archive.ScaleVersion;
import org.scalewright.archive.VersionLabel;
import org.scalewright.model.BreakActivity;
import org.scalewright.model.BreakPlace;
import org.scalewright.model.InvalidInput;
import org.scalewright.model.KeyNames;
import org.scalewright.model.NumberText;
import org.scalewright.model.PitchStandard;
import org.scalewright.model.Scale;
import org.scalewright.model.StringBreak;
import org.scalewright.model.WorkDate;

/**
 * The instruments panel: the workshop archive's instruments, the chosen one's scale versions, jobs
 * and broken strings. Opens a version as the working scale or as the reference, saves the working
 * scale as a new version, logs a job (its pitch standard and strength table start as the working
 * ones) and logs a break on the selected key. The archive is opened for each action and closed after
 * it, so a command run at the same time sees every change.
 */
public final class ArchiveViewModel {
    /** One scale version as the panel lists it. */
    public record VersionRow(int number, String date, String label, String from, String title) {
    }

    /** One job as the panel lists it; blank where not recorded. */
    public record JobRow(String date, String kind, String a4, String table, String version, String notes) {
    }

    /** A choice of the version a job worked to: a version's number and label, or none (blank). */
    public record VersionChoice(OptionalInt number, String text) {
        static final VersionChoice NONE = new VersionChoice(OptionalInt.empty(), "");
    }

    /** One break as the panel lists it. */
    public record BreakRow(int key, String note, String date, String string, String hz, String stressMpa,
                           String ratio, String during, String place, String remark) {
    }

    private final ScaleSession session;
    private final UserPrompts prompts;
    private final BooleanSupplier settleUnsaved;
    private final Consumer<Path> remember;
    private final ObjectProperty<Path> file;
    private final ObservableList<String> instruments = FXCollections.observableArrayList();
    private final StringProperty instrument = new SimpleStringProperty("");
    private final ObservableList<VersionRow> versions = FXCollections.observableArrayList();
    private final ObservableList<BreakRow> breaks = FXCollections.observableArrayList();
    private final StringProperty newInstrument = new SimpleStringProperty("");
    private final StringProperty label = new SimpleStringProperty(VersionLabel.PLANNED);
    private final StringProperty date = new SimpleStringProperty(LocalDate.now().toString());
    private final StringProperty pitch = new SimpleStringProperty("");
    private final StringProperty string = new SimpleStringProperty("");
    private final ObjectProperty<BreakActivity> during = new SimpleObjectProperty<>(BreakActivity.UNKNOWN);
    private final ObjectProperty<BreakPlace> place = new SimpleObjectProperty<>(BreakPlace.UNKNOWN);
    private final StringProperty remark = new SimpleStringProperty("");
    private final ObservableList<JobRow> jobs = FXCollections.observableArrayList();
    private final ObservableList<VersionChoice> jobVersions = FXCollections.observableArrayList(VersionChoice.NONE);
    private final StringProperty jobKind = new SimpleStringProperty("");
    private final StringProperty jobDate = new SimpleStringProperty(LocalDate.now().toString());
    private final StringProperty jobA4 = new SimpleStringProperty("");
    private final StringProperty jobTable = new SimpleStringProperty("");
    private final StringProperty jobNotes = new SimpleStringProperty("");
    private final ObjectProperty<VersionChoice> jobVersion = new SimpleObjectProperty<>(VersionChoice.NONE);
    /** The working A4, Hz: the job form's pitch follows it when it changes (held here, bindings are weak). */
    private final ObjectBinding<Double> workingA4;
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper caution = new ReadOnlyStringWrapper("");
    private final ReadOnlyStringWrapper description = new ReadOnlyStringWrapper("");
    /** The version the working scale came from, when it came from the archive (for "derived from"). */
    private OptionalInt openedVersion = OptionalInt.empty();

    /**
     * @param archive       the archive file to start with
     * @param settleUnsaved asks about unsaved changes before a version replaces the working scale;
     *                      false when the user cancelled
     * @param remember      keeps a file the user chose for the next start
     */
    public ArchiveViewModel(ScaleSession session, UserPrompts prompts, Path archive, BooleanSupplier settleUnsaved,
                            Consumer<Path> remember) {
        this.session = session;
        this.prompts = prompts;
        this.settleUnsaved = settleUnsaved;
        this.remember = remember;
        this.file = new SimpleObjectProperty<>(archive);
        instrument.addListener((o, was, now) -> {
            jobVersion.set(VersionChoice.NONE); // a version number names a version of one instrument only
            refreshInstrument();
        });
        during.addListener((o, was, now) -> caution.set(now.underRisingTension() ? "Caution: a string breaking "
                + "during a pitch raise or while being brought up can whip and its wire ends cut. Wear eye "
                + "protection and raise a large pitch change in stages." : ""));
        workingA4 = Bindings.createObjectBinding(() -> session.scale().pitch().a4(), session.scaleProperty());
        // the job form follows the working A4 and table while it shows them, never over what was typed
        workingA4.addListener((o, was, now) -> {
            if (was == null || NumberText.plain(was).equals(Objects.toString(jobA4.get(), "").strip())) {
                jobA4.set(NumberText.plain(now));
            }
        });
        session.settingsProperty().addListener((o, was, now) -> {
            if (was == null || was.strength().name().equals(Objects.toString(jobTable.get(), "").strip())) {
                jobTable.set(now.strength().name());
            }
        });
        startJobForm();
    }

    // ---- the archive and its instruments

    /** Opens the archive (creating it where it does not exist yet) and lists its instruments. */
    public boolean refresh() {
        return act(a -> {
            List<String> names = a.instruments().stream().map(Instrument::name).toList();
            String keep = instrument.get();
            instruments.setAll(names);
            if (names.contains(keep)) {
                refreshInstrument();
            } else {
                instrument.set(names.isEmpty() ? "" : names.get(0));
            }
            return true;
        }, null);
    }

    /** Asks for another archive file, remembers it and lists its instruments. */
    public boolean chooseArchive() {
        return prompts.chooseArchiveFile().map(this::useArchive).orElse(false);
    }

    /** Uses {@code other} as the archive from now on. */
    public boolean useArchive(Path other) {
        Path before = file.get();
        file.set(other);
        jobVersion.set(VersionChoice.NONE);
        if (refresh()) {
            remember.accept(other);
            return true;
        }
        file.set(before);
        return false;
    }

    /** Adds the instrument named in {@link #newInstrumentProperty()} and chooses it. */
    public boolean addInstrument() {
        String name = newInstrument.get() == null ? "" : newInstrument.get().strip();
        return act(a -> {
            a.addInstrument(Instrument.named(name));
            newInstrument.set("");
            instruments.setAll(a.instruments().stream().map(Instrument::name).toList());
            instrument.set(name);
            return true;
        }, "added instrument '" + name + "'");
    }

    private void refreshInstrument() {
        String name = instrument.get();
        if (name == null || name.isEmpty()) {
            versions.clear();
            breaks.clear();
            jobs.clear();
            jobVersions.setAll(VersionChoice.NONE);
            description.set("");
            return;
        }
        act(a -> {
            description.set(a.instrument(name).description());
            List<ScaleVersion> all = a.versions(name);
            versions.setAll(all.stream().map(v -> new VersionRow(v.number(), v.date().toString(), v.label(),
                    v.derivedFrom().isPresent() ? Integer.toString(v.derivedFrom().getAsInt()) : "",
                    a.scaleOf(name, v).title())).toList());
            breaks.setAll(JudgedBreak.all(a, name, session.settingsProperty().get()).stream()
                    .map(ArchiveViewModel::row).toList());
            jobs.setAll(a.jobs(name).stream().map(ArchiveViewModel::row).toList());
            // the list replaced at once, then the choice kept as the list's own entry: the box shows it
            VersionChoice chosen = jobVersion.get();
            List<VersionChoice> choices = new ArrayList<>(List.of(VersionChoice.NONE));
            all.forEach(v -> choices.add(new VersionChoice(OptionalInt.of(v.number()), v.numberAndLabel())));
            jobVersions.setAll(choices);
            jobVersion.set(choices.contains(chosen) ? choices.get(choices.indexOf(chosen)) : VersionChoice.NONE);
            return true;
        }, null);
    }

    private static BreakRow row(JudgedBreak j) {
        StringBreak b = j.archived().record();
        return new BreakRow(b.key(), KeyNames.name(b.key()), b.date().toString(),
                b.string().isPresent() ? Integer.toString(b.string().getAsInt()) : "",
                b.breakHz().isPresent() ? NumberText.plain(b.breakHz().getAsDouble()) : "",
                j.stress().map(s -> NumberText.fixed(s.stress() / 1e6, 0)).orElse(""),
                j.stress().map(s -> NumberText.fixed(s.ratio(), 2)).orElse(""), b.during().word(), b.place().word(),
                b.remark());
    }

    private static JobRow row(Job j) {
        return new JobRow(j.date().toString(), j.kind(), j.a4().isPresent() ? NumberText.plain(j.a4().getAsDouble())
                : "", j.strengthTable(), j.version().isPresent() ? Integer.toString(j.version().getAsInt()) : "",
                j.notes());
    }

    // ---- versions

    /** Opens a version as the working scale (after settling unsaved changes). */
    public boolean openVersion(int number) {
        String name = instrument.get();
        return act(a -> {
            ScaleVersion v = a.version(name, number);
            Scale scale = a.scaleOf(name, v);
            if (!settleUnsaved.getAsBoolean()) {
                return false;
            }
            session.openUnfiled(scale, versionName(name, v));
            openedVersion = OptionalInt.of(number);
            return true;
        }, null);
    }

    /** Makes a version the reference scale the working one is drawn over. */
    public boolean useAsReference(int number) {
        String name = instrument.get();
        return act(a -> {
            ScaleVersion v = a.version(name, number);
            session.useAsReference(a.scaleOf(name, v), versionName(name, v));
            return true;
        }, null);
    }

    /**
     * Saves the working scale as the instrument's next version, labelled {@link #labelProperty()},
     * derived from the version it was opened from (if it was).
     */
    public boolean saveWorkingScale() {
        String name = instrument.get();
        Scale scale = session.scale();
        if (scale.notes().isEmpty()) {
            return refuse("the working scale is empty: open a sheet or a version first");
        }
        return act(a -> {
            ScaleVersion v = a.saveVersion(name, scale, label.get(), openedVersion, LocalDate.now());
            refreshInstrument();
            message.set("saved the working scale as version " + v.number() + " of '" + name + "' (" + v.label()
                    + ")");
            return true;
        }, null);
    }

    private static String versionName(String name, ScaleVersion v) {
        return name + ", version " + v.numberAndLabel();
    }

    // ---- jobs

    /**
     * Logs a job on the chosen instrument from the job form: its kind (required), date, notes, the
     * pitch standard (blank: not recorded; checked as the A4 field above checks it), the strength
     * table's name and the version worked to. A refusal changes nothing.
     */
    public boolean logJob() {
        String name = instrument.get();
        Job job;
        try {
            job = new Job(WorkDate.parse(jobDate.get(), LocalDate.now()), jobKind.get(), jobNotes.get(), jobPitch(),
                    jobTable.get(), jobVersion.get() == null ? OptionalInt.empty() : jobVersion.get().number());
        } catch (InvalidInput e) {
            return refuse(e.getMessage());
        }
        return act(a -> {
            a.logJob(name, job);
            refreshInstrument();
            jobKind.set("");
            jobNotes.set("");
            startJobForm();
            message.set(job.loggedOn(name));
            return true;
        }, null);
    }

    private OptionalDouble jobPitch() {
        OptionalDouble typed = TypedEntry.optional(jobA4.get(), "A4", "Hz");
        return typed.isEmpty() ? typed : OptionalDouble.of(PitchStandard.of(typed.getAsDouble()).a4());
    }

    /** The job form's pitch standard and strength table as the working ones. */
    private void startJobForm() {
        jobA4.set(NumberText.plain(workingA4.get()));
        jobTable.set(session.settingsProperty().get().strength().name());
    }

    // ---- breaks

    /** Logs a break on the key selected in the note table, with the entries of the break form. */
    public boolean logBreakOnSelectedKey() {
        Integer key = session.selectedKeyProperty().get();
        if (key == null) {
            return refuse("select the key of the broken string in the note table first");
        }
        String name = instrument.get();
        StringBreak b;
        try {
            b = new StringBreak(WorkDate.parse(date.get(), LocalDate.now()), key, parseString(), parsePitch(),
                    during.get(), place.get(), "", remark.get());
        } catch (InvalidInput e) {
            return refuse(e.getMessage());
        }
        return act(a -> {
            ArchivedBreak kept = a.logBreak(name, b, OptionalInt.empty());
            refreshInstrument();
            pitch.set("");
            remark.set("");
            message.set("logged a break on key " + key + " " + KeyNames.name(key) + (kept.version().isPresent()
                    ? ", judged on version " + kept.version().getAsInt() : ""));
            return true;
        }, null);
    }

    private OptionalInt parseString() {
        String s = string.get() == null ? "" : string.get().strip();
        if (s.isEmpty()) {
            return OptionalInt.empty();
        }
        try {
            return OptionalInt.of(Integer.parseInt(s));
        } catch (NumberFormatException e) {
            throw new InvalidInput("which string of the unison must be 1, 2 or 3, was '" + s + "'");
        }
    }

    private OptionalDouble parsePitch() {
        return TypedEntry.optional(pitch.get(), "pitch at break", "Hz");
    }

    /** Runs one action on the archive; a refusal is shown as the panel's problem and changes nothing. */
    private boolean act(Function<Archive, Boolean> action, String done) {
        problem.set("");
        Path p = file.get();
        try {
            if (p.equals(ArchiveLocation.defaultFile())) {
                ArchiveLocation.createFolderOf(p);
            }
            boolean ok;
            try (Archive a = Archive.openOrCreate(p)) {
                ok = action.apply(a);
            }
            if (ok && done != null) {
                message.set(done);
            }
            return ok;
        } catch (InvalidInput e) {
            return refuse(e.getMessage());
        } catch (RuntimeException e) {
            return refuse("the archive failed: " + e.getMessage());
        }
    }

    /** Shows a refusal as the panel's problem, in place of the last success line; @return false */
    private boolean refuse(String why) {
        message.set("");
        problem.set(why);
        return false;
    }

    // ---- properties

    public ObjectProperty<Path> fileProperty() {
        return file;
    }

    public ObservableList<String> instruments() {
        return instruments;
    }

    public StringProperty instrumentProperty() {
        return instrument;
    }

    public ObservableList<VersionRow> versions() {
        return versions;
    }

    public ObservableList<BreakRow> breaks() {
        return breaks;
    }

    public StringProperty newInstrumentProperty() {
        return newInstrument;
    }

    public StringProperty labelProperty() {
        return label;
    }

    public StringProperty dateProperty() {
        return date;
    }

    public StringProperty pitchProperty() {
        return pitch;
    }

    public StringProperty stringProperty() {
        return string;
    }

    public ObjectProperty<BreakActivity> duringProperty() {
        return during;
    }

    public ObjectProperty<BreakPlace> placeProperty() {
        return place;
    }

    public StringProperty remarkProperty() {
        return remark;
    }

    public ObservableList<JobRow> jobs() {
        return jobs;
    }

    /** @return the versions a job may name as worked to, none first */
    public ObservableList<VersionChoice> jobVersions() {
        return jobVersions;
    }

    public StringProperty jobKindProperty() {
        return jobKind;
    }

    public StringProperty jobDateProperty() {
        return jobDate;
    }

    /** @return the job's pitch standard as typed, A4 in Hz; blank when not recorded */
    public StringProperty jobA4Property() {
        return jobA4;
    }

    /** @return the name of the strength table the job used; blank when not recorded */
    public StringProperty jobTableProperty() {
        return jobTable;
    }

    public StringProperty jobNotesProperty() {
        return jobNotes;
    }

    public ObjectProperty<VersionChoice> jobVersionProperty() {
        return jobVersion;
    }

    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** @return the chosen instrument's description in words (maker, model, serial, owner, place); "" when none */
    public ReadOnlyStringProperty descriptionProperty() {
        return description.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty cautionProperty() {
        return caution.getReadOnlyProperty();
    }

    /** @return the key selected in the note table, as the break form names it */
    public ReadOnlyStringProperty selectedKeyText() {
        ReadOnlyStringWrapper text = new ReadOnlyStringWrapper();
        text.bind(Bindings.createStringBinding(() -> {
            Integer k = session.selectedKeyProperty().get();
            return k == null ? "(select a key in the note table)" : k + " " + KeyNames.name(k);
        }, session.selectedKeyProperty()));
        return text.getReadOnlyProperty();
    }
}
