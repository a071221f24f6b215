package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.swing.JTable;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.timing.Pause;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.IsothermalCoilModel;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.Rating;
import org.finstack.io.AtomicFiles;
import org.finstack.io.CaseFiles;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Progress;
import org.finstack.study.Project;
import org.finstack.study.compare.BandSettings;
import org.finstack.study.compare.Comparison;
import org.finstack.study.compare.DesignBasis;
import org.finstack.study.compare.OptionResult;
import org.finstack.study.Sweep;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Drives the workbench as a user would (AssertJ Swing, from JUnit 5): the demo project opens and
 * rates, a field edit re-rates, a bad entry is marked and not rated, units switch, a project is
 * saved and reopened, options are compared and duplicated, a sweep is plotted and saved, the zone
 * model with a superheat target rates a wet evaporator, the side-by-side table shows the same
 * numbers as study.compare run directly on the demo project (with the seeded capacity band, which
 * the toolbar switches off), a project with a damaged option opens with the option's error and
 * saves it verbatim, an unsupported blend is refused with its
 * reason, the coil map paints a hand-built per-tube table. The reference for every capacity is
 * the model run directly ({@link IsothermalCoilModel}, {@link CoilModels#rate}) on the same case
 * read from the example case files. A repaint manager fails any Swing access off the event thread,
 * and every test checks that no rating ran on the event thread. Skipped without a display (CI
 * runs it under Xvfb). Screenshots of the main states go to target/screenshots.
 */
class WorkbenchGuiTest extends WorkbenchGuiFixture {

    private static final Path EXAMPLES = Path.of("examples");

    @TempDir
    Path dir;

    @Test
    void demoOpensAndShowsTheExistingCondensersCapacity() throws IOException {
        Rating expected = new IsothermalCoilModel().rate(CaseFiles.read(EXAMPLES.resolve("otterby-rooftop-condenser.json")));
        shot("01-coil-form-and-drawing");
        window.tabbedPane("tabs").selectTab(2);
        window.label("results.refrigerantOutlet").requireText(Messages.get("results.notModelled"));
        window.label("results.capacity").requireText(Quantities.format(expected.capacity(), Dimension.HEAT_FLOW,
                UnitSystem.SI));
        assertThat(onEdt(() -> frame.results().rating().capacity())).isEqualTo(expected.capacity());
        assertThat(onEdt(() -> frame.runner().ratings())).isPositive();
        shot("02-results");
    }

    @Test
    void editingRowsReratesToTheModelsValue() throws IOException {
        window.textBox("coil.rows").deleteText().enterText("4");
        awaitCondition("rows edited", () -> frame.model().option().coil().rows() == 4);
        awaitRated();
        CoilCase c = CaseFiles.read(EXAMPLES.resolve("otterby-rooftop-condenser.json"));
        Rating expected = new IsothermalCoilModel().rate(c.withCoil(c.coil().withRows(4)));
        awaitCondition("rated with 4 rows", () -> frame.results().rating() != null
                && frame.results().rating().capacity() == expected.capacity());
        window.tabbedPane("tabs").selectTab(2);
        window.label("results.capacity").requireText(Quantities.format(expected.capacity(), Dimension.HEAT_FLOW,
                UnitSystem.SI));
    }

    @Test
    void anImpossibleFinPitchIsMarkedAndNothingIsRated() throws IOException {
        int before = onEdt(() -> frame.runner().ratings());
        window.textBox("coil.finPitch").setText("0.05 mm");
        awaitCondition("field marked", () -> frame.coilForm().field("coil.finPitch").error() != null);
        assertThat(onEdt(() -> frame.coilForm().field("coil.finPitch").error())).contains("coil.finPitch")
                .contains("fin thickness");
        window.tabbedPane("tabs").selectTab(0);
        shot("03-invalid-entry");
        Pause.pause(700);
        assertThat(onEdt(() -> frame.runner().ratings())).isEqualTo(before);
        window.label("summary").requireText(java.util.regex.Pattern.compile("Not rated.*"));
        window.textBox("coil.finPitch").setText("2.1 mm");
        awaitCondition("field fixed", () -> frame.coilForm().field("coil.finPitch").error() == null);
        awaitRated();
    }

    @Test
    void switchingToUsUnitsConvertsFieldsAndResults() throws IOException {
        double diameter = onEdt(() -> frame.model().option().coil().tubeOuterDiameter());
        window.toggleButton("units.US").click();
        // 9.52 mm / 0.0254 m/in (NIST SP 811, B.9: 1 in = 0.0254 m exactly) = 0.374803 in
        window.textBox("coil.tubeOuterDiameter").requireText("0.3748 in");
        // 2.1 mm fin pitch: 25.4 / 2.1 = 12.095 fins per inch
        window.textBox("coil.finPitch").requireText("12.1 fpi");
        shot("04-us-units");
        window.tabbedPane("tabs").selectTab(2);
        window.label("results.capacity").requireText(java.util.regex.Pattern.compile(".* Btu/h"));
        window.toggleButton("units.SI").click();
        window.tabbedPane("tabs").selectTab(0);
        window.textBox("coil.tubeOuterDiameter").requireText("9.52 mm");
        // switching back and forth changes what is shown, never the value kept
        assertThat(onEdt(() -> frame.model().option().coil().tubeOuterDiameter())).isEqualTo(diameter);
    }

    @Test
    void savedProjectReopensUnchangedAndKeepsTheOldFileAsBak() throws IOException {
        Path file = dir.resolve("c2.finstack.json");
        assertThat(onEdt(() -> frame.saveTo(file))).isTrue();
        Project saved = onEdt(() -> frame.model().project());
        assertThat(ProjectFiles.read(file)).isEqualTo(saved);
        window.textBox("coil.finnedLength").setText("1000 mm");
        awaitCondition("edited", () -> frame.model().option().coil().finnedLength() == 1.0);
        assertThat(onEdt(() -> frame.saveTo(file))).isTrue();
        assertThat(ProjectFiles.read(AtomicFiles.backupOf(file))).isEqualTo(saved);
        Project edited = onEdt(() -> frame.model().project());
        assertThat(onEdt(() -> frame.openProject(null))).isTrue();
        assertThat(onEdt(() -> frame.openProject(file))).isTrue();
        assertThat(onEdt(() -> frame.model().project())).isEqualTo(edited);
        awaitRated();
        window.textBox("coil.finnedLength").requireText("1000 mm");
    }

    @Test
    void sideBySideShowsTheFullComparisonWithItsNumbers() throws IOException {
        window.tabbedPane("tabs").selectTab(4);
        awaitCondition("compared", () -> frame.comparison() != null && !frame.busy());
        JTable table = window.table("compare.table").target();
        // the reference: study.compare run directly on the same project, same basis, band count and seed
        Project p = Workbench.demo();
        Comparison expected = Comparison.of(p, DesignBasis.defaultFor(p.conditions()), BandSettings.DEFAULT,
                Progress.NONE);
        assertThat(onEdt(() -> table.getColumnCount())).isEqualTo(expected.options().size() + 1);
        UnitSystem si = UnitSystem.SI;
        for (OptionResult o : expected.options()) {
            int col = o.index() + 1;
            var r = o.rating();
            requireCell(table, "Capacity", col, Quantities.format(r.capacity(), Dimension.HEAT_FLOW, si));
            requireCell(table, "Capacity vs existing", col, String.format(java.util.Locale.ROOT, "%.3f",
                    o.capacityRatio().getAsDouble()));
            requireCell(table, "Capacity p10 \u2013 p90", col, Quantities.format(o.band().capacityP10(),
                    Dimension.HEAT_FLOW, si) + " \u2013 " + Quantities.format(o.band().capacityP90(), Dimension.HEAT_FLOW,
                            si));
            requireCell(table, "Sensible", col, Quantities.format(r.moisture().sensibleCapacity(), Dimension.HEAT_FLOW, si));
            requireCell(table, "Latent", col, Quantities.format(r.moisture().latentCapacity(), Dimension.HEAT_FLOW, si));
            requireCell(table, "Air out", col, Quantities.format(r.airOutletTemperature(), Dimension.TEMPERATURE, si));
            requireCell(table, "Air pressure drop", col, Quantities.format(r.airPressureDrop(),
                    Dimension.PRESSURE_DIFFERENCE, si));
            requireCell(table, "Airflow on the fan", col, Quantities.format(o.fan().airflow(), Dimension.VOLUME_FLOW, si));
            requireCell(table, "Capacity on the fan", col, Quantities.format(o.fan().capacity(), Dimension.HEAT_FLOW, si));
            requireCell(table, "Refrigerant pressure drop", col, Messages.get("compare.notComputed"));
            requireCell(table, "Charge in the coil", col, Messages.get("compare.notComputed"));
            requireCell(table, "Metal mass", col, Quantities.format(r.geometry().metalMass(), Dimension.MASS, si));
            requireCell(table, "Design-pressure margin", col, String.format(java.util.Locale.ROOT, "%.3f",
                    o.pressureMargin().getAsDouble()));
            requireCell(table, "Tube material", col, o.coil().tubeMaterial().id());
            requireCell(table, "Fin material", col, o.coil().finMaterial().id());
        }
        // the candidate's differences are marked, for the better or the worse; the reference column is not
        ComparePanel.Cell ref = cell(table, "Capacity", 1);
        ComparePanel.Cell cand = cell(table, "Capacity", 2);
        assertThat(ref.changed()).isFalse();
        assertThat(cand.changed()).isTrue();
        double refCap = expected.options().get(0).rating().capacity();
        double candCap = expected.options().get(1).rating().capacity();
        assertThat(cand.mark()).isEqualTo(candCap > refCap ? ComparePanel.Mark.BETTER : ComparePanel.Mark.WORSE);
        assertThat(cell(table, "Rows", 2).mark()).isEqualTo(ComparePanel.Mark.CHANGED);
        assertThat(cell(table, "Tube diameter", 2).changed()).isFalse();
        shot("05-side-by-side");
        // the selected option's band in the results
        window.tabbedPane("tabs").selectTab(2);
        OptionResult first = expected.options().get(0);
        window.label("results.capacityBand").requireText(Quantities.format(first.band().capacityP10(),
                Dimension.HEAT_FLOW, si) + " \u2013 " + Quantities.format(first.band().capacityP90(), Dimension.HEAT_FLOW,
                        si));
        shot("13-results-with-band");
    }

    @Test
    void bandToggleSwitchesTheBandOff() {
        window.checkBox("toolbar.band").requireSelected();
        window.checkBox("toolbar.band").click();
        awaitCondition("compared without band", () -> frame.comparison() != null && !frame.busy()
                && !frame.comparison().withBand());
        window.tabbedPane("tabs").selectTab(2);
        window.label("results.capacityBand").requireText(Messages.get("results.bandOff"));
        window.tabbedPane("tabs").selectTab(4);
        JTable table = window.table("compare.table").target();
        assertThat(cell(table, "Capacity p10 \u2013 p90", 1).text()).isEqualTo(Messages.get("compare.bandOff"));
        window.checkBox("toolbar.band").click();
        awaitCondition("compared with band", () -> frame.comparison() != null && !frame.busy()
                && frame.comparison().withBand());
    }

    @Test
    void aProjectWithADamagedOptionOpensShowsItAndSavesItVerbatim() throws IOException {
        // the demo project with one more candidate whose fins are thicker than their pitch
        String text = Files.readString(EXAMPLES.resolve("projects/otterby-condenser-options.finstack.json"));
        int coil = text.indexOf("\"coil\"", text.indexOf("\"options\""));
        String entry = "{ \"name\": \"Damaged: fins thicker than their pitch\", " + text.substring(coil,
                text.indexOf('}', coil) + 1).replace("\"0.115 mm\"", "\"3 mm\"") + " }";
        int list = text.indexOf('[', text.indexOf("\"options\""));
        String damaged = text.substring(0, list + 1) + "\n    " + entry + "," + text.substring(list + 1);
        Path file = dir.resolve("damaged.finstack.json");
        Files.writeString(file, damaged);
        assertThat(onEdt(() -> frame.openProject(file))).isTrue();
        awaitCondition("compared", () -> frame.comparison() != null && !frame.busy());
        assertThat(onEdt(() -> frame.model().project().allOptions())).hasSize(2);
        assertThat(onEdt(() -> frame.damagedNote().isVisible())).isTrue();
        assertThat(window.textBox("options.damaged").text()).contains("Damaged: fins thicker than their pitch")
                .contains("options[0].coil.");
        window.tabbedPane("tabs").selectTab(4);
        JTable table = window.table("compare.table").target();
        assertThat(onEdt(() -> table.getColumnCount())).isEqualTo(4);
        ComparePanel.Cell status = cell(table, "Status", 2);
        assertThat(status.mark()).isEqualTo(ComparePanel.Mark.ERROR);
        assertThat(status.tip()).startsWith("options[0].coil.");
        shot("14-damaged-option");
        Path saved = dir.resolve("saved.finstack.json");
        assertThat(onEdt(() -> frame.saveTo(saved))).isTrue();
        assertThat(Files.readString(saved)).contains(entry);
        assertThat(ProjectFiles.read(saved).damaged()).singleElement()
                .satisfies(d -> assertThat(d.json()).isEqualTo(entry));
    }

    @Test
    void duplicateUndoAndRedoAnOption() {
        window.button("options.duplicate").click();
        awaitCondition("duplicated", () -> frame.model().project().allOptions().size() == 3);
        assertThat(onEdt(() -> frame.model().selected())).isEqualTo(2);
        assertThat(onEdt(() -> frame.model().option().name())).endsWith("(copy)");
        window.button("toolbar.undo").click();
        awaitCondition("undone", () -> frame.model().project().allOptions().size() == 2);
        window.button("toolbar.redo").click();
        awaitCondition("redone", () -> frame.model().project().allOptions().size() == 3);
        awaitRated();
        assertThat(onEdt(() -> frame.outcomes().size())).isEqualTo(3);
    }

    @Test
    void aCaseFileAddedAsAnOptionKeepsItsOwnConditions() throws IOException {
        Path cooler = EXAMPLES.resolve("otterby-cooler-evaporator.json");
        assertThat(onEdt(() -> frame.importCase(cooler))).isTrue();
        awaitRated();
        Rating expected = new IsothermalCoilModel().rate(CaseFiles.read(cooler));
        awaitCondition("cooler rated", () -> frame.results().rating() != null
                && frame.results().rating().capacity() == expected.capacity());
        window.tabbedPane("tabs").selectTab(2);
        window.label("results.capacity").requireText(Quantities.format(expected.capacity(), Dimension.HEAT_FLOW,
                UnitSystem.SI));
    }

    @Test
    void aFlammableHighPressureRefrigerantShowsTheCautions() throws IOException {
        window.tabbedPane("tabs").selectTab(1);
        window.comboBox("refrigerant.fluid").selectItem("R32");
        awaitCondition("R32 set", () -> frame.model().project().conditions().refrigerant().fluid().equals("R32"));
        awaitRated();
        // the cautions come from study.Cautions, fed by the fluid's own safety class (A2L for R32)
        List<String> cautions = org.finstack.study.Cautions.forFluid(org.finstack.fluid.Fluids.byName("R32"));
        awaitCondition("cautions shown", () -> frame.results().cautions().equals(cautions));
        window.tabbedPane("tabs").selectTab(2);
        window.textBox("results.cautions").requireVisible();
        assertThat(window.textBox("results.cautions").text()).contains("high pressure").contains("flammable")
                .contains("A2L").contains("work at height");
        // the isothermal model does not use the refrigerant's name: re-reading the shown (rounded)
        // conditions must not have moved the capacity
        Rating expected = new IsothermalCoilModel().rate(CaseFiles.read(EXAMPLES.resolve("otterby-rooftop-condenser.json")));
        assertThat(onEdt(() -> frame.results().rating().capacity())).isEqualTo(expected.capacity());
        shot("06-cautions");
    }

    @Test
    void anUnsupportedBlendCannotBeChosenAndSaysWhy() {
        window.tabbedPane("tabs").selectTab(1);
        window.comboBox("refrigerant.fluid").selectItem(java.util.regex.Pattern.compile("R454B .*"));
        awaitCondition("refused", () -> frame.conditionsForm().markOf("refrigerant.fluid") != null);
        assertThat(onEdt(() -> frame.conditionsForm().markOf("refrigerant.fluid"))).contains("mixture model");
        assertThat(onEdt(() -> frame.model().project().conditions().refrigerant().fluid())).isEqualTo("R134a");
        window.comboBox("refrigerant.fluid").requireSelection("R134a");
    }

    @Test
    void zoneModelWithSuperheatRatesAWetEvaporatorAsTheModelDoes() throws IOException {
        // the wet dairy-cooler example, on R134a (R-404A's transport properties are not in this
        // build) and rated isothermally as it is imported, with a given film coefficient
        String text = Files.readString(EXAMPLES.resolve("otterby-dairy-cooler-wet.json"))
                .replace("\"R404A\"", "\"R134a\"")
                .replace("\"superheat\": \"6 K\", \"model\": \"zones\"", "\"insideCoefficient\": \"1800 W/(m2 K)\"");
        Path wet = dir.resolve("dairy-cooler-r134a.json");
        Files.writeString(wet, text);
        CoilCase imported = CaseFiles.read(wet);
        assertThat(imported.refrigerant().model()).isEqualTo(RefrigerantSide.Model.ISOTHERMAL);
        // the capacity band is not what this test is about: off, so the tube model's ratings are not repeated 30 times
        window.checkBox("toolbar.band").click();
        window.checkBox("toolbar.band").requireNotSelected();
        assertThat(onEdt(() -> frame.importCase(wet))).isTrue();
        awaitRated();
        window.tabbedPane("tabs").selectTab(1);
        // choose the zone model: without a target it is refused, marked at the target chooser
        window.comboBox("toolbar.model").selectItem(1);
        awaitCondition("target marked", () -> frame.conditionsForm().markOf("refrigerant.target") != null);
        assertThat(onEdt(() -> frame.conditionsForm().markOf("refrigerant.target"))).contains("superheat")
                .contains("zones model");
        shot("09-zone-model-needs-a-target");
        window.comboBox("refrigerant.target").selectItem(1);
        window.textBox("refrigerant.superheat").setText("6 K");
        window.textBox("refrigerant.insideCoefficient").setText("");
        RefrigerantSide r = imported.refrigerant();
        CoilCase expectedCase = imported.withRefrigerant(new RefrigerantSide(r.fluid(), r.duty(),
                r.saturationTemperature(), r.convention(), 0, r.liquidTemperature(), 0,
                new RefrigerantSide.Target.Superheat(6), RefrigerantSide.Model.ZONES, r.segments()));
        Rating expected = CoilModels.rate(expectedCase);
        awaitCondition("zone rating", () -> frame.results().rating() != null && !frame.busy()
                && frame.results().rating().model().equals("zones")
                && frame.results().rating().capacity() == expected.capacity());
        assertThat(onEdt(() -> frame.model().option().caseUnder(frame.model().project().conditions())))
                .isEqualTo(expectedCase);
        window.tabbedPane("tabs").selectTab(2);
        window.label("results.capacity").requireText(Quantities.format(expected.capacity(), Dimension.HEAT_FLOW,
                UnitSystem.SI));
        assertThat(expected.moisture().latentCapacity()).isPositive();
        window.label("results.sensible").requireText(Quantities.format(expected.moisture().sensibleCapacity(),
                Dimension.HEAT_FLOW, UnitSystem.SI));
        window.label("results.latent").requireText(Quantities.format(expected.moisture().latentCapacity(),
                Dimension.HEAT_FLOW, UnitSystem.SI));
        window.label("results.refrigerantOutlet").requireText(java.util.regex.Pattern.compile("superheat .*"));
        window.label("results.td").requireText(Quantities.format(org.finstack.io.RatingJson.temperatureDifference(
                expected), Dimension.TEMPERATURE_DIFFERENCE, UnitSystem.SI));
        assertThat(window.textBox("results.tdBasis").text()).contains(org.finstack.io.RatingJson.TD_BASIS);
        shot("10-zone-model-wet-evaporator");
        // the tube-by-tube model: rated when it is in the build, else refused with the reason at the chooser
        window.tabbedPane("tabs").selectTab(1);
        window.comboBox("refrigerant.model").selectItem(2);
        awaitCondition("tube model answered", () -> !frame.busy() && frame.outcomes().size() == 3
                && frame.outcomes().get(2).ratedCase() != null
                && frame.outcomes().get(2).ratedCase().refrigerant().model() == RefrigerantSide.Model.TUBES);
        RatingRunner.Outcome tubes = onEdt(() -> frame.outcomes().get(2));
        if (tubes.rating() == null) {
            assertThat(tubes.error().getMessage()).startsWith("refrigerant.model");
            assertThat(onEdt(() -> frame.conditionsForm().markOf("refrigerant.model"))).isNotNull();
            window.label("summary").requireText(java.util.regex.Pattern.compile("Not rated.*"));
        } else {
            assertThat(tubes.rating().tubes()).isNotEmpty();
            assertThat(onEdt(() -> frame.coilMap().rating())).isNotNull();
        }
    }

    @Test
    void coilMapShowsAHandBuiltTubeTable() {
        CoilCase c = CaseFiles.read(EXAMPLES.resolve("otterby-rooftop-condenser.json"));
        Rating base = new IsothermalCoilModel().rate(c);
        assertThat(onEdt(() -> frame.coilMap().rating())).as("no tubes from the isothermal model").isNull();
        List<Rating.TubeResult> tubes = new java.util.ArrayList<>();
        org.finstack.coil.Circuiting circuiting = c.effectiveCircuiting();
        for (int k = 0; k < circuiting.count(); k++) {
            List<org.finstack.coil.Circuiting.Tube> path = circuiting.circuits().get(k);
            for (int i = 0; i < path.size(); i++) {
                double q = i < 2 ? -1 : 1 - (double) i / path.size();
                tubes.add(new Rating.TubeResult(k, path.get(i).row(), path.get(i).position(), 340 - 2.0 * i,
                        340 - 2.0 * (i + 1), q, q < 0 ? -1 : q - 0.05, 305, 309, 110));
            }
        }
        Rating handBuilt = new Rating("tubes", base.duty(), base.capacity(), base.airInletTemperature(),
                base.airOutletTemperature(), base.airMassFlow(), base.airVolumeFlow(), base.faceVelocity(),
                base.airPressureDrop(), base.geometry(), base.maxVelocity(), base.reynoldsDc(), base.colburnJ(),
                base.frictionF(), base.airCoefficient(), base.finEfficiency(), base.surfaceEffectiveness(),
                base.resistances(), base.ntu(), base.effectiveness(), base.airProperties(), base.warnings(),
                base.methods(), base.moisture(), null, List.of(), tubes);
        window.tabbedPane("tabs").selectTab(3);
        GuiActionRunner.execute(() -> frame.coilMap().show(c, handBuilt, UnitSystem.SI));
        window.table("coilmap.table").requireRowCount(48);
        BufferedImage img = onEdt(() -> frame.coilMap().image(600, 560));
        org.finstack.ui.draw.TubeSheetView.Layout l = org.finstack.ui.draw.CoilMap.layout(c.coil(),
                CoilMapPanel.area(600, 560));
        org.finstack.ui.draw.CoilMap.Scale scale = org.finstack.ui.draw.CoilMap.scale(tubes,
                org.finstack.ui.draw.CoilMap.Colouring.TEMPERATURE);
        for (Rating.TubeResult t : tubes) {
            java.awt.geom.Point2D p = l.centre(t.row(), t.position());
            assertThat(new java.awt.Color(img.getRGB((int) Math.round(p.getX()), (int) Math.round(p.getY()))))
                    .isEqualTo(scale.colour((t.refrigerantInTemperature() + t.refrigerantOutTemperature()) / 2));
        }
        shot("11-coil-map-temperature");
        window.radioButton("coilmap.byQuality").click();
        awaitCondition("by quality", () -> frame.coilMap().colouring() == org.finstack.ui.draw.CoilMap.Colouring.QUALITY);
        BufferedImage q = onEdt(() -> frame.coilMap().image(600, 560));
        java.awt.geom.Point2D first = l.centre(tubes.get(0).row(), tubes.get(0).position());
        assertThat(new java.awt.Color(q.getRGB((int) Math.round(first.getX()), (int) Math.round(first.getY()))))
                .isEqualTo(org.finstack.ui.draw.CoilMap.SINGLE_PHASE);
        shot("12-coil-map-quality");
    }

    @Test
    void finDensitySweepIsPlottedAndSavedAsPngAndSvg() throws IOException {
        window.tabbedPane("tabs").selectTab(5);
        window.comboBox("sweep.parameter").selectItem(0);
        window.button("sweep.run").click();
        awaitCondition("sweep done", () -> frame.sweep().points() != null && !frame.sweep().running());
        List<Sweep.Point> points = onEdt(() -> frame.sweep().points());
        assertThat(points).hasSize(9).allMatch(Sweep.Point::rated);
        for (int i = 1; i < points.size(); i++) {
            // more fins per metre: more surface, more capacity and more pressure drop
            assertThat(points.get(i).rating().capacity()).isGreaterThan(points.get(i - 1).rating().capacity());
            assertThat(points.get(i).rating().airPressureDrop())
                    .isGreaterThan(points.get(i - 1).rating().airPressureDrop());
        }
        Path png = dir.resolve("sweep.png");
        Path svg = dir.resolve("sweep.svg");
        GuiActionRunner.execute(() -> {
            frame.sweep().writePng(png);
            frame.sweep().writeSvg(svg);
            return null;
        });
        assertThat(ImageIO.read(png.toFile()).getWidth()).isEqualTo(900);
        assertThat(Files.readString(svg)).contains("<svg").contains("Capacity");
        shot("07-sweep");
    }

    @Test
    void darkThemeKeepsEverythingReadable() {
        window.menuItem("theme.DARK").click();
        awaitCondition("dark", () -> javax.swing.UIManager.getLookAndFeel() instanceof FinstackDarkLaf);
        shot("08-dark-theme");
        window.menuItem("theme.LIGHT").click();
        awaitCondition("light", () -> javax.swing.UIManager.getLookAndFeel() instanceof FinstackLightLaf);
    }

    // --- helpers ---

    private static ComparePanel.Cell cell(JTable t, String label, int column) {
        return onEdt(() -> (ComparePanel.Cell) t.getValueAt(rowOf(t, label), column));
    }

    /** The cell's text starts with the expected text (a changed cell goes on with the change). */
    private static void requireCell(JTable t, String label, int column, String expected) {
        assertThat(cell(t, label, column).text()).as("%s, column %d", label, column).startsWith(expected);
    }

    private static int rowOf(JTable t, String label) {
        for (int r = 0; r < t.getRowCount(); r++) {
            if (t.getValueAt(r, 0).toString().equals(label)) {
                return r;
            }
        }
        throw new AssertionError("no row " + label);
    }
}
