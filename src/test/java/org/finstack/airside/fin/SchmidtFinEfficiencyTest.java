package org.finstack.airside.fin;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import java.util.List;
import java.util.Locale;
import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** Checks of {@link SchmidtFinEfficiency}. */
class SchmidtFinEfficiencyTest {

    private static final SchmidtFinEfficiency SCHMIDT = SchmidtFinEfficiency.INSTANCE;

    /** The Javadoc example, repeated verbatim (values computed independently with numpy). */
    @Test
    void javadocExample() {
        PlateFinCell cell = new PlateFinCell(10.23e-3, 0.13e-3, 25.4e-3, 22e-3, true);
        assertRelative(2.63841, SchmidtFinEfficiency.equivalentRadiusRatio(cell), 2e-6,
                "Schmidt Javadoc example Re/r");
        Warnings w = new Warnings();
        assertRelative(0.842629, SCHMIDT.efficiency(cell, 60, 200, w), 1e-6, "Schmidt Javadoc example eta");
        assertThat(w.isEmpty()).isTrue();
    }

    /**
     * Schmidt's closed form against the exact annular-fin solution (Gardner 1945) at the same
     * equivalent radius: within 2 % wherever the exact efficiency is at least 0.5, over collar
     * diameters 7 to 16.5 mm, pitches 1.3 to 3.5 Dc, both layouts, h 10 to 300, k 15 to 380
     * (Schmidt 1949 claims agreement within a few percent; 2 % is the bound stated in
     * SchmidtFinEfficiency.VALIDITY).
     */
    @Test
    void agreesWithExactAnnularSolutionWithinTwoPercent() {
        int compared = 0;
        for (double dc : new double[] {7.3e-3, 10.23e-3, 16.5e-3}) {
            for (double pt : new double[] {1.3, 2.0, 3.5}) {
                for (double pl : new double[] {1.3, 2.0, 3.5}) {
                    for (boolean staggered : new boolean[] {true, false}) {
                        PlateFinCell cell = new PlateFinCell(dc, 0.12e-3, pt * dc, pl * dc, staggered);
                        for (double h : new double[] {10, 40, 100, 300}) {
                            for (double k : new double[] {15, 200, 380}) {
                                double exact = AnnularFinEfficiency.INSTANCE.efficiency(cell, h, k, Warnings.discard());
                                if (exact < 0.5) {
                                    continue;
                                }
                                compared++;
                                double eta = SCHMIDT.efficiency(cell, h, k, Warnings.discard());
                                assertRelative(exact, eta, 0.02, String.format(Locale.ROOT,
                                        "Schmidt vs exact annular, %s h=%g k=%g", cell, h, k));
                            }
                        }
                    }
                }
            }
        }
        assertThat(compared).isGreaterThan(300);
    }

    /**
     * Against a two-dimensional finite-difference solution of the continuous plate fin on the
     * symmetry rectangle of the tube lattice (reference/fin_plate2d_fd.csv, scripts/
     * gen_fin_reference.py; discretisation error below 2e-5): within 4 % over 24 cases of both
     * layouts with eta 0.31 to 0.95 (Schmidt claims a few percent; largest deviation found 3.5 %).
     */
    @Test
    void agreesWithTwoDimensionalPlateFinSolution() {
        List<double[]> rows = Reference.csv("/reference/fin_plate2d_fd.csv");
        assertThat(rows).hasSize(24);
        for (double[] r : rows) {
            assertThat(r[8]).as("discretisation error of the reference").isLessThan(2e-5);
            PlateFinCell cell = new PlateFinCell(r[0], r[1], r[2], r[3], r[4] != 0);
            double eta = SCHMIDT.efficiency(cell, r[5], r[6], Warnings.discard());
            assertRelative(r[7], eta, 0.04, String.format(Locale.ROOT,
                    "Schmidt vs 2-D plate fin, %s h=%g k=%g", cell, r[5], r[6]));
        }
    }

    /**
     * The equivalent radius is close to the radius of the circle of the cell's own area
     * (Pt Pl = pi Re²): within 2 % for the square and the regular hexagon, and within 10 % over
     * pitches 1.5 to 3.5 Dc across and 1.2 to 3.5 Dc along the flow (with M as the shorter
     * half-side of an in-line cell; taking M = Pt/2 regardless would miss by 27 % at Pt/Pl = 2.9).
     */
    @Test
    void equivalentRadiusIsNearTheEqualAreaRadius() {
        double dc = 10e-3;
        PlateFinCell square = new PlateFinCell(dc, 1e-4, 25e-3, 25e-3, false);
        assertRelative(Math.sqrt(25e-3 * 25e-3 / Math.PI) / (dc / 2),
                SchmidtFinEfficiency.equivalentRadiusRatio(square), 0.02, "square cell vs equal area");
        double pl = 25e-3 * Math.sqrt(3) / 2;
        PlateFinCell hexagon = new PlateFinCell(dc, 1e-4, 25e-3, pl, true);
        assertRelative(Math.sqrt(25e-3 * pl / Math.PI) / (dc / 2),
                SchmidtFinEfficiency.equivalentRadiusRatio(hexagon), 0.02, "regular hexagon vs equal area");
        for (double pt = 1.5; pt <= 3.5; pt += 0.25) {
            for (double p = 1.2; p <= 3.5; p += 0.25) {
                for (boolean staggered : new boolean[] {true, false}) {
                    PlateFinCell cell = new PlateFinCell(dc, 1e-4, pt * dc, p * dc, staggered);
                    double equalArea = Math.sqrt(pt * dc * p * dc / Math.PI) / (dc / 2);
                    assertRelative(equalArea, SchmidtFinEfficiency.equivalentRadiusRatio(cell), 0.10,
                            "equal-area radius for " + cell);
                }
            }
        }
    }

