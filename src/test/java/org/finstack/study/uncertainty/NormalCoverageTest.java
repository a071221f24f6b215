package org.finstack.study.uncertainty;

import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.finstack.testing.Reference.assertRelative;

import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** The normal coverage factor against scipy.stats.norm.ppf and the GUM's Table G.1. */
class NormalCoverageTest {

    /** Reference: uncertainty_normal_coverage.csv (scipy, scripts/uncertainty_normal_coverage.py). */
    @Test
    void coverageFactorAndSigmaMatchScipy() {
        for (double[] row : Reference.csv("/reference/uncertainty_normal_coverage.csv")) {
            String ctx = "share " + row[0] + " band " + row[1];
            assertRelative(row[2], NormalCoverage.coverageFactor(row[0]), 1e-9, ctx + " k");
            assertRelative(row[3], NormalCoverage.sigma(row[0], row[1]), 1e-9, ctx + " sigma");
        }
    }

    /** JCGM 100:2008 Table G.1: p = 95 % gives k = 1.960, p = 99 % gives k = 2.576 (as printed there). */
    @Test
    void gumTableG1() {
        assertRelative(1.960, NormalCoverage.coverageFactor(0.95), 1e-3, "GUM G.1, 95 %");
        assertRelative(2.576, NormalCoverage.coverageFactor(0.99), 1e-3, "GUM G.1, 99 %");
    }

    /** The Javadoc's worked example, verbatim: 88.6 % within ±15 % gives sigma = 0.0949087. */
    @Test
    void javadocExample() {
        assertRelative(1.580467, NormalCoverage.coverageFactor(0.886), 1e-6, "k");
        assertRelative(0.0949087, NormalCoverage.sigma(0.886, 0.15), 1e-6, "sigma");
        assertRelative(1.2815516, NormalCoverage.p90Factor(), 1e-7, "Phi^-1(0.9), scipy norm.ppf(0.9)");
    }

    @Test
    void refusesSharesOutsideTheOpenUnitInterval() {
        assertThatThrownBy(() -> NormalCoverage.sigma(1.0, 0.15)).isInstanceOf(InputException.class).hasMessageStartingWith("share");
        assertThatThrownBy(() -> NormalCoverage.sigma(0.0, 0.15)).isInstanceOf(InputException.class).hasMessageStartingWith("share");
        assertThatThrownBy(() -> NormalCoverage.sigma(0.9, 0)).isInstanceOf(InputException.class).hasMessageStartingWith("band");
    }
}
