package org.finstack.airside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class KaysLondonCorePressureDropTest {

    @Test
    void constantDensityWithoutEndLossesIsPureFriction() {
        // Kays & London core equation: with rho_in = rho_out and Kc = Ke = 0 the sigma terms
        // cancel and dp = f (A/Amin) G^2 / (2 rho)
        for (double sigma : new double[] {0.3, 0.55, 0.9}) {
            double dp = KaysLondonCorePressureDrop.withoutEndLosses(6.0, 1.18, 1.18, sigma, 0.05, 25);
            Reference.assertRelative(0.05 * 25 * 36 / (2 * 1.18), dp, 1e-12, "pure friction, sigma=" + sigma);
        }
    }

    @Test
    void javadocWorkedExample() {
        // hand calculation of the bracket: 1.0975 + 0.181818 + 1.254545 - 0.651818 = 1.882045,
        // times G^2/(2 rho_in) = 10.416667 gives 19.605 Pa
        double dp = KaysLondonCorePressureDrop.pressureDrop(5, 1.20, 1.10, 0.55, 0.06, 20, 0.4, 0.1);
        Reference.assertRelative(19.605, dp, 1e-4, "worked example");
    }

    @Test
    void withoutEndLossesMatchesTheReducedForm() {
        // with Kc = Ke = 0 the bracket is (1 + sigma^2)(rho_in/rho_out - 1) + f (A/Amin) rho_in/rho_m
        double rin = 1.20;
        double rout = 1.05;
        double rm = 2 / (1 / rin + 1 / rout);
        double expected = 4.0 * 4.0 / (2 * rin) * ((1 + 0.6 * 0.6) * (rin / rout - 1) + 0.07 * 18 * rin / rm);
        Reference.assertRelative(expected, KaysLondonCorePressureDrop.withoutEndLosses(4, rin, rout, 0.6, 0.07, 18),
                1e-12, "reduced form");
    }

    @Test
    void trends() {
        double base = KaysLondonCorePressureDrop.pressureDrop(5, 1.2, 1.2, 0.55, 0.06, 20, 0, 0);
        assertThat(KaysLondonCorePressureDrop.pressureDrop(6, 1.2, 1.2, 0.55, 0.06, 20, 0, 0)).isGreaterThan(base);
        assertThat(KaysLondonCorePressureDrop.pressureDrop(5, 1.2, 1.2, 0.55, 0.06, 20, 0.4, 0.1)).isGreaterThan(base);
        // heating (density falls through the core) accelerates the flow and adds pressure drop
        assertThat(KaysLondonCorePressureDrop.pressureDrop(5, 1.2, 1.1, 0.55, 0.06, 20, 0, 0)).isGreaterThan(base);
        assertThat(KaysLondonCorePressureDrop.pressureDrop(0, 1.2, 1.1, 0.55, 0.06, 20, 0.4, 0.1)).isZero();
        Reference.assertRelative(1.1478260869565218, KaysLondonCorePressureDrop.meanDensity(1.2, 1.1), 1e-12,
                "mean density on mean specific volume");
    }

    @Test
    void invalidInputIsRejected() {
        assertThatThrownBy(() -> KaysLondonCorePressureDrop.withoutEndLosses(5, 0, 1.1, 0.5, 0.06, 20))
                .isInstanceOf(InputException.class).hasMessageContaining("rhoIn");
        assertThatThrownBy(() -> KaysLondonCorePressureDrop.withoutEndLosses(5, 1.2, 1.1, 1.5, 0.06, 20))
                .isInstanceOf(InputException.class).hasMessageContaining("sigma");
        assertThatThrownBy(() -> KaysLondonCorePressureDrop.withoutEndLosses(-1, 1.2, 1.1, 0.5, 0.06, 20))
                .isInstanceOf(InputException.class).hasMessageContaining("massVelocity");
        assertThatThrownBy(() -> KaysLondonCorePressureDrop.pressureDrop(5, 1.2, 1.1, 0.5, 0.06, 20, Double.NaN, 0))
                .isInstanceOf(InputException.class).hasMessageContaining("kc");
    }
}