    /** In line, M is half the shorter side (beta = L/M >= 1), so swapping the pitches changes nothing. */
    @Test
    void inlineTakesTheShorterSideAsM() {
        PlateFinCell a = new PlateFinCell(10e-3, 1e-4, 25.4e-3, 22e-3, false);
        PlateFinCell b = new PlateFinCell(10e-3, 1e-4, 22e-3, 25.4e-3, false);
        double byHand = 1.28 * (11e-3 / 5e-3) * Math.sqrt(12.7 / 11 - 0.2);
        assertRelative(byHand, SchmidtFinEfficiency.equivalentRadiusRatio(a), 1e-14, "Re/r with M = Pl/2");
        assertThat(SchmidtFinEfficiency.equivalentRadiusRatio(b))
                .isEqualTo(SchmidtFinEfficiency.equivalentRadiusRatio(a));
    }

    /** Staggered: XM = Pt/2 and XL = half the diagonal pitch, as Wang, Chi &amp; Chang define them. */
    @Test
    void staggeredUsesHalfTransverseAndHalfDiagonalPitch() {
        PlateFinCell cell = new PlateFinCell(10e-3, 1e-4, 21e-3, 12.7e-3, true);
        double xm = 10.5;
        double xl = Math.hypot(10.5, 12.7) / 2;
        assertRelative(1.27 * (xm / 5) * Math.sqrt(xl / xm - 0.3),
                SchmidtFinEfficiency.equivalentRadiusRatio(cell), 1e-14, "Re/r staggered");
        assertRelative(0.0, SchmidtFinEfficiency.phi(1.0), 0, "phi(1) = 0");
        assertRelative((2.0 - 1) * (1 + 0.35 * Math.log(2.0)), SchmidtFinEfficiency.phi(2.0), 1e-15, "phi(2)");
    }

    /** Invariants: falls as h rises, as pitches grow, as the fin thins; tends to 1 as h -> 0; in (0, 1]. */
    @Test
    void trendsAndLimits() {
        PlateFinCell cell = new PlateFinCell(9.5e-3, 0.11e-3, 25.4e-3, 19.05e-3, true);
        double prev = 1.0;
        for (double h = 1; h < 1e5; h *= 1.3) {
            double eta = SCHMIDT.efficiency(cell, h, 200, Warnings.discard());
            assertThat(eta).as("eta at h = %s", h).isLessThan(prev).isPositive();
            prev = eta;
        }
        prev = 1.0;
        for (double pt = 12e-3; pt < 60e-3; pt += 1e-3) {
            double eta = SCHMIDT.efficiency(new PlateFinCell(9.5e-3, 0.11e-3, pt, 19.05e-3, true), 60, 200,
                    Warnings.discard());
            assertThat(eta).as("eta at Pt = %s", pt).isLessThan(prev);
            prev = eta;
        }
        prev = 1.0;
        for (double pl = 12e-3; pl < 60e-3; pl += 1e-3) {
            double eta = SCHMIDT.efficiency(new PlateFinCell(9.5e-3, 0.11e-3, 25.4e-3, pl, false), 60, 200,
                    Warnings.discard());
            assertThat(eta).as("eta at Pl = %s", pl).isLessThan(prev);
            prev = eta;
        }
        prev = 0.0;
        for (double t = 0.05e-3; t < 3e-3; t *= 1.2) {
            double eta = SCHMIDT.efficiency(new PlateFinCell(9.5e-3, t, 25.4e-3, 19.05e-3, true), 60, 200,
                    Warnings.discard());
            assertThat(eta).as("eta at t = %s", t).isGreaterThan(prev);
            prev = eta;
        }
        assertThat(SCHMIDT.efficiency(cell, 1e-9, 200, Warnings.discard())).isLessThanOrEqualTo(1.0)
                .isGreaterThan(1 - 1e-10);
        assertThat(SCHMIDT.efficiency(cell, Double.MIN_VALUE, 200, Warnings.discard())).isEqualTo(1.0);
    }

    /** Outside the stated range the method still answers and adds a warning naming the variable. */
    @Test
    void warnsOutsideItsRange() {
        Warnings w = new Warnings();
        PlateFinCell thick = new PlateFinCell(10e-3, 1e-3, 25e-3, 22e-3, true);
        SCHMIDT.efficiency(thick, 5000, 10, w);
        assertThat(w.list()).anyMatch(s -> s.contains("Bi =")).anyMatch(s -> s.contains("eta ="));
        Warnings wide = new Warnings();
        SCHMIDT.efficiency(new PlateFinCell(7e-3, 1e-4, 70e-3, 60e-3, false), 2, 200, wide);
        assertThat(wide.list()).singleElement().asString().contains("Re/r");
    }

    /** Invalid input is refused with the field named. */
    @Test
    void rejectsInvalidInputNamingTheField() {
        PlateFinCell cell = new PlateFinCell(10e-3, 0.1e-3, 25e-3, 22e-3, true);
        assertThatThrownBy(() -> SCHMIDT.efficiency(cell, 0, 200, new Warnings()))
                .isInstanceOf(InputException.class).hasMessageStartingWith("h:");
        assertThatThrownBy(() -> SCHMIDT.efficiency(cell, Double.NaN, 200, new Warnings()))
                .isInstanceOf(InputException.class).hasMessageStartingWith("h:");
        assertThatThrownBy(() -> SCHMIDT.efficiency(cell, 50, -3, new Warnings()))
                .isInstanceOf(InputException.class).hasMessageStartingWith("kFin:");
        assertThatThrownBy(() -> SchmidtFinEfficiency.phi(0.5))
                .isInstanceOf(InputException.class).hasMessageStartingWith("reOverR:");
    }
}
