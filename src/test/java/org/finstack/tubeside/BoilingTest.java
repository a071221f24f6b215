package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class BoilingTest {

    private static final List<double[]> EQUATIONS = Reference.csv("/reference/tubeside_equations.csv");
    private static final SaturatedProperties EVAP = TubesideFixtures.evaporating();

    private static void checkKind(int kind, BoilingCorrelation c, int expectedRows) {
        int n = 0;
        for (double[] r : EQUATIONS) {
            if (r[0] == kind) {
                TubeFlow f = new TubeFlow(r[4], r[1], r[2], r[3]);
                Reference.assertRelative(r[6], c.wetWall(EVAP, f, Warnings.discard()), 1e-9,
                        c.id() + " G=" + r[1] + " x=" + r[2] + " q=" + r[3] + " D=" + r[4]
                                + " (gen_tubeside_equations.py)");
                n++;
            }
        }
        assertThat(n).isEqualTo(expectedRows);
    }

    @Test
    void gungorWintertonMatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 2: plain-Python evaluation of the printed equations (no published table read)
        checkKind(2, GungorWinterton1987.INSTANCE, 108);
    }

    @Test
    void shah1982MatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 3
        checkKind(3, Shah1982.INSTANCE, 108);
    }

    @Test
    void kandlikarMatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 4, F_fl = 1.63 for R134a
        checkKind(4, Kandlikar1990.INSTANCE, 108);
    }

    @Test
    void workedExamples() {
        // Javadoc worked examples (fixture R134a near 5 C, D = 8 mm, G = 200, x = 0.5, q = 10 kW/m2)
        TubeFlow f = new TubeFlow(0.008, 200, 0.5, 1e4);
        Reference.assertRelative(2798.60, GungorWinterton1987.INSTANCE.wetWall(EVAP, f, new Warnings()), 2e-6,
                "Gungor & Winterton example");
        Reference.assertRelative(2823.72, Shah1982.INSTANCE.wetWall(EVAP, f, new Warnings()), 2e-6,
                "Shah 1982 example");
        Reference.assertRelative(3142.67, Kandlikar1990.INSTANCE.wetWall(EVAP, f, new Warnings()), 2e-6,
                "Kandlikar example");
    }

    @Test
    void coefficientRisesWithMassFluxAndHeatFlux() {
        // physical trend of flow boiling (convective and nucleate contributions), below dryout
        for (BoilingCorrelation c : BoilingCorrelations.all()) {
            for (double x : new double[] {0.05, 0.3, 0.6, 0.85}) {
                double last = 0;
                for (double g = 50; g <= 800; g += 50) {
                    double h = c.heatTransferCoefficient(EVAP, new TubeFlow(0.008, g, x, 1e4), Warnings.discard());
                    assertThat(h).as("%s rises with G at x=%s, G=%s", c.id(), x, g).isGreaterThan(last);
                    last = h;
                }
                last = 0;
                double lastBo = 0;
                for (double q = 1e3; q <= 60e3; q += 3e3) {
                    double h = c.heatTransferCoefficient(EVAP, new TubeFlow(0.008, 200, x, q), Warnings.discard());
                    double bo = q / (200 * EVAP.latentHeat());
                    boolean shahStep = c == Shah1982.INSTANCE && lastBo < 11e-4 && bo >= 11e-4;
                    if (!shahStep) {
                        assertThat(h).as("%s non-decreasing with q at x=%s, q=%s", c.id(), x, q)
                                .isGreaterThanOrEqualTo(last);
                    }
                    last = h;
                    lastBo = bo;
                }
            }
        }
    }

    @Test
    void shah1982StepsDownWhereTheChartConstantChanges() {
        // Shah 1982: F = 15.43 below Bo = 11e-4 and 14.7 from it, a step of the published equations
        double q = 11e-4 * 200 * EVAP.latentHeat();
        TubeFlow f = new TubeFlow(0.008, 200, 0.3, q);
        double below = Shah1982.INSTANCE.wetWall(EVAP, f.withQuality(0.3), Warnings.discard());
        double justBelow = Shah1982.INSTANCE.wetWall(EVAP, new TubeFlow(0.008, 200, 0.3, q * (1 - 1e-9)),
                Warnings.discard());
        Reference.assertRelative(14.7 / 15.43, below / justBelow, 1e-6, "Shah 1982 F step at Bo = 11e-4");
    }

    @Test
    void dryoutInterpolatesToVapourOnlyWithWarning() {
        // Dryout: common-practice linear interpolation from x = 0.9 to the vapour-only Gnielinski value at x = 1
        for (BoilingCorrelation c : BoilingCorrelations.all()) {
            TubeFlow at09 = new TubeFlow(0.008, 200, 0.9, 1e4);
            double h09 = c.wetWall(EVAP, at09, Warnings.discard());
            Warnings none = new Warnings();
            assertThat(c.heatTransferCoefficient(EVAP, at09, none)).isEqualTo(h09);
            assertThat(none.list()).noneMatch(s -> s.contains("dryout"));
            double hv = Dryout.vapourOnly(EVAP, at09, Warnings.discard());
            Warnings w = new Warnings();
            Reference.assertRelative(hv, c.heatTransferCoefficient(EVAP, at09.withQuality(1), w), 1e-12,
                    c.id() + " at x = 1");
            assertThat(w.list()).anyMatch(s -> s.contains("dryout"));
            double h095 = c.heatTransferCoefficient(EVAP, at09.withQuality(0.95), Warnings.discard());
            Reference.assertRelative((h09 + hv) / 2, h095, 1e-12, c.id() + " midway");
            // the vapour-only value is Gnielinski at Re_v = G D / mu_v
            double re = 200 * 0.008 / EVAP.vapourViscosity();
            Reference.assertRelative(Gnielinski1976.nusselt(re, EVAP.vapourPrandtl(),
                    Gnielinski1976.Wall.UNIFORM_HEAT_FLUX, Warnings.discard()) * EVAP.vapourConductivity() / 0.008,
                    hv, 1e-12, "vapour-only coefficient");
        }
    }

    @Test
    void dryoutWorkedExample() {
        // Dryout Javadoc example with Gungor & Winterton 1987
        TubeFlow f = new TubeFlow(0.008, 200, 0.95, 1e4);
        Reference.assertRelative(2896.34, GungorWinterton1987.INSTANCE.wetWall(EVAP, f.withQuality(0.9),
                new Warnings()), 5e-6, "h at x = 0.9");
        Reference.assertRelative(395.799, Dryout.vapourOnly(EVAP, f, new Warnings()), 5e-6, "vapour-only h");
        Reference.assertRelative(1646.07, GungorWinterton1987.INSTANCE.heatTransferCoefficient(EVAP, f,
                new Warnings()), 5e-6, "h at x = 0.95");
    }

    @Test
    void kandlikarFluidParameterLookup() {
        // Kandlikar 1990 Table 3 (from memory) and Kandlikar 1991 for R134a
        Warnings w = new Warnings();
        assertThat(Kandlikar1990.fluidParameter("R-22", w)).isEqualTo(2.20);
        assertThat(Kandlikar1990.fluidParameter("r134a", w)).isEqualTo(1.63);
        assertThat(Kandlikar1990.fluidParameter("Water", w)).isEqualTo(1.00);
        assertThat(Kandlikar1990.fluidParameter("N2", w)).isEqualTo(4.70);
        assertThat(w.isEmpty()).isTrue();
        assertThat(Kandlikar1990.fluidParameter("R410A", w)).isEqualTo(1.0);
        assertThat(w.list()).singleElement().asString().contains("R410A").contains("F_fl = 1");
        // an unlisted fluid is evaluated with F_fl = 1 and warns
        Warnings w2 = new Warnings();
        TubeFlow f = new TubeFlow(0.008, 200, 0.5, 1e4);
        double unknown = Kandlikar1990.INSTANCE.wetWall(TubesideFixtures.renamed(EVAP, "R410A"), f, w2);
        double water = Kandlikar1990.INSTANCE.wetWall(TubesideFixtures.renamed(EVAP, "water"), f, Warnings.discard());
        assertThat(unknown).isEqualTo(water);
        assertThat(w2.list()).anyMatch(s -> s.contains("F_fl"));
    }

    @Test
    void gungorWintertonStratificationFactorOnlyBelowFroudeLimit() {
        // Gungor & Winterton 1987: E2 = Fr^(0.1 - 2 Fr) for Fr_lo < 0.05; Fr_lo = G^2/(rho_l^2 g D)
        double gLimit = Math.sqrt(0.05 * EVAP.liquidDensity() * EVAP.liquidDensity() * 9.80665 * 0.008);
        TubeFlow below = new TubeFlow(0.008, gLimit * 0.999, 0.4, 1e4);
        TubeFlow above = new TubeFlow(0.008, gLimit * 1.001, 0.4, 1e4);
        double hb = GungorWinterton1987.INSTANCE.wetWall(EVAP, below, Warnings.discard());
        double ha = GungorWinterton1987.INSTANCE.wetWall(EVAP, above, Warnings.discard());
        double e2 = Math.pow(0.05, 0.1 - 0.1);
        assertThat(e2).isEqualTo(1.0);
        // factor tends to 0.05^0 = 1 at the limit: the two sides agree within the G change
        Reference.assertRelative(ha, hb, 3e-3, "continuity at Fr_lo = 0.05");
    }

    @Test
    void rejectsAdiabaticFlowAndDryVapour() {
        assertThatThrownBy(() -> GungorWinterton1987.INSTANCE.wetWall(EVAP, new TubeFlow(0.008, 200, 0.5, 0),
                Warnings.discard())).isInstanceOf(InputException.class).hasMessageStartingWith("flow.heatFlux:");
        assertThatThrownBy(() -> Shah1982.INSTANCE.wetWall(EVAP, new TubeFlow(0.008, 200, 1, 1e4),
                Warnings.discard())).isInstanceOf(InputException.class).hasMessageContaining("quality");
    }

    @Test
    void saturatedLiquidInletIsFinite() {
        for (BoilingCorrelation c : BoilingCorrelations.all()) {
            double h = c.heatTransferCoefficient(EVAP, new TubeFlow(0.008, 200, 0, 1e4), Warnings.discard());
            assertThat(h).isFinite().isPositive();
        }
    }

    @Test
    void validityWarnings() {
        Warnings w = new Warnings();
        GungorWinterton1987.INSTANCE.wetWall(EVAP, new TubeFlow(0.002, 200, 0.5, 1e4), w);
        assertThat(w.list()).anyMatch(s -> s.contains("Gungor & Winterton 1987") && s.contains("D = 2 mm"));
    }
}
