package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Component;
import java.awt.Container;
import java.awt.Window;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JProgressBar;
import javax.swing.JTable;
import javax.swing.SwingWorker;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;
import org.finstack.coil.CoilModels;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.Rating;
import org.finstack.report.ProjectReport;
import org.finstack.study.Constraints;
import org.finstack.study.Progress;
import org.finstack.study.Option;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.explain.Explanation;
import org.finstack.study.explain.Sensitivity;
import org.finstack.study.search.CandidateResult;
import org.finstack.study.search.CandidateSearch;
import org.finstack.study.search.SearchResult;
import org.finstack.ui.draw.Tornado;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The workbench's studies, driven as a user would on the demo project: the candidate search
 * lists the same ranking as study.search run directly, its first row's capacity is that of a
 * single rating of the candidate, Cancel stops it, and the chosen candidate becomes a new option
 * (undone by Undo); a change of the project's conditions or constraints marks the list out of
 * date until the next search; a bad limit is refused naming the field; the sensitivity tab's
 * tornado holds the inputs largest effect first, its first bar the largest effect of
 * study.explain run directly, and its Cancel leaves no result and the run button enabled; File
 * &gt; Export report writes a one-page PDF with the existing coil's name in it, its Cancel (in the
 * export's progress window) writes nothing, says so and leaves the next export working, and a file
 * that cannot be written is told in a dialog with the reason. A repaint manager fails any Swing access
 * off the event thread. Skipped without a display (CI runs it under Xvfb).
 */
class WorkbenchStudyGuiTest extends WorkbenchGuiFixture {

    private static final int SEARCH_TAB = 6;
    private static final int SENSITIVITY_TAB = 7;

    @TempDir
    Path dir;

    /** Opens the Search tab, lists the best five and waits for the result. */
    private SearchPanel searchTheBestFive() {
        window.tabbedPane("tabs").selectTab(SEARCH_TAB);
        SearchPanel panel = (SearchPanel) window.panel("study.search").target();
        window.textBox("study.search.limit").setText("5");
        window.button("study.search.run").click();
        awaitCondition("searched", () -> !panel.running() && panel.result() != null);
        return panel;
    }

    @Test
    void searchListsTheRankingAndAddsTheChosenCandidateAsAnOption() {
        assertThat(onEdt(() -> frame.tabs().getTitleAt(SEARCH_TAB))).isEqualTo(Messages.get("study.tab.search"));
        SearchPanel panel = searchTheBestFive();
        // the reference: study.search run directly on the same project, and one candidate rated alone
        Project p = Workbench.demo();
        SearchResult expected = CandidateSearch.run(p, Progress.NONE);
        List<CandidateResult> shown = onEdt(panel::shown);
        assertThat(shown).extracting(c -> c.candidate().name()).containsExactlyElementsOf(
                expected.candidates().subList(0, 5).stream().map(c -> c.candidate().name()).toList());
        CandidateResult first = expected.candidates().get(0);
        Rating alone = CoilModels.rate(p.conditions().caseFor(first.candidate().coil()));
        assertThat(shown.get(0).capacity()).isEqualTo(first.capacity()).isEqualTo(alone.capacity());
        JTable table = window.table("study.search.table").target();
        window.table("study.search.table").requireRowCount(5);
        assertThat(cell(table, 0, "candidate")).isEqualTo(first.candidate().name());
        assertThat(cell(table, 0, "capacity")).isEqualTo(Quantities.format(alone.capacity(), Dimension.HEAT_FLOW,
                UnitSystem.SI));
        assertThat(cell(table, 0, "airPressureDrop")).isEqualTo(Quantities.format(alone.airPressureDrop(),
                Dimension.PRESSURE_DIFFERENCE, UnitSystem.SI));
        assertThat(cell(table, 0, "meets")).isEqualTo(Messages.get(first.meetsRequirement() ? "study.search.yes"
                : "study.search.no"));
        assertThat(cell(table, 0, "mass")).isEqualTo(Quantities.format(alone.geometry().metalMass(), Dimension.MASS,
                UnitSystem.SI));
        for (int r = 0; r < 5; r++) {
            for (int c = 0; c < table.getColumnCount(); c++) {
                int row = r;
                int col = c;
                assertThat(onEdt(() -> table.getValueAt(row, col).toString())).doesNotContain("NaN");
            }
        }
        window.label("study.search.requirement").requireText(Messages.format("study.search.requirement",
                Quantities.format(expected.requirement().capacity(), Dimension.HEAT_FLOW, UnitSystem.SI),
                expected.requirement().basis()));
        shot("15-search");
        window.button("study.search.add").requireDisabled();
        window.table("study.search.table").selectRows(0);
        window.button("study.search.add").click();
        awaitCondition("added", () -> frame.model().project().allOptions().size() == 3);
        assertThat(onEdt(() -> frame.model().option().name())).isEqualTo(first.candidate().name());
        assertThat(onEdt(() -> frame.model().option().coil())).isEqualTo(first.candidate().coil());
        assertThat(onEdt(() -> frame.model().dirty())).isTrue();
        window.button("toolbar.undo").click();
        awaitCondition("undone", () -> frame.model().project().allOptions().size() == 2);
    }

