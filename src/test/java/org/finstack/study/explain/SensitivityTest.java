package org.finstack.study.explain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.io.CaseFiles;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Progress;
import org.junit.jupiter.api.Test;

/**
 * Sensitivity signs follow common practice for finned coils: more fins or more rows carry more
 * heat and cost more air pressure drop; more air carries more heat; dirt on the fins costs
 * capacity; a thicker wall or another tube metal changes little. Checked on a dry condenser
 * (zones model) and a wet evaporator.
 */
class SensitivityTest {

    /** A dry condenser (zones), a wet, dusty R-290 evaporator (zones) and a dry condenser (isothermal). */
    static final List<CoilCase> CASES = List.of(CaseFiles.read(Path.of("examples/otterby-rooftop-condenser-full.json")),
            ProjectFiles.read(Path.of("examples/projects/marrowfield-propane-cooler.finstack.json")).caseOf(0),
            CaseFiles.read(Path.of("examples/otterby-rooftop-condenser.json")));

    @Test
    void signsFollowCommonPractice() {
        for (int i = 0; i < CASES.size(); i++) {
            Sensitivity.Result s = Sensitivity.of(CASES.get(i));
            String ctx = "case " + i;
            assertThat(s.effects()).as(ctx).allMatch(Sensitivity.Effect::rated);
            var fins = s.effect(Sensitivity.Input.FIN_DENSITY);
            var rows = s.effect(Sensitivity.Input.ROWS);
            var air = s.effect(Sensitivity.Input.FACE_VELOCITY);
            var dust = s.effect(Sensitivity.Input.AIR_FOULING);
            assertThat(fins.capacityChange()).as(ctx + " fins").isPositive();
            assertThat(fins.airPressureDropChange()).as(ctx + " fins dp").isPositive();
            assertThat(rows.capacityChange()).as(ctx + " rows").isPositive();
            assertThat(rows.airPressureDropChange()).as(ctx + " rows dp").isPositive();
            assertThat(air.capacityChange()).as(ctx + " air").isPositive();
            assertThat(air.airPressureDropChange()).as(ctx + " air dp").isPositive();
            assertThat(dust.capacityChange()).as(ctx + " fouling").isNegative();
            assertThat(Math.abs(s.effect(Sensitivity.Input.TUBE_WALL).capacityFraction())).as(ctx + " wall")
                    .isLessThan(0.01);
        }
    }

    @Test
    void aHigherSaturationTemperatureHelpsACondenserAndHurtsAnEvaporator() {
        var cond = Sensitivity.of(CASES.get(0)).effect(Sensitivity.Input.SATURATION_TEMPERATURE);
        var evap = Sensitivity.of(CASES.get(1)).effect(Sensitivity.Input.SATURATION_TEMPERATURE);
        assertThat(cond.capacityChange()).isPositive();
        assertThat(evap.capacityChange()).isNegative();
    }

    @Test
    void effectsAreSortedLargestFirstAndEqualSingleRatings() {
        CoilCase c = CASES.get(0);
        Sensitivity.Result s = Sensitivity.of(c);
        for (int i = 1; i < s.effects().size(); i++) {
            assertThat(Math.abs(s.effects().get(i - 1).capacityFraction()))
                    .isGreaterThanOrEqualTo(Math.abs(s.effects().get(i).capacityFraction()));
        }
        double base = CoilModels.rate(c).capacity();
        for (var e : s.effects()) {
            double alone = CoilModels.rate(Sensitivity.stepped(c, e.input())).capacity();
            assertThat(e.capacityChange()).as(e.input().label()).isEqualTo(alone - base);
        }
    }

    @Test
    void cleaningAFouledCoilRecoversCapacity() {
        Sensitivity.Result s = Sensitivity.of(CASES.get(1));
        assertThat(s.cleaning()).isNotNull();
        assertThat(s.cleaning().capacityChange()).isPositive();
        assertThat(Sensitivity.of(CASES.get(0)).cleaning()).isNull();
    }

    @Test
    void progressRisesOneStepPerRatingToTheTotal() {
        for (int i = 0; i < 2; i++) {
            CoilCase c = CASES.get(i);
            List<int[]> steps = new ArrayList<>();
            Sensitivity.Result s = Sensitivity.of(c, new Progress() {
                @Override
                public void step(int done, int total) {
                    steps.add(new int[] {done, total});
                }

                @Override
                public boolean cancelled() {
                    return false;
                }
            });
            int total = 1 + Sensitivity.Input.values().length + (s.cleaning() == null ? 0 : 1);
            assertThat(steps).as("case " + i).hasSize(total);
            for (int k = 0; k < total; k++) {
                assertThat(steps.get(k)).as("case " + i + " step " + k).containsExactly(k + 1, total);
            }
        }
    }

    @Test
    void cancellingAfterTheSecondRatingStopsTheSteps() {
        AtomicInteger ratings = new AtomicInteger();
        Progress stopAfterTwo = new Progress() {
            @Override
            public void step(int done, int total) {
                ratings.incrementAndGet();
            }

            @Override
            public boolean cancelled() {
                return ratings.get() >= 2;
            }
        };
        assertThatThrownBy(() -> Sensitivity.of(CASES.get(1), stopAfterTwo))
                .isInstanceOf(CancellationException.class);
        assertThat(ratings.get()).isEqualTo(2).isLessThan(Sensitivity.Input.values().length);
    }
}
