package org.finstack.study.pressure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** The ASME B31 straight-pipe rule against hand calculation and the copper tube handbook's table. */
class AsmeB31StraightPipeTest {

    /** 1 psi in pascal: 0.45359237 kg x 9.80665 m/s2 / (0.0254 m)^2 (NIST SP 811, Appendix B). */
    private static final double PSI = 0.45359237 * 9.80665 / (0.0254 * 0.0254);
    private static final double INCH = 0.0254;

    private static double pressure(double stressPsi, double odInch, double wallInch) {
        return AsmeB31StraightPipe.allowablePressure(stressPsi * PSI, 1, odInch * INCH, wallInch * INCH, 0,
                Warnings.discard());
    }

    /**
     * The Javadoc's worked example, by hand from the printed formula P = 2 S t / (D - 0.8 t)
     * (Copper Tube Handbook): 2 x 6000 x 0.030 / (0.375 - 0.024) = 1025.641 psi.
     */
    @Test
    void workedExampleThreeEighthsInchBy0030AnnealedCopperAt100F() {
        double p = pressure(6000, 0.375, 0.030);
        Reference.assertRelative(1025.641 * PSI, p, 1e-6, "3/8 x 0.030 in, S = 6000 psi");
        Reference.assertRelative(7.0715e6, p, 1e-4, "Javadoc value 7.0715 MPa");
    }

    /**
     * Copper Development Association, Copper Tube Handbook, Table 3c (Type M, annealed, 100 F,
     * S = 6000 psi, read): 1/2 in 494, 3/4 in 407, 1 in 337, 1-1/4 in 338, 1-1/2 in 331, 2 in 299 psi.
     * Type M outside diameters are the nominal size plus 1/8 in and walls 0.028, 0.032, 0.035,
     * 0.042, 0.049, 0.058 in (ASTM B88, as listed on public tube tables, read). The handbook rates
     * the minimum wall; taken here as 90 % of nominal (ASTM B88 wall tolerance about 10 %, from
     * memory), the rule reproduces the table within 2.5 %.
     */
    @Test
    void copperTubeHandbookTable3cTypeMWithMinimumWall() {
        double[][] rows = {
            {0.625, 0.028, 494}, {0.875, 0.032, 407}, {1.125, 0.035, 337},
            {1.375, 0.042, 338}, {1.625, 0.049, 331}, {2.125, 0.058, 299},
        };
        for (double[] r : rows) {
            Reference.assertRelative(r[2] * PSI, pressure(6000, r[0], 0.9 * r[1]), 0.025,
                    "CDA Table 3c Type M OD " + r[0] + " in, minimum wall 0.9 x " + r[1] + " in");
        }
    }

    /**
     * The same table with nominal walls: the rule must lie above the handbook's values (which use
     * the minimum wall) by no more than the wall tolerance, i.e. between 1.00 and 1.15 times them.
     */
    @Test
    void nominalWallsOverstateTable3cByNoMoreThanTheWallTolerance() {
        double[][] rows = {
            {0.625, 0.028, 494}, {0.875, 0.032, 407}, {1.125, 0.035, 337},
            {1.375, 0.042, 338}, {1.625, 0.049, 331}, {2.125, 0.058, 299},
        };
        for (double[] r : rows) {
            double ratio = pressure(6000, r[0], r[1]) / (r[2] * PSI);
            assertThat(ratio).as("OD %s in", r[0]).isBetween(1.0, 1.15);
        }
    }

    @Test
    void thickerWallGivesHigherPressureAndLargerDiameterLower() {
        double previous = 0;
        for (double wall = 0.2e-3; wall < 1.5e-3; wall += 0.1e-3) {
            double p = AsmeB31StraightPipe.allowablePressure(40e6, 1, 9.52e-3, wall, 0, Warnings.discard());
            assertThat(p).as("wall %s m", wall).isGreaterThan(previous);
            previous = p;
        }
        previous = Double.MAX_VALUE;
        for (double d = 5e-3; d < 30e-3; d += 1e-3) {
            double p = AsmeB31StraightPipe.allowablePressure(40e6, 1, d, 0.5e-3, 0, Warnings.discard());
            assertThat(p).as("diameter %s m", d).isLessThan(previous);
            previous = p;
        }
    }

    /** By hand: E = 0.85 scales P by 0.85 exactly only with the same t; c = 0.1 mm acts as a thinner wall. */
    @Test
    void jointFactorAndCorrosionAllowanceLowerThePressure() {
        double p = AsmeB31StraightPipe.allowablePressure(100e6, 1, 20e-3, 1e-3, 0, Warnings.discard());
        double welded = AsmeB31StraightPipe.allowablePressure(100e6, 0.85, 20e-3, 1e-3, 0, Warnings.discard());
        double corroded = AsmeB31StraightPipe.allowablePressure(100e6, 1, 20e-3, 1e-3, 0.1e-3, Warnings.discard());
        Reference.assertRelative(0.85 * p, welded, 1e-12, "E = 0.85");
        // 2 x 100e6 x 0.9e-3 / (20e-3 - 0.8 x 0.9e-3) = 180000 / 0.01928
        Reference.assertRelative(180000 / 0.01928, corroded, 1e-12, "c = 0.1 mm");
    }

    @Test
    void thickWallWarnsButStillRates() {
        Warnings w = new Warnings();
        double p = AsmeB31StraightPipe.allowablePressure(40e6, 1, 10e-3, 2e-3, 0, w);
        assertThat(p).isPositive().isFinite();
        assertThat(w.list()).singleElement().asString().contains("t/D").contains("0.2");
        Warnings thin = new Warnings();
        AsmeB31StraightPipe.allowablePressure(40e6, 1, 10e-3, 0.5e-3, 0, thin);
        assertThat(thin.isEmpty()).isTrue();
    }

    @Test
    void impossibleInputsAreRefusedNamingTheField() {
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(40e6, 1, 10e-3, 5e-3, 0, Warnings.discard()))
                .isInstanceOfSatisfying(InputException.class, e -> {
                    assertThat(e.field()).isEqualTo("wall");
                    assertThat(e.msg()).isEqualTo(Msg.WALL_NOT_BELOW_RADIUS);
                });
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(40e6, 1, 10e-3, 0, 0, Warnings.discard()))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("wall"));
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(40e6, 1, 10e-3, Double.NaN, 0,
                Warnings.discard())).isInstanceOfSatisfying(InputException.class,
                        e -> assertThat(e.field()).isEqualTo("wall"));
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(40e6, 1.2, 10e-3, 1e-3, 0, Warnings.discard()))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("jointFactor"));
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(40e6, 1, 10e-3, 1e-3, 1e-3, Warnings.discard()))
                .isInstanceOfSatisfying(InputException.class,
                        e -> assertThat(e.field()).isEqualTo("corrosionAllowance"));
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(-1, 1, 10e-3, 1e-3, 0, Warnings.discard()))
                .isInstanceOfSatisfying(InputException.class, e -> assertThat(e.field()).isEqualTo("allowableStress"));
        assertThatThrownBy(() -> AsmeB31StraightPipe.allowablePressure(40e6, 1, Double.POSITIVE_INFINITY, 1e-3, 0,
                Warnings.discard())).isInstanceOfSatisfying(InputException.class,
                        e -> assertThat(e.field()).isEqualTo("outsideDiameter"));
    }
}