    @Test
    void cancelStopsTheSearchAndListsNothing() {
        // a search before, whose rows must not stay behind as if they were the cancelled one's
        SearchPanel panel = searchTheBestFive();
        window.table("study.search.table").requireRowCount(5);
        GuiActionRunner.execute(() -> {
            panel.run();
            panel.cancel();
        });
        awaitCondition("stopped", () -> !panel.running());
        awaitCondition("no search thread left", () -> Thread.getAllStackTraces().keySet().stream()
                .noneMatch(t -> t.getName().equals("finstack-search") && t.isAlive()));
        assertThat(onEdt(panel::result)).isNull();
        window.table("study.search.table").requireRowCount(0);
        window.label("study.search.status").requireText(Messages.get("study.search.cancelled"));
        window.button("study.search.run").requireEnabled();
        window.button("study.search.cancel").requireDisabled();
    }

    @Test
    void changedConditionsOrConstraintsMarkTheListOutOfDateUntilSearchedAgain() {
        SearchPanel panel = searchTheBestFive();
        assertThat(onEdt(panel::outOfDate)).isFalse();
        // an edit that leaves conditions and constraints alone: adding a candidate as an option
        window.table("study.search.table").selectRows(0);
        window.button("study.search.add").click();
        awaitCondition("added", () -> frame.model().project().allOptions().size() == 3);
        assertThat(onEdt(panel::outOfDate)).isFalse();
        // the conditions, changed in the Conditions tab as a user would
        double t = onEdt(() -> frame.model().project().conditions().air().temperature());
        window.tabbedPane("tabs").selectTab(1);
        window.textBox("air.inletTemperature").setText(Quantities.format(t + 3, Dimension.TEMPERATURE,
                UnitSystem.SI));
        awaitCondition("conditions edited", () -> frame.model().project().conditions().air().temperature() != t);
        window.tabbedPane("tabs").selectTab(SEARCH_TAB);
        window.label("study.search.outOfDate").requireVisible().requireText(Messages.get("study.search.outOfDate"));
        window.table("study.search.table").requireRowCount(5);
        // undone, the list fits the conditions again; the constraints changed, it is out of date again
        window.button("toolbar.undo").click();
        awaitCondition("undone", () -> frame.model().project().conditions().air().temperature() == t);
        assertThat(onEdt(panel::outOfDate)).isFalse();
        GuiActionRunner.execute(() -> {
            Project p = frame.model().project();
            Constraints k = p.constraints();
            frame.model().edit(p.withConstraints(new Constraints(k.maxFaceWidth(), k.maxFaceHeight(), k.maxDepth(),
                    k.circuits(), k.requiredCapacity() + 1000, k.fanCurve(), k.room())), frame.model().selected());
        });
        assertThat(onEdt(panel::outOfDate)).isTrue();
        window.button("study.search.run").click();
        awaitCondition("searched again", () -> !panel.running() && panel.result() != null
                && panel.result().requirement().capacity() == frame.model().project().constraints().requiredCapacity());
        assertThat(onEdt(panel::outOfDate)).isFalse();
    }

    @Test
    void withoutARequiredCapacityAnEditOfTheExistingCoilMarksTheListOutOfDate() {
        // the requirement is then the existing coil's own capacity (CandidateSearch), so the list
        // was searched for that coil
        GuiActionRunner.execute(() -> {
            Project p = frame.model().project();
            Constraints k = p.constraints();
            frame.model().edit(p.withConstraints(new Constraints(k.maxFaceWidth(), k.maxFaceHeight(), k.maxDepth(),
                    k.circuits(), 0, k.fanCurve(), k.room())), frame.model().selected());
        });
        SearchPanel panel = searchTheBestFive();
        assertThat(onEdt(panel::outOfDate)).isFalse();
        GuiActionRunner.execute(() -> {
            Project p = frame.model().project();
            Option old = p.existing();
            frame.model().edit(p.withOption(0, new Option(old.name(), old.coil().withRows(old.coil().rows() + 1),
                    old.overrides())), frame.model().selected());
        });
        assertThat(onEdt(panel::outOfDate)).isTrue();
    }

