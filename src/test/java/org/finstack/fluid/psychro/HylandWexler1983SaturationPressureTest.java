package org.finstack.fluid.psychro;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.core.InputException;
import org.finstack.core.OutOfRangeException;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;

/** Checks of the Hyland &amp; Wexler (1983) saturation pressure against ASHRAE Ch. 1 Table 3. */
class HylandWexler1983SaturationPressureTest {

    private static final double K = 273.15;

    /**
     * ASHRAE Fundamentals 2017 Ch. 1 Table 3 (thermodynamic properties of water at saturation),
     * as quoted in PsychroLib's test suite (tests/test_psychrolib_si.py). Table 3 comes from the
     * IAPWS-95 formulation; eqs. 5/6 stay within 300 ppm of it, which is the tolerance here.
     */
    @Test
    void ashraeTable3SaturationPressure() {
        double[][] table = {
            {-20, 103.24}, {-5, 401.74}, {5, 872.6}, {25, 3169.7},
            {50, 12351.3}, {100, 101418.0}, {150, 476101.4},
        };
        for (double[] row : table) {
            assertRelative(row[1], HylandWexler1983SaturationPressure.pressure(row[0] + K), 3e-4,
                    "p_ws at " + row[0] + " C, ASHRAE Fundamentals 2017 Ch.1 Table 3");
        }
    }

    /** ASHRAE Fundamentals 2017 Ch.1 Table 3 at -60 C: 1.08 Pa, printed to 0.01 Pa (as quoted in PsychroLib's tests). */
    @Test
    void ashraeTable3AtMinus60() {
        assertThat(HylandWexler1983SaturationPressure.pressure(-60 + K)).isCloseTo(1.08, Offset.offset(0.01));
    }

    /** ASHRAE Fundamentals 2017 Ch.1 Table 3 at 20 C: 2.3393 kPa (from memory), within 300 ppm. */
    @Test
    void ashraeTable3At20C() {
        assertRelative(2339.3, HylandWexler1983SaturationPressure.pressure(20 + K), 3e-4,
                "p_ws at 20 C, ASHRAE Fundamentals 2017 Ch.1 Table 3 (from memory)");
    }

    /** The worked example of the class Javadoc: 2338.80 Pa at 293.15 K (PsychroLib 1.1.1 gives 2338.8037 Pa). */
    @Test
    void workedExample() {
        assertRelative(2338.80, HylandWexler1983SaturationPressure.pressure(293.15), 5e-6, "Javadoc example");
    }

    /**
     * Both branches meet at the triple point, 273.16 K and 611.657 Pa (IAPWS triple-point
     * pressure, from memory); the pressure is continuous across the switch.
     */
    @Test
    void continuousAtTriplePoint() {
        double below = HylandWexler1983SaturationPressure.pressure(273.16);
        double above = HylandWexler1983SaturationPressure.pressure(Math.nextUp(273.16));
        assertRelative(611.657, below, 1e-5, "ice branch at the triple point");
        assertRelative(below, above, 1e-7, "liquid branch just above the triple point");
    }

    @Test
    void increasingOverTheWholeRange() {
        double previous = 0;
        for (double t = 173.15; t <= 473.15; t += 0.5) {
            double p = HylandWexler1983SaturationPressure.pressure(t);
            assertThat(p).as("p_ws at %s K", t).isGreaterThan(previous);
            previous = p;
        }
    }

    /** The analytical slope against a central difference of the pressure itself. */
    @Test
    void slopeMatchesCentralDifference() {
        for (double t = 180; t <= 470; t += 7.3) {
            double h = 1e-3;
            double fd = (HylandWexler1983SaturationPressure.pressure(t + h)
                    - HylandWexler1983SaturationPressure.pressure(t - h)) / (2 * h);
            assertRelative(fd, HylandWexler1983SaturationPressure.slope(t), 1e-6, "dp_ws/dT at " + t + " K");
        }
    }

    @Test
    void refusesTemperaturesOutsideTheFormulation() {
        assertThatThrownBy(() -> HylandWexler1983SaturationPressure.pressure(173.14))
                .isInstanceOf(OutOfRangeException.class).hasMessageContaining("moist air");
        assertThatThrownBy(() -> HylandWexler1983SaturationPressure.pressure(473.16))
                .isInstanceOf(OutOfRangeException.class);
        assertThatThrownBy(() -> HylandWexler1983SaturationPressure.pressure(Double.NaN))
                .isInstanceOf(InputException.class);
        assertThat(HylandWexler1983SaturationPressure.pressure(173.15)).isPositive();
        assertThat(HylandWexler1983SaturationPressure.pressure(473.15)).isFinite();
    }
}
