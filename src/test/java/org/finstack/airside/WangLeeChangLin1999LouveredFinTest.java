package org.finstack.airside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class WangLeeChangLin1999LouveredFinTest {

    private static final WangLeeChangLin1999LouveredFin WANG = WangLeeChangLin1999LouveredFin.INSTANCE;
    private static final WangChiChang2000PlainFin PLAIN = WangChiChang2000PlainFin.INSTANCE;

    /** The geometry of the Javadoc worked example, with any number of rows. */
    private static AirSideSurface example(int rows) {
        return new AirSideSurface(10.23e-3, 25.4e-3, 19.05e-3, 1.8e-3, 0.115e-3, rows, 2.27e-3, true,
                new AirSideSurface.Pattern.Louvered(2.4e-3, 1.0e-3));
    }

    /** The same tube bank and fins without louvers. */
    private static AirSideSurface plainTwin(AirSideSurface s) {
        return AirSideSurface.plain(s.collarDiameter(), s.transversePitch(), s.rowPitch(), s.finPitch(),
                s.finThickness(), s.rows(), s.hydraulicDiameter(), s.staggered());
    }

    @Test
    void javadocWorkedExample() {
        // values repeated from the class Javadoc (scripts/gen_airside_louver_wang1999.py functions
        // colburn/fanning at Dh = 2.27 mm, ReDc = 2000)
        Warnings w = new Warnings();
        AirSideSurface s = example(2);
        Reference.assertRelative(15.164, s.bareTubeAreaRatio(), 5e-5, "worked example Ao/At");
        JF jf = WANG.evaluate(s, 2000, w);
        Reference.assertRelative(0.023741, jf.j(), 3e-5, "worked example j");
        Reference.assertRelative(0.084205, jf.f(), 3e-5, "worked example f");
        assertThat(w.isEmpty()).as("%s", w.list()).isTrue();
    }

    @Test
    void referenceTableFromIndependentImplementation() {
        // src/test/resources/reference/airside_louver_wang1999.csv: the transcribed equations
        // (Jacobi et al. 2001) evaluated by scripts/gen_airside_louver_wang1999.py, an independent
        // Python implementation; it checks the Java transcription, not the coefficients themselves
        List<double[]> rows = Reference.csv("/reference/airside_louver_wang1999.csv");
        assertThat(rows).hasSize(24);
        for (double[] r : rows) {
            AirSideSurface s = new AirSideSurface(r[0], r[2], r[3], r[4], r[1], (int) r[5], r[8], true,
                    new AirSideSurface.Pattern.Louvered(r[6], r[7]));
            String ctx = String.format("Dc=%s Pt=%s Pl=%s Fp=%s N=%d Lp=%s Lh=%s ReDc=%s", r[0], r[2], r[3], r[4],
                    (int) r[5], r[6], r[7], r[10]);
            Reference.assertRelative(r[9], s.bareTubeAreaRatio(), 1e-12, "Ao/At, " + ctx + " (gen_airside_louver_wang1999.py)");
            JF jf = WANG.evaluate(s, r[10], Warnings.discard());
            Reference.assertRelative(r[11], jf.j(), 1e-9, "j, " + ctx + " (gen_airside_louver_wang1999.py)");
            Reference.assertRelative(r[12], jf.f(), 1e-9, "f, " + ctx + " (gen_airside_louver_wang1999.py)");
        }
    }

    @Test
    void publishedScatterIsStated() {
        // abstract of Wang, Lee, Chang & Lin 1999 (from memory): 95.5 % of j, 90.8 % of f within +-15 %
        assertThat(WANG.scatterJ()).isEqualTo(0.955);
        assertThat(WANG.scatterF()).isEqualTo(0.908);
        assertThat(WANG.scatterBand()).isEqualTo(0.15);
    }

    @Test
    void publishedReynoldsRange() {
        // 300 <= ReDc <= 7000: the range stated for this correlation in the FluidDissipation
        // documentation of kc_roundTube and dp_roundTube (transcription of Jacobi et al. 2001)
        assertThat(WANG.validity().limit("ReDc").min()).isEqualTo(300);
        assertThat(WANG.validity().limit("ReDc").max()).isEqualTo(7000);
    }

    @Test
    void jAndFFallWithReynoldsNumberWithinEachBranch() {
        // f falls over the whole range; j falls within the high-ReDc branch for every row count
        // and within the low-ReDc branch for two rows. (For three rows or more the published
        // low-ReDc fit gives a j that rises slightly just above ReDc = 300: a property of the fit,
        // whose fin-pitch exponent J2 depends on ReDc, not of the transcription.)
        for (int rows = 2; rows <= 6; rows++) {
            AirSideSurface s = example(rows);
            assertFalling(s, 300, 7000, false);
            assertFalling(s, 1000, 7000, true);
        }
        assertFalling(example(2), 300, 999, true);
    }

    private static void assertFalling(AirSideSurface s, double from, double to, boolean checkJ) {
        JF prev = WANG.evaluate(s, from, Warnings.discard());
        for (double re = from * 1.1; re <= to; re *= 1.1) {
            JF jf = WANG.evaluate(s, re, Warnings.discard());
            if (checkJ) {
                assertThat(jf.j()).as("j, N=%d, ReDc=%s", s.rows(), re).isLessThan(prev.j());
            }
            assertThat(jf.f()).as("f, N=%d, ReDc=%s", s.rows(), re).isLessThan(prev.f());
            prev = jf;
        }
    }

    @Test
    void frictionFactorIsContinuousAcrossTheJBranchSwitch() {
        // only j changes formula at ReDc = 1000; f is one formula for all ReDc
        for (int rows = 2; rows <= 6; rows++) {
            double below = WANG.evaluate(example(rows), Math.nextDown(1000.0), Warnings.discard()).f();
            double at = WANG.evaluate(example(rows), 1000.0, Warnings.discard()).f();
            Reference.assertRelative(below, at, 1e-9, "f across the j branch switch, N=" + rows);
        }
    }

    @Test
    void louversRaiseJAndFAbovePlainFins() {
        // common practice: interrupting the fin restarts the boundary layers, so at the same tube
        // bank, fin pitch and ReDc a louvered fin transfers more heat and costs more pressure drop
        // than a plain fin (compared with Wang, Chi & Chang 2000 for the plain fin). Checked
        // from ReDc = 1000 up: at the lowest Reynolds numbers the flow follows the fin channels
        // rather than the louvers and the two correlations meet.
        for (int rows = 2; rows <= 4; rows++) {
            AirSideSurface louvered = example(rows);
            AirSideSurface plain = plainTwin(louvered);
            for (double re = 1000; re <= 7000; re *= 1.25) {
                JF l = WANG.evaluate(louvered, re, Warnings.discard());
                JF p = PLAIN.evaluate(plain, re, Warnings.discard());
                assertThat(l.j()).as("j, N=%d, ReDc=%s", rows, re).isGreaterThan(p.j());
                assertThat(l.f()).as("f, N=%d, ReDc=%s", rows, re).isGreaterThan(p.f());
            }
        }
    }

    @Test
    void warningsOutsideThePublishedRange() {
        Warnings inside = new Warnings();
        WANG.evaluate(example(4), 3000, inside);
        assertThat(inside.isEmpty()).as("%s", inside.list()).isTrue();

        Warnings highRe = new Warnings();
        JF jf = WANG.evaluate(example(4), 9000, highRe);
        assertThat(jf.j()).isPositive();
        assertThat(highRe.list()).singleElement().asString()
                .contains("ReDc").contains("9000").contains("300 to 7000");

        Warnings geometry = new Warnings();
        AirSideSurface odd = new AirSideSurface(12.0e-3, 31.75e-3, 27.5e-3, 3.0e-3, 0.12e-3, 8, 3.0e-3, false,
                new AirSideSurface.Pattern.Louvered(4.0e-3, 1.6e-3));
        WANG.evaluate(odd, 2000, geometry);
        assertThat(geometry.list()).anyMatch(m -> m.contains("Dc = 12 mm"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("Fp = 3 mm"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("Lp = 4 mm"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("Lh = 1.6 mm"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("N = 8"));
        assertThat(geometry.list()).anyMatch(m -> m.contains("inline"));
    }

    @Test
    void surfaceWithoutLouversIsRefused() {
        assertThatThrownBy(() -> WANG.evaluate(plainTwin(example(2)), 2000, new Warnings()))
                .isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo("pattern"))
                .hasMessageContaining("plain");
        AirSideSurface wavy = new AirSideSurface(10.23e-3, 25.4e-3, 19.05e-3, 1.8e-3, 0.115e-3, 2, 2.27e-3, true,
                new AirSideSurface.Pattern.Wavy(1.2e-3, 4.8e-3));
        assertThatThrownBy(() -> WANG.evaluate(wavy, 2000, new Warnings()))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("wavy");
    }

    @Test
    void oneRowIsRefusedBecauseItsFrictionCorrelationIsUnconfirmed() {
        assertThatThrownBy(() -> WANG.evaluate(example(1), 2000, new Warnings()))
                .isInstanceOf(InputException.class)
                .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo("rows"))
                .hasMessageContaining("two rows or more");
    }

    @Test
    void uncomputableReynoldsNumberIsRejected() {
        for (double re : new double[] {Double.NaN, -5, 0, 50, Double.POSITIVE_INFINITY, 2e6}) {
            assertThatThrownBy(() -> WANG.evaluate(example(2), re, new Warnings()))
                    .isInstanceOf(InputException.class)
                    .satisfies(e -> assertThat(((InputException) e).field()).isEqualTo("reDc"));
        }
        assertThatThrownBy(() -> WANG.evaluate(null, 1000, new Warnings())).isInstanceOf(InputException.class);
        for (double re = 100; re <= 1e6; re *= 1.7) {
            JF jf = WANG.evaluate(example(6), re, Warnings.discard());
            assertThat(jf.j()).as("j at ReDc=%s", re).isPositive().isFinite();
            assertThat(jf.f()).as("f at ReDc=%s", re).isPositive().isFinite();
        }
    }
}