    @Test
    void aBadLimitIsRefusedNamingTheField() {
        window.tabbedPane("tabs").selectTab(SEARCH_TAB);
        SearchPanel panel = (SearchPanel) window.panel("study.search").target();
        window.textBox("study.search.limit").setText("-3");
        window.button("study.search.run").click();
        assertThat(onEdt(panel::running)).isFalse();
        String status = window.label("study.search.status").text();
        assertThat(status).contains("study.search.limit").doesNotContain("Exception");
        window.textBox("study.search.limit").setText("lots");
        window.button("study.search.run").click();
        assertThat(window.label("study.search.status").text()).contains("study.search.limit");
        assertThat(onEdt(panel::result)).isNull();
    }

    @Test
    void sensitivityTornadoPutsTheLargestEffectFirst() {
        assertThat(onEdt(() -> frame.tabs().getTitleAt(SENSITIVITY_TAB)))
                .isEqualTo(Messages.get("study.tab.sensitivity"));
        window.tabbedPane("tabs").selectTab(SENSITIVITY_TAB);
        SensitivityPanel panel = (SensitivityPanel) window.panel("study.sensitivity").target();
        window.button("study.sensitivity.run").click();
        awaitCondition("stepped", () -> !panel.running() && panel.result() != null);
        Sensitivity.Result expected = Sensitivity.of(Workbench.demo().caseOf(0));
        List<Tornado.Bar> bars = onEdt(panel::bars);
        assertThat(bars).hasSize((int) expected.effects().stream().filter(Sensitivity.Effect::rated).count());
        for (int i = 1; i < bars.size(); i++) {
            assertThat(Math.abs(bars.get(i).value())).isLessThanOrEqualTo(Math.abs(bars.get(i - 1).value()));
        }
        Sensitivity.Effect largest = expected.effects().get(0);
        assertThat(bars.get(0).label()).isEqualTo(SensitivityPanel.label(largest.input()));
        assertThat(bars.get(0).value()).isEqualTo(100 * largest.capacityFraction());
        window.table("study.sensitivity.table").requireRowCount(expected.effects().size());
        assertThat(window.textBox("study.sensitivity.explanation").text())
                .contains(Explanation.forCoil(expected).get(0));
        shot("16-sensitivity");
    }

    @Test
    void cancelStopsTheStepsShowsNoResultAndReEnablesRun() {
        window.tabbedPane("tabs").selectTab(SENSITIVITY_TAB);
        SensitivityPanel panel = (SensitivityPanel) window.panel("study.sensitivity").target();
        window.button("study.sensitivity.cancel").requireDisabled();
        window.button("study.sensitivity.run").click();
        awaitCondition("stepped", () -> !panel.running() && panel.result() != null);
        // a second run, cancelled at once through the button: the earlier result goes too
        JButton cancel = window.button("study.sensitivity.cancel").target();
        boolean[] enabledWhileRunning = new boolean[2];
        GuiActionRunner.execute(() -> {
            panel.run();
            enabledWhileRunning[0] = cancel.isEnabled();
            enabledWhileRunning[1] = window.button("study.sensitivity.run").target().isEnabled();
            cancel.doClick();
        });
        assertThat(enabledWhileRunning).containsExactly(true, false);
        assertThat(onEdt(panel::running)).isFalse();
        Pause.pause(500);
        assertThat(onEdt(panel::result)).isNull();
        assertThat(onEdt(panel::bars)).isEmpty();
        window.table("study.sensitivity.table").requireRowCount(0);
        window.textBox("study.sensitivity.explanation").requireText("");
        window.label("study.sensitivity.status").requireText(Messages.get("study.sensitivity.cancelled"));
        window.button("study.sensitivity.run").requireEnabled();
        window.button("study.sensitivity.cancel").requireDisabled();
        JProgressBar bar = window.robot().finder().findByName(panel, "study.sensitivity.progress",
                JProgressBar.class, false);
        assertThat(onEdt(bar::isVisible)).isFalse();
        // and the tab works again
        window.button("study.sensitivity.run").click();
        awaitCondition("stepped again", () -> !panel.running() && panel.result() != null);
        assertThat(onEdt(bar::isVisible)).isFalse();
    }

