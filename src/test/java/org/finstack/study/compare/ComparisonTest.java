package org.finstack.study.compare;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Option;
import org.finstack.study.Overrides;
import org.finstack.study.Project;
import org.finstack.study.Constraints.Room;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.pressure.DesignPressureCheck;
import org.finstack.study.pressure.TubePressureRating;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * The comparison agrees with single ratings of the same coils (CoilModels.rate on each option's
 * case, the independent reference), finds the fan's operating point, and keeps comparing when
 * one option cannot be rated or read (a damaged entry keeps its place in the file's order). The
 * charge screen uses the project's room (ChargeScreening, EN 378-1 Annex C, as the reference);
 * the capacity band is study.uncertainty's UncertaintyBand of the rated case, seeded.
 */
class ComparisonTest {

    static final Path FULL = Path.of("examples/projects/otterby-condenser-options-full.finstack.json");
    static final Path DEMO = Path.of("examples/projects/otterby-condenser-options.finstack.json");

    @Test
    void agreesWithSingleRatingsOfTheSameCoils() {
        for (Path file : List.of(DEMO, FULL)) {
            Project p = ProjectFiles.read(file);
            Comparison c = Comparison.of(p);
            assertThat(c.options()).hasSize(p.allOptions().size());
            double existing = CoilModels.rate(p.caseOf(0)).capacity();
            for (OptionResult o : c.options()) {
                Rating alone = CoilModels.rate(p.caseOf(o.index()));
                String ctx = file + " " + o.name();
                Reference.assertRelative(alone.capacity(), o.rating().capacity(), 1e-12, ctx);
                Reference.assertRelative(alone.airPressureDrop(), o.rating().airPressureDrop(), 1e-12, ctx);
                Reference.assertRelative(alone.capacity() / existing, o.capacityRatio().getAsDouble(), 1e-12, ctx);
                Reference.assertRelative(alone.geometry().metalMass(), o.rating().geometry().metalMass(), 1e-12, ctx);
                if (alone.refrigerant() != null) {
                    Reference.assertRelative(alone.refrigerant().charge(), o.chargeKg().getAsDouble(), 1e-12, ctx);
                    Reference.assertRelative(alone.refrigerant().pressureDrop(),
                            o.refrigerantPressureDrop().getAsDouble(), 1e-12, ctx);
                } else {
                    assertThat(o.chargeKg()).as(ctx).isEmpty();
                    assertThat(o.charge().notes()).as(ctx).anyMatch(n -> n.contains("not computed"));
                }
            }
        }
    }

    @Test
    void fanAirflowIsWhereTheFanCurveMeetsTheCoilsPressureDrop() {
        Project p = ProjectFiles.read(FULL);
        FanCurve fan = FanMatch.curve(p.constraints().fanCurve());
        for (OptionResult o : Comparison.of(p).options()) {
            assertThat(o.fan().found()).as(o.name() + ": " + o.fan().error()).isTrue();
            Rating there = CoilModels.rate(FanMatch.atAirflow(p.caseOf(o.index()), o.fan().airflow()));
            // Independent check: the coil rated alone at the found airflow needs what the fan gives there.
            Reference.assertRelative(fan.pressure(o.fan().airflow()), there.airPressureDrop(), 2e-3, o.name());
            Reference.assertRelative(there.capacity(), o.fan().capacity(), 1e-3, o.name());
            assertThat(o.fan().ratings()).isLessThanOrEqualTo(FanMatch.MAX_RATINGS);
        }
    }

    @Test
    void moreRowsMeanLessAirOnTheSameFan() {
        Comparison c = Comparison.of(ProjectFiles.read(FULL));
        OptionResult three = c.options().get(0);
        OptionResult five = c.options().get(3);
        assertThat(five.coil().rows()).isGreaterThan(three.coil().rows());
        assertThat(five.fan().airflow()).isLessThan(three.fan().airflow());
        assertThat(five.rating().airPressureDrop()).isGreaterThan(three.rating().airPressureDrop());
    }

    @Test
    void aDamagedOptionReportsItsErrorAndTheRestCompare() {
        Project p = ProjectFiles.read(FULL);
        RefrigerantSide r = p.conditions().refrigerant();
        // R-744 at 45 C is above its critical temperature (31 C): the zone model refuses the case.
        RefrigerantSide co2 = new RefrigerantSide("R744", r.duty(), r.saturationTemperature(), r.convention(), 0,
                r.liquidTemperature(), r.inletTemperature(), r.target(), r.model(), r.segments());
        List<Option> options = new ArrayList<>(p.options());
        options.add(1, new Option("Damaged: R-744 above critical", p.options().get(0).coil(),
                new Overrides(null, co2, null)));
        Project damaged = new Project(p.version(), p.name(), p.conditions(), p.existing(), options, p.constraints(),
                p.notes());
        Comparison c = Comparison.of(damaged);
        assertThat(c.options()).hasSize(5);
        OptionResult bad = c.options().get(2);
        assertThat(bad.rated()).isFalse();
        assertThat(bad.error()).contains("saturationTemperature");
        assertThat(c.options()).filteredOn(OptionResult::rated).hasSize(4);
        assertThat(c.recommended()).isPresent();
        assertThat(c.recommended().get().name()).isNotEqualTo(bad.name());
    }

    @Test
    void pressureMarginFollowsTheStudyPressurePackage() {
        Project p = ProjectFiles.read(FULL);
        Comparison c = Comparison.of(p);
        // Default basis: EN 378-2 air-cooled high side, ambient up to 32 C -> 55 C (from memory; see DesignTemperatureLevel).
        Reference.assertRelative(328.15, c.basis().designTemperature(), 1e-12, "design temperature");
        for (OptionResult o : c.options()) {
            var g = o.coil();
            double allowable = TubePressureRating.allowablePressure(g.tubeMaterial().id(), g.tubeOuterDiameter(),
                    g.tubeWall(), 328.15).allowableGauge();
            double expected = DesignPressureCheck.margin(allowable, o.pressure().saturationPressure()).margin();
            Reference.assertRelative(expected, o.pressureMargin().getAsDouble(), 1e-12, o.name());
            // R-134a saturation pressure at 55 C is about 1.49 MPa (from memory: ASHRAE Handbook-Fundamentals tables).
            Reference.assertRelative(1.49e6, o.pressure().saturationPressure(), 0.02, o.name());
        }
    }

    @Test
    void limitsBrokenAreNamedAndKeepAnOptionFromTheRecommendation() {
        Comparison c = Comparison.of(ProjectFiles.read(FULL));
        OptionResult tooDeep = c.options().get(3);
        assertThat(tooDeep.constraintIssues()).singleElement().asString().contains("Depth");
        assertThat(c.recommended()).isPresent();
        assertThat(c.recommended().get().index()).isNotEqualTo(3);
    }

    @Test
    void flammableRefrigerantChargeIsScreenedAgainstTheRoomWhenGiven() {
        Project p = ProjectFiles.read(Path.of("examples/projects/marrowfield-propane-cooler.finstack.json"));
        DesignBasis basis = DesignBasis.defaultFor(p.conditions()).withRoom(new Room(50, 20, 1.8, false));
        Comparison c = Comparison.of(p, basis);
        for (OptionResult o : c.options()) {
            assertThat(o.charge().screening()).as(o.name()).isNotNull();
            // EN 378-1 m1 for R-290 = 4 m3 x 0.038 kg/m3 = 0.152 kg (ChargeScreening's worked example);
            // these coils hold less, so they pass.
            assertThat(o.charge().screening().within()).isTrue();
        }
        Comparison noRoom = Comparison.of(p.withConstraints(p.constraints().withRoom(null)));
        assertThat(noRoom.options().get(0).charge().notes()).anyMatch(n -> n.contains("m1 = 0.152 kg"));
    }

    @Test
    void theProjectsRoomIsTheOneScreenedAgainst() {
        // the propane example's invented room (constraints.room): 180 m3, 60 m2, release height 1.2 m, self-contained
        Project p = ProjectFiles.read(Path.of("examples/projects/marrowfield-propane-cooler.finstack.json"));
        Comparison c = Comparison.of(p);
        assertThat(c.basis().room()).isEqualTo(p.constraints().room());
        for (OptionResult o : c.options()) {
            var expected = org.finstack.study.pressure.ChargeScreening.screen(o.charge().safety(), 180, 60, 1.2,
                    o.charge().charge(), true);
            assertThat(o.charge().screening()).as(o.name()).isEqualTo(expected);
        }
        // a room the basis brings wins over the project's
        Room other = new Room(30, 12, 0.6, false);
        Comparison stated = Comparison.of(p, DesignBasis.defaultFor(p.conditions()).withRoom(other));
        assertThat(stated.basis().room()).isEqualTo(other);
    }

    @Test
    void capacityBandIsUncertaintyBandOfTheRatedCase() {
        // the band comes from study.uncertainty (seeded): the same seed and count give the same band
        Project p = ProjectFiles.read(DEMO);
        Comparison c = Comparison.of(p, DesignBasis.defaultFor(p.conditions()), BandSettings.DEFAULT,
                org.finstack.study.Progress.NONE);
        assertThat(c.withBand()).isTrue();
        for (OptionResult o : c.options()) {
            var band = org.finstack.study.uncertainty.UncertaintyBand.of(o.ratedCase(), BandSettings.DEFAULT_SAMPLES,
                    BandSettings.DEFAULT_SEED);
            assertThat(o.band()).isEqualTo(band);
            assertThat(o.capacityP10().getAsDouble()).isLessThan(o.rating().capacity());
            assertThat(o.capacityP90().getAsDouble()).isGreaterThan(o.rating().capacity());
        }
        assertThat(Comparison.of(p).withBand()).isFalse();
    }

    @Test
    void aDamagedEntryStandsAtItsPlaceInTheFile() {
        Project p = ProjectFiles.read(FULL);
        Project.Damaged d = new Project.Damaged("options[1]", 1, "Broken entry", "options[1].coil.rows: is missing",
                "{ \"name\": \"Broken entry\" }");
        Project withDamaged = new Project(p.version(), p.name(), p.conditions(), p.existing(), p.options(),
                p.constraints(), p.notes(), List.of(d));
        Comparison c = Comparison.of(withDamaged);
        assertThat(c.options()).hasSize(p.allOptions().size() + 1);
        OptionResult bad = c.options().get(2);
        assertThat(bad.name()).isEqualTo("Broken entry");
        assertThat(bad.rated()).isFalse();
        assertThat(bad.error()).isEqualTo("options[1].coil.rows: is missing");
        assertThat(c.options()).extracting(OptionResult::index).containsExactly(0, 1, 2, 3, 4);
        assertThat(c.options().get(3).name()).isEqualTo(p.options().get(1).name());
        assertThat(c.recommended()).isPresent();
    }

    @Test
    void stopsWhenAskedBetweenOptions() {
        Project p = ProjectFiles.read(DEMO);
        org.finstack.study.Progress stop = new org.finstack.study.Progress() {
            @Override
            public void step(int done, int total) {
                // nothing to show
            }

            @Override
            public boolean cancelled() {
                return true;
            }
        };
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> Comparison.of(p, DesignBasis.defaultFor(
                p.conditions()), BandSettings.OFF, stop)).isInstanceOf(java.util.concurrent.CancellationException.class);
    }

    @Test
    void caseOfEachOptionIsTheOneRated() {
        Project p = ProjectFiles.read(DEMO);
        Comparison c = Comparison.of(p);
        for (OptionResult o : c.options()) {
            CoilCase expected = p.caseOf(o.index());
            assertThat(o.ratedCase()).isEqualTo(expected);
        }
    }
}
