package org.scalewright.app.tool;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.scalewright.app.curves.CurvesViewModel;
import org.scalewright.app.session.CsvFileNames;
import org.scalewright.app.session.ScaleSession;
import org.scalewright.app.session.UserPrompts;
import org.scalewright.chart.CurveOverlay;
import org.scalewright.io.CsvDialect;
import org.scalewright.io.TableFiles;

/**
 * The life of one tool's result in the window, the same for every tool that computes a report
 * from the working scale: entries that cannot be read are named and nothing changes; a result is
 * shown with its marks on the curves under the tool's name; an edit of the scale or its settings
 * makes the result stale and takes its marks down; the result is written as CSV to a file the
 * user chooses; clearing takes it all away.
 *
 * @param <R> the tool's report record
 */
public final class ToolResult<R> {
    /**
     * The CSV form of a report.
     *
     * @param comments the header comment lines of a report
     * @param header   the column names
     * @param rows     the rows of a report
     */
    public record CsvForm<R>(Function<R, List<String>> comments, List<String> header,
                             Function<R, List<List<String>>> rows) {
    }

    private final ScaleSession session;
    private final UserPrompts prompts;
    private final CurvesViewModel curves;
    private final String toolName;
    private final ReadOnlyObjectWrapper<R> report = new ReadOnlyObjectWrapper<>();
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper("");
    private final ReadOnlyBooleanWrapper stale = new ReadOnlyBooleanWrapper();

    /**
     * @param toolName the tool in words ({@code diagnosis}, {@code wire check}): the owner of its
     *                 curve marks and the subject of its messages
     */
    public ToolResult(ScaleSession session, UserPrompts prompts, CurvesViewModel curves, String toolName) {
        this.session = session;
        this.prompts = prompts;
        this.curves = curves;
        this.toolName = toolName;
        session.analysisProperty().addListener((o, a, b) -> markStale());
    }

    /** @return the shown result, or null */
    public R get() {
        return report.get();
    }

    public ReadOnlyObjectProperty<R> reportProperty() {
        return report.getReadOnlyProperty();
    }

    /** @return what was wrong with the entries of the last try, or empty */
    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    /** @return true when the scale or settings changed after the result was made (its marks are taken down) */
    public ReadOnlyBooleanProperty staleProperty() {
        return stale.getReadOnlyProperty();
    }

    /**
     * Names the entries that could not be read; the shown result stays.
     *
     * @return false, so a tool can {@code return result.refuse(bad);}
     */
    public boolean refuse(List<String> bad) {
        problem.set(String.join("; ", bad));
        session.complain(toolName + ": " + String.join("; ", bad));
        return false;
    }

    /** Shows a new result with its marks on the curves (none: the tool's marks are taken down). */
    public void show(R r, List<CurveOverlay> marks) {
        report.set(r);
        stale.set(false);
        problem.set("");
        if (marks.isEmpty()) {
            curves.overlays().remove(toolName);
        } else {
            curves.overlays().put(toolName, List.copyOf(marks));
        }
    }

    /** Takes the result and its marks away. */
    public void clear() {
        report.set(null);
        stale.set(false);
        curves.overlays().remove(toolName);
    }

    /** Selects a key of the result (the table and curves follow). */
    public void select(int key) {
        session.selectedKeyProperty().set(key);
    }

    /**
     * Writes the result as CSV to a file the user chooses; a failure is shown and nothing else changes.
     *
     * @param suggestedName the file name offered
     * @return true when the file was written
     */
    public boolean exportCsv(String suggestedName, CsvForm<R> form) {
        R r = report.get();
        if (r == null) {
            session.complain("run the " + toolName + " before exporting it");
            return false;
        }
        Optional<Path> chosen = prompts.chooseExportFile("Save the " + toolName + " as CSV", suggestedName, "csv");
        if (chosen.isEmpty()) {
            return false;
        }
        Path file = CsvFileNames.withCsvExtension(chosen.get());
        try {
            // a name ending in .xlsx gives a workbook (io.TableFiles), any other CSV
            TableFiles.write(file, "results", form.comments().apply(r), form.header(), form.rows().apply(r),
                    CsvDialect.PLAIN, false);
            session.inform("wrote the " + toolName + " to " + file);
            return true;
        } catch (IOException | RuntimeException e) {
            String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            String title = Character.toUpperCase(toolName.charAt(0)) + toolName.substring(1) + " not saved";
            prompts.showError(title, "Could not write " + file + ": " + why);
            session.complain(toolName + " not saved: " + why);
            return false;
        }
    }

    private void markStale() {
        if (report.get() != null && !stale.get()) {
            stale.set(true);
            curves.overlays().remove(toolName);
        }
    }
}
