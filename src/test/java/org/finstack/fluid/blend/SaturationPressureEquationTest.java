package org.finstack.fluid.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * The bubble/dew pressure equation form of Lemmon (2003), with the R-410A bubble-point
 * coefficients (N = -7.2818, 2.5093, -3.2695, -2.8022; k = 1.0, 1.8, 2.4, 4.9; Tc = 344.494 K,
 * pc = 4.9012 MPa; the paper's values as carried by CoolProp 8.0.0's copy). Its source is Lemmon
 * (2003), Int. J. Thermophys. 24:991; the checks are the equation's own invariants.
 */
class SaturationPressureEquationTest {

    private static final SaturationPressureEquation R410A_BUBBLE = new SaturationPressureEquation(344.494, 4.9012e6,
            new double[] {-7.2818, 2.5093, -3.2695, -2.8022}, new double[] {1.0, 1.8, 2.4, 4.9});

    /** At Tc the equation gives pc; below, the closed form evaluated by hand. */
    @Test
    void closedFormAndCriticalPoint() {
        assertEquals(4.9012e6, R410A_BUBBLE.pressure(344.494), 1e-6);
        double t = 273.15;
        double th = 1 - t / 344.494;
        double expected = 4.9012e6 * Math.exp(344.494 / t * (-7.2818 * th + 2.5093 * Math.pow(th, 1.8)
                - 3.2695 * Math.pow(th, 2.4) - 2.8022 * Math.pow(th, 4.9)));
        assertEquals(expected, R410A_BUBBLE.pressure(t), 1e-9 * expected);
    }

    /** The analytic slope against a central difference. */
    @Test
    void logSlopeMatchesCentralDifference() {
        for (double t = 210; t < 344; t += 13) {
            double h = 1e-4;
            double fd = (Math.log(R410A_BUBBLE.pressure(t + h)) - Math.log(R410A_BUBBLE.pressure(t - h))) / (2 * h);
            assertEquals(fd, R410A_BUBBLE.logSlope(t), 1e-6 * Math.abs(fd), "at " + t + " K");
        }
    }

    @Test
    void inverseReturnsTheTemperature() {
        for (double t = 200; t < 344.4; t += 7.3) {
            assertEquals(t, R410A_BUBBLE.temperature(R410A_BUBBLE.pressure(t), 200, 344.494), 1e-9 * t);
        }
        assertEquals(200, R410A_BUBBLE.temperature(1, 200, 344.494));
    }

    @Test
    void rejectsMismatchedCoefficients() {
        assertThrows(IllegalArgumentException.class,
                () -> new SaturationPressureEquation(300, 1e6, new double[] {1, 2}, new double[] {1}));
        assertThrows(IllegalArgumentException.class,
                () -> new SaturationPressureEquation(0, 1e6, new double[] {1}, new double[] {1}));
    }
}
