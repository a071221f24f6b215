package org.finstack.fluid;

import static org.finstack.testing.Reference.assertRelative;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.eos.HelmholtzEos.Properties;

/**
 * Thermodynamic consistency on random states of every fluid: phase equilibrium (equal pressure and
 * Gibbs energy), h = u + p/rho with u from the equation, cp &gt;= cv, cp = (dh/dT)_p, the Maxwell
 * relation (ds/dp)_T = -(dv/dT)_p, saturated states reproduced by (p, Q) and (T, Q), and round
 * trips through the (p, h) flash. These hold for any correct implementation of a Helmholtz
 * equation, whatever its coefficients.
 */
class FluidInvariantsTest {

    @Provide
    Arbitrary<String> fluids() {
        return Arbitraries.of(Fluids.names());
    }

    private static double between(double lo, double hi, double frac) {
        return lo + frac * (hi - lo);
    }

    @Property(tries = 60)
    void saturationHasEqualPressureAndGibbsEnergy(@ForAll("fluids") String name,
            @ForAll @DoubleRange(min = 0, max = 0.99) double frac) {
        HelmholtzFluid f = (HelmholtzFluid) Fluids.byName(name);
        FluidInfo i = f.info();
        double t = between(i.minTemperature(), i.criticalTemperature(), frac);
        SaturationState s = f.saturationAtTemperature(t);
        HelmholtzEos eos = f.equationOfState();
        Properties l = eos.properties(t, s.liquid().density());
        Properties v = eos.properties(t, s.vapour().density());
        double rt = eos.specificGasConstant() * t;
        // the liquid is nearly incompressible: a density change at the rounding level (1e-13)
        // moves its pressure by 1e-13 rho' (dp/drho)', which matters only at very low pressures
        assertEquals(v.pressure(), l.pressure(), 1e-8 * v.pressure() + 1e-12 * l.density() * l.dpdrho(),
                name + " p' = p'' at " + t + " K");
        assertEquals(0, (l.gibbs() - v.gibbs()) / rt, 1e-9, name + " g' = g'' at " + t + " K");
        assertTrue(s.latentHeat() > 0, name + " latent heat > 0");
        // Clapeyron: the saturation line's slope from the equation equals (s'' - s') / (v'' - v')
        double dt = 1e-4 * t;
        if (t + dt < i.criticalTemperature() * 0.999 && t - dt > i.minTemperature()) {
            double slope = (f.saturationAtTemperature(t + dt).bubblePressure()
                    - f.saturationAtTemperature(t - dt).bubblePressure()) / (2 * dt);
            double clapeyron = (v.entropy() - l.entropy()) / (1 / v.density() - 1 / l.density());
            assertRelative(clapeyron, slope, 1e-5, name + " Clapeyron at " + t + " K");
        }
    }

    @Property(tries = 80)
    void singlePhaseConsistency(@ForAll("fluids") String name, @ForAll @DoubleRange(min = 0, max = 1) double ft,
            @ForAll @DoubleRange(min = 0, max = 1) double fp) {
        HelmholtzFluid f = (HelmholtzFluid) Fluids.byName(name);
        FluidInfo i = f.info();
        double t = between(Math.max(i.minTemperature() * 1.001, 0.55 * i.criticalTemperature()),
                Math.min(i.maxTemperature() * 0.999, 1.3 * i.criticalTemperature()), ft);
        double p = Math.exp(between(Math.log(2e4), Math.log(Math.min(i.maxPressure(), 3 * i.criticalPressure())), fp));
        double dt = 1e-4 * t;
        if (t - 2 * dt < i.criticalTemperature() && t + 2 * dt > i.criticalTemperature()) {
            return;
        }
        if (t + 2 * dt < i.criticalTemperature()) {
            // keep away from the saturation line, so the finite differences stay in one phase
            double ps1 = f.saturationAtTemperature(t - 2 * dt).bubblePressure();
            double ps2 = f.saturationAtTemperature(t + 2 * dt).bubblePressure();
            Assume.that(p > 1.02 * ps2 || p < 0.98 * ps1);
        }
        Assume.that(Math.abs(t - i.criticalTemperature()) > 0.03 * i.criticalTemperature()
                || Math.abs(p - i.criticalPressure()) > 0.2 * i.criticalPressure());
        FluidState s = f.at(InputPair.TP, t, p);
        String at = name + " at " + t + " K, " + p + " Pa";
        // the density solve stops near 1e-9 relative, so the pressure comes back within 1e-8
        assertRelative(p, s.pressure(), 1e-8, at + ": p reproduced");
        assertTrue(s.cp() >= s.cv(), at + ": cp >= cv");
        assertTrue(s.cv() > 0 && s.speedOfSound() > 0, at + ": cv, w > 0");
        // h = u + p/rho with u = R T tau (alpha0_tau + alphar_tau) evaluated separately
        HelmholtzEos eos = f.equationOfState();
        double tau = eos.reducingTemperature() / t;
        double delta = s.density() / eos.reducingDensity();
        double u = eos.specificGasConstant() * t * tau
                * (eos.ideal().tauPart(tau)[1] + eos.residual(delta, tau).at());
        assertRelative(s.enthalpy(), u + s.pressure() / s.density(), 1e-10, at + ": h = u + p/rho");
        // cp = (dh/dT)_p and Maxwell (ds/dp)_T = -(dv/dT)_p by central differences
        FluidState tp = f.at(InputPair.TP, t + dt, p);
        FluidState tm = f.at(InputPair.TP, t - dt, p);
        assertRelative(s.cp(), (tp.enthalpy() - tm.enthalpy()) / (2 * dt), 2e-4, at + ": cp = (dh/dT)_p");
        double dp = 1e-5 * p;
        FluidState pp = f.at(InputPair.TP, t, p + dp);
        FluidState pm = f.at(InputPair.TP, t, p - dp);
        double dsdp = (pp.entropy() - pm.entropy()) / (2 * dp);
        double dvdt = (1 / tp.density() - 1 / tm.density()) / (2 * dt);
        assertRelative(-dvdt, dsdp, 2e-3, at + ": (ds/dp)_T = -(dv/dT)_p");
        // (p, h) round trip
        FluidState back = f.at(InputPair.PH, p, s.enthalpy());
        assertRelative(t, back.temperature(), 1e-8, at + ": T from (p, h)");
        assertEquals(s.phase(), back.phase(), at + ": phase from (p, h)");
    }

