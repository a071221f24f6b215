package org.finstack.study.fan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Fan curve validation, operating points against hand-computed cases, and refusals. */
class FanCurveTest {

    /**
     * Linear fan curve p = p0 (1 - Q/Qmax) against dp = k Q^2: the operating point is the positive
     * root of k Q^2 + (p0/Qmax) Q - p0 = 0, solved here in closed form (quadratic formula).
     * The monotone interpolant reproduces straight lines exactly, so the agreement is to solver
     * tolerance.
     */
    @Test
    void linearFanCurveAgainstQuadraticSystemMatchesTheClosedFormRoot() {
        double[][] cases = {{250, 2, 60}, {120, 0.8, 500}, {400, 5, 3}, {80, 1.2, 10_000}};
        for (double[] c : cases) {
            double p0 = c[0];
            double qMax = c[1];
            double k = c[2];
            FanCurve curve = new FanCurve(new double[] {0, qMax / 3, qMax}, new double[] {p0, p0 * 2 / 3, 0});
            double a = p0 / qMax;
            double q = (-a + Math.sqrt(a * a + 4 * k * p0)) / (2 * k);
            OperatingPoint op = curve.operatingPoint(flow -> k * flow * flow);
            String ctx = "p0=" + p0 + " Qmax=" + qMax + " k=" + k;
            Reference.assertRelative(q, op.flow(), 1e-10, ctx + " flow");
            Reference.assertRelative(k * q * q, op.staticPressure(), 1e-9, ctx + " pressure");
        }
    }

    /** Javadoc worked example: (0, 250), (2, 0) against 60 Q^2 gives 1.25 m3/s and 93.75 Pa. */
    @Test
    void javadocWorkedExample() {
        OperatingPoint op = new FanCurve(new double[] {0, 2}, new double[] {250, 0}).operatingPoint(q -> 60 * q * q);
        Reference.assertRelative(1.25, op.flow(), 1e-12, "operating flow");
        Reference.assertRelative(93.75, op.staticPressure(), 1e-10, "operating pressure");
    }

    @Test
    void systemAboveShutOffPressureIsRefused() {
        FanCurve curve = new FanCurve(new double[] {0, 1, 2}, new double[] {200, 150, 0});
        assertThatThrownBy(() -> curve.operatingPoint(q -> 250 + 10 * q))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("the fan cannot move air through this coil");
    }

    /** A curve that stops before free delivery: an operating point beyond its end is refused. */
    @Test
    void operatingPointBeyondTheLastPointIsRefused() {
        FanCurve curve = new FanCurve(new double[] {0, 1, 2}, new double[] {200, 150, 100});
        assertThatThrownBy(() -> curve.operatingPoint(q -> 5 * q * q))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("beyond the fan curve's last point");
        assertThat(curve.operatingPoint(q -> 40 * q * q).flow()).isBetween(1.0, 2.0);
    }

    @Test
    void flowBeyondTheCurveIsRefusedNotExtrapolated() {
        FanCurve curve = new FanCurve(new double[] {0.5, 1, 2}, new double[] {200, 150, 0});
        assertThatThrownBy(() -> curve.pressure(2.01)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("fan.flow:");
        assertThatThrownBy(() -> curve.pressure(0.4)).isInstanceOf(InputException.class);
    }

    @Test
    void badPointsAreRejectedNamingTheField() {
        assertThatThrownBy(() -> new FanCurve(new double[] {0, 1, 2}, new double[] {200, 210, 0}))
                .isInstanceOf(InputException.class).hasMessageStartingWith("fan.curve[1].pressure:")
                .hasMessageContaining("must not rise");
        assertThatThrownBy(() -> new FanCurve(new double[] {0, 1, 1}, new double[] {200, 100, 0}))
                .isInstanceOf(InputException.class).hasMessageStartingWith("fan.curve[2].flow:");
        assertThatThrownBy(() -> new FanCurve(new double[] {0}, new double[] {200}))
                .isInstanceOf(InputException.class).hasMessageStartingWith("fan.curve:")
                .hasMessageContaining("at least 2 points");
        assertThatThrownBy(() -> new FanCurve(new double[] {0, 1}, new double[] {200, -1}))
                .isInstanceOf(InputException.class).hasMessageStartingWith("fan.curve[1].pressure:");
        assertThatThrownBy(() -> new FanCurve(new double[] {Double.NaN, 1}, new double[] {200, 1}))
                .isInstanceOf(InputException.class).hasMessageStartingWith("fan.curve[0].flow:");
    }

    @Test
    void nonFiniteOrNegativeSystemCurveIsRejected() {
        FanCurve curve = new FanCurve(new double[] {0, 2}, new double[] {250, 0});
        assertThatThrownBy(() -> curve.operatingPoint(q -> Double.NaN)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("systemCurve:");
        assertThatThrownBy(() -> curve.operatingPoint(q -> -1)).isInstanceOf(InputException.class)
                .hasMessageStartingWith("systemCurve:");
    }

    /** Fan laws (ASHRAE Handbook Fans chapter, from memory): flows times n, pressures times n^2. */
    @Test
    void curveAtAnotherSpeedFollowsTheFanLaws() {
        FanCurve curve = new FanCurve(new double[] {0, 1, 2}, new double[] {200, 150, 0});
        FanCurve faster = curve.atSpeedRatio(1.25);
        assertThat(faster.flows()).containsExactly(0, 1.25, 2.5);
        assertThat(faster.pressures()).containsExactly(312.5, 234.375, 0);
        Reference.assertRelative(1.5625 * curve.pressure(0.8), faster.pressure(1.0), 1e-12, "similar point");
    }
}
