package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

/** Invariants of the input record: every property finite and positive, below the critical pressure, refusals naming the field. */
class SaturatedPropertiesTest {

    @Test
    void derivedGroups() {
        SaturatedProperties p = TubesideFixtures.evaporating();
        assertThat(p.reducedPressure()).isCloseTo(349.9 / 4059.3, org.assertj.core.data.Offset.offset(1e-15));
        assertThat(p.liquidPrandtl()).isCloseTo(1355 * 2.503e-4 / 0.0898, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(p.vapourPrandtl()).isCloseTo(903 * 1.104e-5 / 0.01167, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void rejectsNonPhysicalValuesNamingTheField() {
        assertThatThrownBy(() -> TubesideFixtures.of(-1, 1, 1e-4, 1e-5, 0.01))
                .isInstanceOf(InputException.class).hasMessageStartingWith("liquidDensity:");
        assertThatThrownBy(() -> TubesideFixtures.of(10, 20, 1e-4, 1e-5, 0.01))
                .isInstanceOf(InputException.class).hasMessageStartingWith("vapourDensity:");
        assertThatThrownBy(() -> TubesideFixtures.of(1000, 20, Double.NaN, 1e-5, 0.01))
                .isInstanceOf(InputException.class).hasMessageStartingWith("liquidViscosity:");
        assertThatThrownBy(() -> new SaturatedProperties("x", 5e6, 4e6, 0.1, 1000, 20, 1e-4, 1e-5, 0.1, 0.01, 1,
                1, 0.01, 1e5)).isInstanceOf(InputException.class).hasMessageStartingWith("pressure:");
    }

    @Test
    void tubeFlowRejectsBadInput() {
        assertThatThrownBy(() -> new TubeFlow(0, 100, 0.5, 0)).hasMessageStartingWith("diameter:");
        assertThatThrownBy(() -> new TubeFlow(0.01, -1, 0.5, 0)).hasMessageStartingWith("massFlux:");
        assertThatThrownBy(() -> new TubeFlow(0.01, 100, 1.2, 0)).hasMessageStartingWith("quality:");
        assertThatThrownBy(() -> new TubeFlow(0.01, 100, 0.5, -5)).hasMessageStartingWith("heatFlux:");
        assertThat(TubeFlow.adiabatic(0.01, 100, 0.3).withQuality(0.6).quality()).isEqualTo(0.6);
    }
}
