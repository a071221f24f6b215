package org.finstack.fluid.table;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import java.util.SplittableRandom;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.SaturationState;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The tables against their reference, the exact equation of state of each fluid (itself checked
 * against the published tables of its paper in org.finstack.fluid), over a coil's working range:
 * saturation temperature from -60 degC (or 3 K above the fluid's minimum temperature) to +70 degC
 * (or 8 K below the critical temperature), subcooling up to 40 K, superheat up to 60 K, at random
 * (seeded) points that fall between the table nodes. Goals (product issue "Fluid properties",
 * section 3): density, cp within 0.1 %; temperature from (p, h) within 0.01 K; enthalpy from
 * (T, p) within 0.1 % of the latent heat; saturation temperature within 0.01 K. The largest
 * deviations found are printed.
 */
class TabulatedFluidAccuracyTest {

    private static final int POINTS = 120;

    static Iterable<String> fluids() {
        return Fluids.names();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("fluids")
    void withinTheGoalsOverTheWorkingRange(String name) {
        Fluid exact = Fluids.byName(name);
        TabulatedFluid table = TabulatedFluid.of(exact);
        FluidInfo info = exact.info();
        double lo = Math.max(213.15, info.minTemperature() + 3);
        double hi = Math.min(343.15, info.criticalTemperature() - 8);
        SplittableRandom rnd = new SplittableRandom(name.hashCode());
        double rho = 0;
        double cp = 0;
        double tph = 0;
        double hTp = 0;
        double tSat = 0;
        double pSat = 0;
        double twoPhase = 0;
        for (int k = 0; k < POINTS; k++) {
            double ts = lo + (hi - lo) * rnd.nextDouble();
            SaturationState se = exact.saturationAtTemperature(ts);
            double p = se.bubblePressure();
            double latent = se.latentHeat();
            tSat = Math.max(tSat, Math.abs(table.saturationAtPressure(p).bubbleTemperature() - ts));
            SaturationState st = table.saturationAtTemperature(ts);
            pSat = Math.max(pSat, Math.abs(st.bubblePressure() / p - 1));
            rho = Math.max(rho, Math.abs(st.liquid().density() / se.liquid().density() - 1));
            rho = Math.max(rho, Math.abs(st.vapour().density() / se.vapour().density() - 1));
            cp = Math.max(cp, Math.abs(st.vapour().cp() / se.vapour().cp() - 1));
            double q = rnd.nextDouble();
            FluidState me = exact.at(InputPair.PQ, p, q);
            FluidState mt = table.at(InputPair.PH, p, me.enthalpy());
            twoPhase = Math.max(twoPhase, Math.abs(mt.density() / me.density() - 1));
            double sub = Math.min(40, ts - info.minTemperature()) * rnd.nextDouble();
            double sup = Math.min(60, info.maxTemperature() - ts) * rnd.nextDouble();
            for (double t : new double[] {ts - sub, ts + sup}) {
                FluidState e = exact.at(InputPair.TP, t, p);
                FluidState a = table.at(InputPair.TP, t, p);
                FluidState b = table.at(InputPair.PH, p, e.enthalpy());
                assertThat(a.phase()).isEqualTo(e.phase());
                assertThat(b.phase()).isEqualTo(e.phase());
                rho = Math.max(rho, Math.max(Math.abs(a.density() / e.density() - 1),
                        Math.abs(b.density() / e.density() - 1)));
                cp = Math.max(cp, Math.max(Math.abs(a.cp() / e.cp() - 1), Math.abs(b.cp() / e.cp() - 1)));
                hTp = Math.max(hTp, Math.abs(a.enthalpy() - e.enthalpy()) / latent);
                tph = Math.max(tph, Math.abs(b.temperature() - t));
            }
        }
        System.out.printf(Locale.ROOT, "%-10s Tsat %.1f..%.1f C: max |drho/rho| %.1e, |dcp/cp| %.1e, |dT(p,h)| %.1e K, "
                + "|dh(T,p)|/L %.1e, |dTsat| %.1e K, |dpsat/psat| %.1e, two-phase |drho/rho| %.1e%n", name,
                lo - 273.15, hi - 273.15, rho, cp, tph, hTp, tSat, pSat, twoPhase);
        assertThat(rho).as("density").isLessThan(1e-3);
        assertThat(twoPhase).as("two-phase density").isLessThan(1e-3);
        assertThat(cp).as("cp").isLessThan(1e-3);
        assertThat(tph).as("T from (p, h) [K]").isLessThan(0.01);
        assertThat(hTp).as("h from (T, p) over the latent heat").isLessThan(1e-3);
        assertThat(tSat).as("saturation temperature [K]").isLessThan(0.01);
        assertThat(pSat).as("saturation pressure").isLessThan(1e-4);
    }
}
