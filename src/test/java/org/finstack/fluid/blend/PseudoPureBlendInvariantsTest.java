package org.finstack.fluid.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;

/**
 * Consistency of the pseudo-pure blends over their saturation range: bubble above dew pressure,
 * positive glide and latent heat, stable liquid and vapour at the saturation lines, inverse
 * saturation functions, two-phase states consistent between (p, q), (p, h), (T, q) and (T, p),
 * single-phase (T, p) / (p, h) round trips and trends with temperature.
 */
class PseudoPureBlendInvariantsTest {

    @Provide
    Arbitrary<String> blends() {
        return Arbitraries.of(Fluids.blendNames());
    }

    private static double temperature(FluidInfo i, double frac) {
        return i.minTemperature() + frac * (i.criticalTemperature() - i.minTemperature());
    }

    @Property(tries = 60)
    void saturationAtTemperatureAndPressureAreInverse(@ForAll("blends") String name,
            @ForAll @DoubleRange(min = 0, max = 0.99) double frac) {
        Fluid f = Fluids.byName(name);
        double t = temperature(f.info(), frac);
        SaturationState s = f.saturationAtTemperature(t);
        String at = name + " at " + t + " K";
        assertTrue(s.bubblePressure() > s.dewPressure(), at + ": bubble pressure above dew pressure");
        assertTrue(s.liquid().density() > s.vapour().density(), at + ": rho' > rho''");
        assertTrue(s.latentHeat() > 0, at + ": latent heat");
        assertTrue(s.liquid().speedOfSound() > 0 && s.vapour().speedOfSound() > 0, at + ": mechanically stable");
        assertEquals(Phase.LIQUID, s.liquid().phase());
        assertEquals(Phase.VAPOUR, s.vapour().phase());
        if (s.dewPressure() >= f.info().triplePressure()) {
            SaturationState dewSide = f.saturationAtPressure(s.dewPressure());
            assertEquals(t, dewSide.dewTemperature(), 1e-9 * t, at + ": dew temperature at p_dew(T)");
            assertTrue(dewSide.glide() > 0, at + ": glide");
        }
        SaturationState bubbleSide = f.saturationAtPressure(s.bubblePressure());
        assertEquals(t, bubbleSide.bubbleTemperature(), 1e-9 * t, at + ": bubble temperature at p_bubble(T)");
        assertEquals(s.liquid().density(), bubbleSide.liquid().density(), 1e-8 * s.liquid().density(), at);
    }

    @Property(tries = 60)
    void twoPhaseStatesAgreeBetweenInputPairs(@ForAll("blends") String name,
            @ForAll @DoubleRange(min = 0.02, max = 0.95) double frac,
            @ForAll @DoubleRange(min = 0.01, max = 0.99) double q) {
        Fluid f = Fluids.byName(name);
        double t = temperature(f.info(), frac);
        double p = f.saturationAtTemperature(t).bubblePressure();
        SaturationState s = f.saturationAtPressure(p);
        FluidState pq = f.at(InputPair.PQ, p, q);
        String at = name + " at p = " + p + " Pa, q = " + q;
        assertEquals(Phase.TWO_PHASE, pq.phase(), at);
        assertEquals(s.bubbleTemperature() + q * s.glide(), pq.temperature(), 1e-12 * t, at + ": T linear in q");
        assertEquals(s.liquid().enthalpy() + q * s.latentHeat(), pq.enthalpy(), 1e-6, at + ": h");
        FluidState ph = f.at(InputPair.PH, p, pq.enthalpy());
        assertEquals(q, ph.quality(), 1e-9, at + ": q from (p, h)");
        assertEquals(pq.temperature(), ph.temperature(), 1e-9, at + ": T from (p, h)");
        if (s.glide() > 1e-3) {
            FluidState tp = f.at(InputPair.TP, pq.temperature(), p);
            assertEquals(q, tp.quality(), 1e-6, at + ": q from (T, p)");
        }
        FluidState tq = f.at(InputPair.TQ, pq.temperature(), q);
        assertEquals(p, tq.pressure(), 1e-7 * p, at + ": p from (T, q)");
    }

    @Property(tries = 60)
    void singlePhaseStatesRoundTripThroughPressureEnthalpy(@ForAll("blends") String name,
            @ForAll @DoubleRange(min = 0, max = 1) double ft, @ForAll @DoubleRange(min = 0, max = 1) double fp) {
        Fluid f = Fluids.byName(name);
        FluidInfo i = f.info();
        double t = i.minTemperature() + ft * (i.maxTemperature() - i.minTemperature());
        double p = Math.exp(Math.log(1e3) + fp * (Math.log(0.9 * i.maxPressure()) - Math.log(1e3)));
        if (t < i.criticalTemperature()) {
            SaturationState sat = f.saturationAtTemperature(t);
            // single-phase states only (inside the glide (T, p) gives a two-phase state)
            Assume.that(p >= sat.bubblePressure() || p <= sat.dewPressure());
        }
        FluidState s = f.at(InputPair.TP, t, p);
        String at = name + " at T = " + t + " K, p = " + p + " Pa";
        FluidState back = f.at(InputPair.PH, p, s.enthalpy());
        assertEquals(t, back.temperature(), 1e-8 * t, at + ": T from (p, h)");
        assertEquals(s.density(), back.density(), 1e-7 * s.density(), at + ": rho from (p, h)");
        if (s.hasSinglePhaseProperties()) {
            assertEquals(s.enthalpy() - p / s.density(), s.internalEnergy(), 1e-9 * Math.abs(s.enthalpy()) + 1e-6);
            assertTrue(s.cp() >= s.cv() && s.cv() > 0, at + ": cp >= cv > 0");
        }
    }

    @Property(tries = 30)
    void saturationPressuresRiseAndLatentHeatFallsWithTemperature(@ForAll("blends") String name,
            @ForAll @DoubleRange(min = 0.02, max = 0.95) double frac) {
        Fluid f = Fluids.byName(name);
        double t = temperature(f.info(), frac);
        SaturationState a = f.saturationAtTemperature(t);
        SaturationState b = f.saturationAtTemperature(t + 1);
        assertTrue(b.bubblePressure() > a.bubblePressure() && b.dewPressure() > a.dewPressure(), name);
        assertTrue(b.latentHeat() < a.latentHeat(), name + ": latent heat falls towards Tc");
        assertTrue(b.liquid().enthalpy() > a.liquid().enthalpy(), name + ": h' rises");
    }
}
