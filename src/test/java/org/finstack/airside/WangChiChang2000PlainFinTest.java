package org.finstack.airside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.fluid.air.DryAir;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class WangChiChang2000PlainFinTest {

    private static final WangChiChang2000PlainFin WANG = WangChiChang2000PlainFin.INSTANCE;

    /** The geometry of the Javadoc worked example. */
    private static AirSideSurface example(int rows) {
        return AirSideSurface.plain(10.23e-3, 25.4e-3, 22.0e-3, 2.23e-3, 0.115e-3, rows, 2.76e-3, true);
    }

    @Test
    void javadocWorkedExample() {
        // values repeated from the class Javadoc; they equal the reference CSV row (N = 2, ReDc = 1000)
        Warnings w = new Warnings();
        JF jf = WANG.evaluate(example(2), 1000, w);
        Reference.assertRelative(0.018925, jf.j(), 2e-5, "worked example j");
        Reference.assertRelative(0.060103, jf.f(), 2e-5, "worked example f");
        assertThat(w.isEmpty()).isTrue();
    }

    @Test
    void referenceTableFromIndependentImplementation() {
        // src/test/resources/reference/airside_wang2000_plain.csv: the published equations
        // evaluated by scripts/gen_airside_wang2000.py (independent Python implementation;
        // no published table of j and f values was available)
        List<double[]> rows = Reference.csv("/reference/airside_wang2000_plain.csv");
        assertThat(rows).hasSize(25);
        for (double[] r : rows) {
            AirSideSurface s = AirSideSurface.plain(r[0], r[2], r[3], r[4], 0.1e-3, (int) r[5], r[1], true);
            JF jf = WANG.evaluate(s, r[6], Warnings.discard());
            String ctx = String.format("Dc=%s Dh=%s Pt=%s Pl=%s Fp=%s N=%d ReDc=%s", r[0], r[1], r[2], r[3], r[4],
                    (int) r[5], r[6]);
            Reference.assertRelative(r[7], jf.j(), 1e-9, "j, " + ctx + " (gen_airside_wang2000.py)");
            Reference.assertRelative(r[8], jf.f(), 1e-9, "f, " + ctx + " (gen_airside_wang2000.py)");
        }
    }

    @Test
    void publishedScatterIsStated() {
        // abstract of Wang, Chi & Chang 2000: 88.6 % of j and 85.1 % of f within +-15 %
        assertThat(WANG.scatterJ()).isEqualTo(0.886);
        assertThat(WANG.scatterF()).isEqualTo(0.851);
        assertThat(WANG.scatterBand()).isEqualTo(0.15);
    }

    @Test
    void jAndFFallWithReynoldsNumber() {
        for (int rows = 1; rows <= 6; rows++) {
            AirSideSurface s = example(rows);
            JF prev = WANG.evaluate(s, 300, Warnings.discard());
            for (double re = 400; re <= 20_000; re *= 1.25) {
                JF jf = WANG.evaluate(s, re, Warnings.discard());
                assertThat(jf.j()).as("j, N=%d, ReDc=%s", rows, re).isLessThan(prev.j());
                assertThat(jf.f()).as("f, N=%d, ReDc=%s", rows, re).isLessThan(prev.f());
                prev = jf;
            }
        }
    }

    @Test
    void moreRowsLowerJAtLowReynoldsNumber() {
        // trend reported by Wang & Chi 2000 (part I) for plain fins: at low Reynolds numbers j
        // falls as rows are added, and the row effect fades as ReDc rises (from memory)
        double prev = Double.MAX_VALUE;
        for (int rows = 1; rows <= 6; rows++) {
            double j = WANG.evaluate(example(rows), 500, Warnings.discard()).j();
            assertThat(j).as("j at ReDc=500, N=%d", rows).isLessThan(prev);
            prev = j;
        }
        double lowRe = rowEffect(500);
        double highRe = rowEffect(2000);
        assertThat(highRe).isLessThan(lowRe);
    }

    private static double rowEffect(double re) {
        double j2 = WANG.evaluate(example(2), re, Warnings.discard()).j();
        double j6 = WANG.evaluate(example(6), re, Warnings.discard()).j();
        return Math.abs(j6 / j2 - 1);
    }

    @Test
    void pressureDropRisesWithVelocityAndFinDensity() {
        double prev = 0;
        for (double u = 1.0; u <= 4.0; u += 0.5) {
            double dp = coreDp(2.2e-3, u);
            assertThat(dp).as("dp at %s m/s", u).isGreaterThan(prev);
            prev = dp;
        }
        assertThat(coreDp(1.6e-3, 2.5)).isGreaterThan(coreDp(2.2e-3, 2.5));
        assertThat(coreDp(1.2e-3, 2.5)).isGreaterThan(coreDp(1.6e-3, 2.5));
    }

    /**
     * Core pressure drop of a 3-row coil (9.52 mm tube, 0.115 mm fin, Pt 25.4, Pl 22 mm) at a
     * face velocity, using the continuous plate-fin unit cell for sigma, A/Amin and Dh.
     */
    private static double coreDp(double fp, double faceVelocity) {
        double t = 0.115e-3;
        double dc = 9.52e-3 + 2 * t;
        double pt = 25.4e-3;
        double pl = 22.0e-3;
        int rows = 3;
        double aMin = (pt - dc) * (fp - t); // per tube and fin pitch
        double aCell = 2 * (pt * pl - Math.PI * dc * dc / 4) + Math.PI * dc * (fp - t); // per tube, row, fin pitch
        double sigma = aMin / (pt * fp);
        double areaRatio = rows * aCell / aMin;
        double dh = 4 * aMin * pl / aCell;
        double rho = DryAir.density(300, 101325);
        double mu = DryAir.viscosity(300);
        double g = rho * faceVelocity / sigma;
        double re = g * dc / mu;
        AirSideSurface s = AirSideSurface.plain(dc, pt, pl, fp, t, rows, dh, true);
        double f = WANG.evaluate(s, re, Warnings.discard()).f();
        return KaysLondonCorePressureDrop.withoutEndLosses(g, rho, rho, sigma, f, areaRatio);
    }

    @Test
    void warningsOutsideThePublishedRange() {
        Warnings inside = new Warnings();
        WANG.evaluate(example(4), 3000, inside);
        assertThat(inside.isEmpty()).isTrue();

        Warnings lowRe = new Warnings();
        JF jf = WANG.evaluate(example(4), 150, lowRe);
        assertThat(jf.j()).isPositive();
        assertThat(lowRe.list()).singleElement().asString()
                .contains("ReDc").contains("150").contains("300 to 20000");

        Warnings geometry = new Warnings();
        AirSideSurface dense = AirSideSurface.plain(10.23e-3, 25.4e-3, 22.0e-3, 0.8e-3, 0.1e-3, 8, 1.0e-3, false);
        WANG.evaluate(dense, 1000, geometry);
        assertThat(geometry.list()).anyMatch(m -> m.contains("Fp = 0.8 mm"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("N = 8"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("Dh = 1 mm"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("inline"));

        Warnings wavy = new Warnings();
        AirSideSurface wavySurface = new AirSideSurface(10.23e-3, 25.4e-3, 22.0e-3, 2.23e-3, 0.115e-3, 2, 2.76e-3,
                true, new AirSideSurface.Pattern.Wavy(1.2e-3, 4.8e-3));
        WANG.evaluate(wavySurface, 1000, wavy);
        assertThat(wavy.list()).anyMatch(m -> m.contains("wavy"));
    }

    @Test
    void uncomputableReynoldsNumberIsRejected() {
        for (double re : new double[] {Double.NaN, -5, 0, 1, Double.POSITIVE_INFINITY, 2e6}) {
            assertThatThrownBy(() -> WANG.evaluate(example(2), re, new Warnings()))
                    .isInstanceOf(InputException.class)
                    .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo("reDc"));
        }
        assertThatThrownBy(() -> WANG.evaluate(null, 1000, new Warnings()))
                .isInstanceOf(InputException.class);
    }
}
