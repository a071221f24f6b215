package org.finstack.study.fan;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/**
 * The fan laws (ASHRAE Handbook - HVAC Systems and Equipment, Fans chapter, Fan Laws; from
 * memory): Q ~ N D^3, p ~ N^2 D^2 rho, P ~ N^3 D^5 rho.
 */
class FanLawsTest {

    /** Javadoc worked example: 1.0 m3/s, 120 Pa, 250 W at 1.2 times the speed. */
    @Test
    void javadocWorkedExample() {
        Reference.assertRelative(1.2, FanLaws.flow(1.0, 1.2), 1e-15, "flow");
        Reference.assertRelative(172.8, FanLaws.pressure(120, 1.2), 1e-15, "pressure");
        Reference.assertRelative(432, FanLaws.power(250, 1.2), 1e-15, "power");
    }

    /** Doubling the speed doubles the flow, quadruples the pressure, multiplies power by eight. */
    @Test
    void doublingTheSpeed() {
        Reference.assertRelative(2, FanLaws.flow(1, 2), 0, "flow");
        Reference.assertRelative(4, FanLaws.pressure(1, 2), 0, "pressure");
        Reference.assertRelative(8, FanLaws.power(1, 2), 0, "power");
    }

    /** Same speed, size 10 % larger, air 5 % denser. */
    @Test
    void sizeAndDensity() {
        Reference.assertRelative(1.331, FanLaws.flow(1, 1, 1.1), 1e-14, "flow ~ D^3");
        Reference.assertRelative(1.21 * 1.05, FanLaws.pressure(1, 1, 1.1, 1.05), 1e-14, "p ~ D^2 rho");
        Reference.assertRelative(1.61051 * 1.05, FanLaws.power(1, 1, 1.1, 1.05), 1e-14, "P ~ D^5 rho");
    }

    @Property(tries = 300)
    void roundTripReturnsTheStartingPoint(@ForAll @DoubleRange(min = 0.01, max = 20) double q,
            @ForAll @DoubleRange(min = 1, max = 2000) double p,
            @ForAll @DoubleRange(min = 1, max = 20000) double power,
            @ForAll @DoubleRange(min = 0.2, max = 5) double n,
            @ForAll @DoubleRange(min = 0.5, max = 2) double d,
            @ForAll @DoubleRange(min = 0.7, max = 1.4) double rho) {
        Reference.assertRelative(q, FanLaws.flow(FanLaws.flow(q, n, d), 1 / n, 1 / d), 1e-13, "flow");
        Reference.assertRelative(p, FanLaws.pressure(FanLaws.pressure(p, n, d, rho), 1 / n, 1 / d, 1 / rho),
                1e-13, "pressure");
        Reference.assertRelative(power, FanLaws.power(FanLaws.power(power, n, d, rho), 1 / n, 1 / d, 1 / rho),
                1e-13, "power");
    }

    /** At a fixed size the laws keep p/Q^2 and P/Q^3 constant (a fan-law parabola through the origin). */
    @Property(tries = 200)
    void pressureGoesWithFlowSquaredAndPowerWithFlowCubed(@ForAll @DoubleRange(min = 0.1, max = 5) double n) {
        double q = FanLaws.flow(2, n);
        Reference.assertRelative(100.0 / 4, FanLaws.pressure(100, n) / (q * q), 1e-13, "p/Q^2");
        Reference.assertRelative(300.0 / 8, FanLaws.power(300, n) / (q * q * q), 1e-13, "P/Q^3");
        Reference.assertRelative(n, FanLaws.speedRatioForFlow(2, q), 1e-14, "speed for flow");
    }

    @Test
    void rejectsNonPositiveRatios() {
        assertThatThrownBy(() -> FanLaws.flow(1, 0)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("speedRatio:");
        assertThatThrownBy(() -> FanLaws.power(1, 1, 1, Double.NaN)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("densityRatio:");
    }
}