    @Property(tries = 60)
    void qualityPairsReproduceSaturation(@ForAll("fluids") String name,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double frac, @ForAll @DoubleRange(min = 0, max = 1) double q) {
        Fluid f = Fluids.byName(name);
        FluidInfo i = f.info();
        double t = between(Math.max(i.minTemperature(), 0.5 * i.criticalTemperature()), i.criticalTemperature(), frac);
        SaturationState s = f.saturationAtTemperature(t);
        double p = s.bubblePressure();
        FluidState l = f.at(InputPair.PQ, p, 0);
        FluidState v = f.at(InputPair.PQ, p, 1);
        String at = name + " at " + t + " K";
        assertRelative(t, l.temperature(), 1e-9, at + ": T from (p, Q=0)");
        assertRelative(s.liquid().density(), l.density(), 1e-7, at + ": rho' from (p, Q=0)");
        assertRelative(s.vapour().density(), v.density(), 1e-7, at + ": rho'' from (p, Q=1)");
        assertRelative(s.liquid().enthalpy(), l.enthalpy(), 1e-8, at + ": h' from (p, Q=0)");
        assertRelative(s.vapour().enthalpy(), v.enthalpy(), 1e-8, at + ": h'' from (p, Q=1)");
        assertEquals(Phase.LIQUID, l.phase());
        assertEquals(Phase.VAPOUR, v.phase());
        assertEquals(s.liquid(), f.at(InputPair.TQ, t, 0));
        assertEquals(s.vapour(), f.at(InputPair.TQ, t, 1));
        FluidState m = f.at(InputPair.TQ, t, q);
        FluidState back = f.at(InputPair.PH, p, m.enthalpy());
        assertRelative(t, back.temperature(), 1e-8, at + ": T from (p, h) in two-phase");
        assertEquals(q, back.quality(), 1e-7, at + ": quality from (p, h)");
        assertRelative(m.density(), back.density(), 1e-6, at + ": density from (p, h)");
    }

    @Property(tries = 30)
    void vapourPressureRisesAndLatentHeatFallsWithTemperature(@ForAll("fluids") String name,
            @ForAll @DoubleRange(min = 0.05, max = 0.95) double frac) {
        Fluid f = Fluids.byName(name);
        FluidInfo i = f.info();
        double t1 = between(i.minTemperature(), i.criticalTemperature(), frac);
        double t2 = t1 + 0.02 * (i.criticalTemperature() - t1);
        SaturationState a = f.saturationAtTemperature(t1);
        SaturationState b = f.saturationAtTemperature(t2);
        assertTrue(b.bubblePressure() > a.bubblePressure(), name + ": p_sat rises with T");
        assertTrue(b.latentHeat() < a.latentHeat(), name + ": latent heat falls with T");
        assertTrue(b.liquid().density() < a.liquid().density(), name + ": rho' falls with T");
        assertTrue(b.vapour().density() > a.vapour().density(), name + ": rho'' rises with T");
    }
}
