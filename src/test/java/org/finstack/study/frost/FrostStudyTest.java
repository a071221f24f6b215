package org.finstack.study.frost;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.concurrent.CancellationException;
import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.study.fan.FixedSpeedFan;
import org.finstack.study.fouling.CoilFan;
import org.finstack.study.fouling.SmallCoils;
import org.finstack.testing.Reference;
import org.finstack.testing.Stopper;
import org.junit.jupiter.api.Test;

/** Frost properties against their published relations, and the frost march's trends. */
class FrostStudyTest {

    private static final CoilFan AXIAL = new CoilFan.Generic(FixedSpeedFan.axialPropeller(0.5, 60)); // invented design point

    @Test
    void hayashiDensityWorkedExample() {
        // Hayashi et al. 1977: rho = 650 exp(0.227 Ts); at Ts = -10 C, 650 exp(-2.27) = 67.1529 kg/m3 (hand calculation)
        Reference.assertRelative(67.15292, Hayashi1977FrostDensity.density(263.15, Warnings.discard()), 1e-6,
                "Hayashi1977FrostDensity Javadoc");
        Warnings w = new Warnings();
        Hayashi1977FrostDensity.density(223.15, w);
        assertThat(w.list()).hasSize(1);
    }

    @Test
    void yonkoSepsyConductivityWorkedExample() {
        // Yonko & Sepsy 1967 (coefficients from memory): 0.02422 + 7.214e-4 rho + 1.1797e-6 rho^2 at rho = 67.153
        Reference.assertRelative(0.077984, YonkoSepsy1967FrostConductivity.conductivity(67.15292, Warnings.discard()),
                1e-5, "YonkoSepsy1967FrostConductivity Javadoc");
    }

    @Test
    void frostMassGrowsWhileAirflowAndCapacityFall() {
        FrostStudy.FrostResult r = FrostStudy.march(SmallCoils.cooler(), AXIAL, 3, 6, FrostStudy.DEFAULT_THRESHOLD);
        assertThat(r.frosting()).isTrue();
        List<FrostStudy.FrostPoint> t = r.timeline();
        assertThat(t.size()).isGreaterThan(2);
        for (int i = 1; i < t.size(); i++) {
            assertThat(t.get(i).frostMass()).isGreaterThan(t.get(i - 1).frostMass());
            assertThat(t.get(i).frostThickness()).isGreaterThan(t.get(i - 1).frostThickness());
            assertThat(t.get(i).airflow()).isLessThan(t.get(i - 1).airflow());
            assertThat(t.get(i).capacity()).isLessThan(t.get(i - 1).capacity());
            assertThat(t.get(i).airPressureDrop()).isGreaterThan(t.get(i - 1).airPressureDrop());
        }
        assertThat(r.defrostInterval()).isBetween(0.0, 3.0);
        FrostStudy.FrostPoint last = t.get(t.size() - 1);
        assertThat(Math.min(last.capacity() / t.get(0).capacity(), last.airflow() / t.get(0).airflow()))
                .isLessThan(FrostStudy.DEFAULT_THRESHOLD);
    }

    @Test
    void widerFinSpacingRunsLongerBeforeDefrost() {
        // common practice and published frosting studies: 4 fpi freezer coils outlast denser ones between defrosts
        double at6 = FrostStudy.march(SmallCoils.evaporator(6, 2, 0.85, -6, "plain"), AXIAL, 4, 8, 0.7).defrostInterval();
        double at4 = FrostStudy.march(SmallCoils.evaporator(4, 2, 0.85, -6, "plain"), AXIAL, 4, 8, 0.7).defrostInterval();
        assertThat(at6).isFinite();
        assertThat(at4).isFinite().isGreaterThan(at6);
    }

    @Test
    void coilAboveFreezingGrowsNoFrost() {
        FrostStudy.FrostResult r = FrostStudy.march(SmallCoils.evaporator(6, 20, 0.5, 5, "plain"), null, 4, 4, 0.7);
        assertThat(r.frosting()).isFalse();
        assertThat(r.timeline()).hasSize(1);
        assertThat(r.defrostInterval()).isNaN();
        assertThat(r.notes()).anyMatch(n -> n.contains("no frost grows"));
    }

    @Test
    void badInputsAreRefused() {
        assertThatThrownBy(() -> FrostStudy.march(SmallCoils.cooler(), null, 0, 4, 0.7))
                .isInstanceOf(InputException.class).hasMessageContaining("hours");
        assertThatThrownBy(() -> FrostStudy.march(SmallCoils.cooler(), null, 1, 0, 0.7))
                .isInstanceOf(InputException.class).hasMessageContaining("steps");
        assertThatThrownBy(() -> FrostStudy.march(SmallCoils.cooler(), null, 1, 4, 1.2))
                .isInstanceOf(InputException.class).hasMessageContaining("threshold");
    }

    @Test
    void cancelStopsTheMarchBetweenSteps() {
        Stopper three = new Stopper(3);
        assertThatThrownBy(() -> FrostStudy.march(SmallCoils.cooler(), null, 3, 6, FrostStudy.DEFAULT_THRESHOLD, three))
                .isInstanceOf(CancellationException.class);
        assertThat(three.done()).containsExactly(0, 1, 2);
    }
}