    @Test
    void exportReportWritesTheOnePagePdf() throws IOException {
        window.menuItem("menu.file.export").requireEnabled();
        Path pdf = dir.resolve("c2-report.pdf");
        String[] status = new String[1];
        SwingWorker<Path, Void> w = onEdt(() -> ReportExport.write(frame, frame.model().project(),
                UnitSystem.SI, BandSettings.DEFAULT, pdf, ReportExport.kindOf(pdf, ProjectReport.Kind.HTML),
                s -> status[0] = s));
        awaitCondition("written", w::isDone);
        assertThat(pdf).exists();
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
            String text = new PDFTextStripper().getText(doc).replace('\u00a0', ' ');
            assertThat(text).contains(onEdt(() -> frame.model().project().existing().name()));
        }
        assertThat(onEdt(() -> status[0])).isEqualTo(Messages.format("menu.file.export.written", pdf));
    }

    @Test
    void aCancelledExportWritesNothingAndTheNextOneIsWritten() throws IOException {
        // a report that takes a while: every option rated tube by tube, with its capacity band
        Project demo = onEdt(() -> frame.model().project());
        RefrigerantSide r = demo.conditions().refrigerant();
        Project slow = demo.withConditions(demo.conditions().withRefrigerant(new RefrigerantSide(r.fluid(), r.duty(),
                r.saturationTemperature(), r.convention(), r.insideCoefficient(), r.liquidTemperature(),
                r.saturationTemperature() + 25, new RefrigerantSide.Target.Subcooling(3), RefrigerantSide.Model.TUBES,
                10)));
        Path pdf = dir.resolve("cancelled-report.pdf");
        String[] status = new String[1];
        SwingWorker<Path, Void> cancelled = onEdt(() -> {
            SwingWorker<Path, Void> w = ReportExport.write(frame, slow, UnitSystem.SI, BandSettings.DEFAULT, pdf,
                    ProjectReport.Kind.PDF, s -> status[0] = s);
            Window progress = exportWindow();
            assertThat(named(progress, "export.progress")).isInstanceOf(JProgressBar.class);
            ((JButton) named(progress, "export.cancel")).doClick(0);
            return w;
        });
        String said = Messages.format("menu.file.export.cancelled", pdf.getFileName());
        awaitCondition("cancelled", () -> said.equals(status[0]));
        assertThat(cancelled.isCancelled()).isTrue();
        assertThat(onEdt(() -> exportWindows().isEmpty())).as("progress window closed").isTrue();
        assertThat(pdf).doesNotExist();
        // and the workbench still exports
        Path next = dir.resolve("next-report.pdf");
        SwingWorker<Path, Void> w = onEdt(() -> ReportExport.write(frame, frame.model().project(), UnitSystem.SI,
                BandSettings.OFF, next, ProjectReport.Kind.PDF, s -> status[0] = s));
        String written = Messages.format("menu.file.export.written", next);
        awaitCondition("written", () -> w.isDone() && written.equals(status[0]));
        try (PDDocument doc = Loader.loadPDF(next.toFile())) {
            assertThat(doc.getNumberOfPages()).isEqualTo(1);
        }
        assertThat(pdf).doesNotExist();
        assertThat(onEdt(frame::busy)).isFalse();
    }

    @Test
    void aReportThatCannotBeWrittenIsToldInADialog() throws IOException {
        Path blocker = Files.writeString(dir.resolve("not-a-folder"), "x");
        Path html = blocker.resolve("report.html");
        onEdt(() -> ReportExport.write(frame, frame.model().project(), UnitSystem.SI, BandSettings.OFF, html,
                ReportExport.kindOf(html, ProjectReport.Kind.PDF), s -> { }));
        var pane = window.optionPane(Timeout.timeout(15_000));
        pane.requireErrorMessage();
        String message = onEdt(() -> pane.target().getMessage().toString());
        assertThat(message).startsWith(Messages.format("menu.file.export.failed", html, "").strip())
                .doesNotContain("\tat ").doesNotContain("Exception");
        pane.okButton().click();
        assertThat(Files.isRegularFile(html)).isFalse();
        assertThat(Files.readString(blocker)).isEqualTo("x");
    }

    // --- helpers ---

    /** @return the export's progress windows showing (asked on the event thread) */
    private List<Window> exportWindows() {
        return Arrays.stream(frame.getOwnedWindows()).filter(o -> "export.dialog".equals(o.getName())
                && o.isShowing()).toList();
    }

    /** @return the one export progress window showing (asked on the event thread) */
    private Window exportWindow() {
        List<Window> shown = exportWindows();
        assertThat(shown).as("export progress window").hasSize(1);
        return shown.get(0);
    }

    private static Component named(Container in, String name) {
        for (Component c : in.getComponents()) {
            if (name.equals(c.getName())) {
                return c;
            }
            if (c instanceof Container inner) {
                Component found = named(inner, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private static String cell(JTable t, int row, String column) {
        return onEdt(() -> t.getValueAt(row, SearchPanel.COLUMNS.indexOf(column)).toString());
    }
}
