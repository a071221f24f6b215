package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.finstack.core.InputException;
import org.finstack.core.Warnings;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class CondensationTest {

    private static final List<double[]> EQUATIONS = Reference.csv("/reference/tubeside_equations.csv");
    private static final SaturatedProperties COND = TubesideFixtures.condensing();

    private static void checkKind(int kind, CondensationCorrelation c, int expectedRows) {
        int n = 0;
        for (double[] r : EQUATIONS) {
            if (r[0] == kind) {
                TubeFlow f = TubeFlow.adiabatic(r[4], r[1], r[2]);
                double dT = r[5] > 0 ? r[5] : 5;
                Reference.assertRelative(r[6], c.heatTransferCoefficient(COND, f, dT, Warnings.discard()), 1e-9,
                        c.id() + " G=" + r[1] + " x=" + r[2] + " D=" + r[4] + " dT=" + r[5]
                                + " (gen_tubeside_equations.py)");
                n++;
            }
        }
        assertThat(n).isEqualTo(expectedRows);
    }

    @Test
    void shah1979MatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 5: plain-Python evaluation of the printed equations (no published table read)
        checkKind(5, Shah1979.INSTANCE, 45);
    }

    @Test
    void shah2009MatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 6 (regimes I and II both occur in the grid)
        checkKind(6, Shah2009.INSTANCE, 45);
    }

    @Test
    void cavalliniMatchesIndependentEvaluation() {
        // tubeside_equations.csv kind 7 (both regimes occur in the grid)
        checkKind(7, Cavallini2006.INSTANCE, 90);
    }

    @Test
    void workedExamples() {
        // Javadoc worked examples (fixture R134a near 40 C, D = 8 mm)
        TubeFlow high = TubeFlow.adiabatic(0.008, 200, 0.5);
        TubeFlow low = TubeFlow.adiabatic(0.008, 50, 0.2);
        Reference.assertRelative(2309.62, Shah1979.INSTANCE.heatTransferCoefficient(COND, high, 5, new Warnings()),
                5e-6, "Shah 1979 example");
        Reference.assertRelative(2281.84, Shah2009.INSTANCE.heatTransferCoefficient(COND, high, 5, new Warnings()),
                5e-6, "Shah 2009 example, regime I");
        Reference.assertRelative(1090.89, Shah2009.INSTANCE.heatTransferCoefficient(COND, low, 5, new Warnings()),
                5e-6, "Shah 2009 example, regime II");
        TubeFlow annular = TubeFlow.adiabatic(0.008, 400, 0.6);
        Reference.assertRelative(3978.42, Cavallini2006.INSTANCE.heatTransferCoefficient(COND, annular, 5,
                new Warnings()), 5e-6, "Cavallini example, dT-independent");
        Reference.assertRelative(1699.59, Cavallini2006.INSTANCE.heatTransferCoefficient(COND, low, 5,
                new Warnings()), 5e-6, "Cavallini example, dT-dependent");
        assertThat(Shah2009.regimeOne(COND, high)).isTrue();
        assertThat(Shah2009.regimeOne(COND, low)).isFalse();
        assertThat(Tube.dimensionlessVapourVelocity(COND, annular))
                .isGreaterThan(Cavallini2006.transitionVelocity(COND, annular));
        assertThat(Tube.dimensionlessVapourVelocity(COND, low)).isLessThan(Cavallini2006.transitionVelocity(COND,
                low));
    }

    @Test
    void coefficientRisesWithQualityAndMassFlux() {
        // physical trend of shear-driven film condensation
        for (CondensationCorrelation c : CondensationCorrelations.all()) {
            for (double g : new double[] {100, 200, 400, 700}) {
                double last = 0;
                boolean lastRegimeOne = false;
                boolean lastStratified = false;
                for (double x = 0.05; x <= 0.9; x += 0.05) {
                    TubeFlow f = TubeFlow.adiabatic(0.008, g, x);
                    double h = c.heatTransferCoefficient(COND, f, 5, Warnings.discard());
                    // Shah 2009 drops h_Nu when the flow enters regime I: a step of the published method
                    boolean shahStep = c == Shah2009.INSTANCE && Shah2009.regimeOne(COND, f) && !lastRegimeOne;
                    // Cavallini's dT-dependent regime need not rise with x (see its class comment)
                    boolean stratified = c == Cavallini2006.INSTANCE
                            && Tube.dimensionlessVapourVelocity(COND, f) <= Cavallini2006.transitionVelocity(COND, f);
                    if (!shahStep && !stratified && !lastStratified) {
                        assertThat(h).as("%s rises with x at G=%s, x=%s", c.id(), g, x).isGreaterThan(last);
                    }
                    last = h;
                    lastRegimeOne = Shah2009.regimeOne(COND, f);
                    lastStratified = stratified;
                }
            }
            for (double x : new double[] {0.2, 0.5, 0.8}) {
                double last = 0;
                boolean lastRegimeOne = false;
                boolean lastStratified = false;
                for (double g = 100; g <= 800; g += 50) {
                    TubeFlow f = TubeFlow.adiabatic(0.008, g, x);
                    double h = c.heatTransferCoefficient(COND, f, 5, Warnings.discard());
                    boolean shahStep = c == Shah2009.INSTANCE && Shah2009.regimeOne(COND, f) && !lastRegimeOne;
                    boolean stratified = c == Cavallini2006.INSTANCE
                            && Tube.dimensionlessVapourVelocity(COND, f) <= Cavallini2006.transitionVelocity(COND, f);
                    if (!shahStep && !stratified && !lastStratified) {
                        assertThat(h).as("%s rises with G at x=%s, G=%s", c.id(), x, g).isGreaterThan(last);
                    }
                    last = h;
                    lastRegimeOne = Shah2009.regimeOne(COND, f);
                    lastStratified = stratified;
                }
            }
        }
    }

    @Test
    void cavalliniIsContinuousAtTheRegimeTransition() {
        // at J_G = J_G^T the dT-dependent formula reduces to h_A (Cavallini et al. 2006)
        for (double g : new double[] {80, 140, 200}) {
            double lo = 0.01;
            double hi = 0.99;
            for (int i = 0; i < 60; i++) {
                double mid = (lo + hi) / 2;
                TubeFlow f = TubeFlow.adiabatic(0.008, g, mid);
                if (Tube.dimensionlessVapourVelocity(COND, f) > Cavallini2006.transitionVelocity(COND, f)) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            if (hi < 0.98) {
                double below = Cavallini2006.INSTANCE.heatTransferCoefficient(COND, TubeFlow.adiabatic(0.008, g, lo), 3,
                        Warnings.discard());
                double above = Cavallini2006.INSTANCE.heatTransferCoefficient(COND, TubeFlow.adiabatic(0.008, g, hi), 3,
                        Warnings.discard());
                Reference.assertRelative(above, below, 1e-6, "Cavallini continuity at G = " + g);
            }
        }
    }

    @Test
    void shah1979IsLiquidOnlyAtZeroQuality() {
        // Shah 1979 at x = 0: h = h_lo (Dittus-Boelter, all the flow as liquid)
        double relo = 200 * 0.008 / COND.liquidViscosity();
        double hlo = 0.023 * Math.pow(relo, 0.8) * Math.pow(COND.liquidPrandtl(), 0.4) * COND.liquidConductivity() / 0.008;
        Reference.assertRelative(hlo, Shah1979.INSTANCE.heatTransferCoefficient(COND, TubeFlow.adiabatic(0.008, 200, 0),
                5, Warnings.discard()), 1e-12, "Shah 1979 at x = 0");
        Reference.assertRelative(hlo, Cavallini2006.INSTANCE.heatTransferCoefficient(COND,
                TubeFlow.adiabatic(0.008, 200, 0), 5, Warnings.discard()), 1e-12, "Cavallini at x = 0");
    }

    @Test
    void cavalliniStratifiedRegimeDependsOnWallSubcoolingAndHydrocarbonsUseTheirConstant() {
        TubeFlow low = TubeFlow.adiabatic(0.008, 50, 0.2);
        double small = Cavallini2006.INSTANCE.heatTransferCoefficient(COND, low, 2, Warnings.discard());
        double large = Cavallini2006.INSTANCE.heatTransferCoefficient(COND, low, 10, Warnings.discard());
        assertThat(small).isGreaterThan(large); // Nusselt-type film: h falls as dT rises
        TubeFlow high = TubeFlow.adiabatic(0.008, 400, 0.6);
        assertThat(Cavallini2006.INSTANCE.heatTransferCoefficient(COND, high, 2, Warnings.discard()))
                .isEqualTo(Cavallini2006.INSTANCE.heatTransferCoefficient(COND, high, 10, Warnings.discard()));
        // Cavallini et al. 2006: C_T = 1.6 for hydrocarbons, 2.6 for other refrigerants
        assertThat(Cavallini2006.transitionConstant("R-290")).isEqualTo(1.6);
        assertThat(Cavallini2006.transitionConstant("isobutane")).isEqualTo(1.6);
        assertThat(Cavallini2006.transitionConstant("R134a")).isEqualTo(2.6);
        assertThat(Cavallini2006.transitionVelocity(TubesideFixtures.renamed(COND, "R290"), high))
                .isLessThan(Cavallini2006.transitionVelocity(COND, high));
    }

    @Test
    void rejectsDryVapourAndBadSubcooling() {
        for (CondensationCorrelation c : CondensationCorrelations.all()) {
            assertThatThrownBy(() -> c.heatTransferCoefficient(COND, TubeFlow.adiabatic(0.008, 200, 1), 5,
                    Warnings.discard())).isInstanceOf(InputException.class);
        }
        assertThatThrownBy(() -> Cavallini2006.INSTANCE.heatTransferCoefficient(COND,
                TubeFlow.adiabatic(0.008, 200, 0.5), 0, Warnings.discard())).hasMessageStartingWith("wallSubcooling:");
    }

    @Test
    void validityWarnings() {
        Warnings w = new Warnings();
        Shah1979.INSTANCE.heatTransferCoefficient(COND, TubeFlow.adiabatic(0.005, 400, 0.5), 5, w);
        assertThat(w.list()).anyMatch(s -> s.startsWith("Shah 1979: D = 5 mm"))
                .anyMatch(s -> s.startsWith("Shah 1979: G = 400"));
    }
}
