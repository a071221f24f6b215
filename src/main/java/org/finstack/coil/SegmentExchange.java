package org.finstack.coil;

import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.Warnings;
import org.finstack.exchanger.EpsilonNtu;
import org.finstack.exchanger.FlowArrangement;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;

/**
 * Heat exchanged by a part of a coil (a zone or a tube segment) between the air crossing it and
 * the refrigerant inside, dry or wet. The refrigerant is taken as mixed across the part (one
 * temperature at any point along the tube) and the air as unmixed: crossflow with one fluid
 * mixed.
 *
 * <p>Dry: eps-NTU on temperatures. Wet (the surface below the entering air's dew point): the
 * effectiveness model of Braun, Klein &amp; Mitchell (1989) on moist-air enthalpies, with the
 * "effective surface" to find the leaving humidity. Where the surface would be only partly wet,
 * the larger of the dry and wet results is taken, as those authors recommend.
 */
public final class SegmentExchange {

    /** The wet-coil method. */
    public static final Citation WET_SOURCE = Citation.of("Braun, Klein & Mitchell 1989",
            "Braun, J.E., Klein, S.A., Mitchell, J.W., 1989, \"Effectiveness models for cooling towers and cooling "
                    + "coils\", ASHRAE Transactions 95(2):164-174; enthalpy-potential method after Threlkeld, J.L., 1970, "
                    + "Thermal Environmental Engineering, 2nd ed., Prentice-Hall");

    /** Specific heat of dry air and of water vapour in the ASHRAE enthalpy relation [J/(kg K)]. */
    private static final double CP_DRY = 1006;
    private static final double CP_VAPOUR = 1860; // ASHRAE Handbook - Fundamentals 2017 Ch. 1 (moist-air enthalpy)

    private static final int MAX_ITERATIONS = 200;
    private static final double TOLERANCE_K = 1e-6;

    private SegmentExchange() {
    }

    /**
     * What came out of one part.
     *
     * @param heat               heat from the air to the refrigerant [W] (negative: the air is heated)
     * @param airOut             leaving air
     * @param condensate         water condensed (or frozen) on the surface [kg/s]
     * @param wet                whether the wet result was taken
     * @param surfaceTemperature effective (wet) or air-inlet (dry) surface temperature [K]
     * @param ua                 the part's dry conductance UA [W/K]
     */
    public record Result(double heat, MoistAirState airOut, double condensate, boolean wet,
            double surfaceTemperature, double ua) {

        /** @return whether water froze on a wet surface below 0 C */
        public boolean frost() {
            return wet && surfaceTemperature < Psychrometrics.ZERO_CELSIUS && condensate > 0;
        }
    }

    /**
     * @param s                     the coil's surfaces
     * @param fraction              the part's share of the coil's surfaces (0, 1]
     * @param airIn                 entering air
     * @param airMassFlow           dry-air mass flow through the part [kg/s]
     * @param refrigerantIn         refrigerant temperature entering the part [K]
     * @param refrigerantCapacity   refrigerant capacity rate m cp [W/K]; infinite while two-phase
     * @param insideCoefficient     refrigerant film coefficient [W/(m2 K)]
     * @param w                     warnings
     * @return the result
     */
    public static Result exchange(CoilSurface s, double fraction, MoistAirState airIn, double airMassFlow,
            double refrigerantIn, double refrigerantCapacity, double insideCoefficient, Warnings w) {
        double tA = airIn.dryBulb();
        double cpA = CP_DRY + CP_VAPOUR * airIn.humidityRatio();
        double cAir = airMassFlow * cpA;
        double etaO = s.surfaceEffectiveness(s.airCoefficient(), w);
        double rAir = s.airSide(etaO) / fraction;
        double rIn = s.metalAndInside(insideCoefficient) / fraction;
        double ua = 1 / (rAir + rIn);
        double q = effectiveness(ua / Math.min(cAir, refrigerantCapacity), cAir, refrigerantCapacity)
                * Math.min(cAir, refrigerantCapacity) * (tA - refrigerantIn);
        double tSurface = refrigerantIn + (tA - refrigerantIn) * rIn / (rIn + rAir);
        double tDryOut = tA - q / cAir;
        // the surface stays dry where it is not below the dew point: W_s(T_surface) >= W (W_s rises with T)
        if (refrigerantIn >= tA || airIn.humidityRatio() <= 0 || tSurface >= tA
                || Psychrometrics.saturationHumidityRatio(tSurface, airIn.pressure()) >= airIn.humidityRatio()) {
            return new Result(q, new MoistAirState(tDryOut, airIn.humidityRatio(), airIn.pressure()), 0, false,
                    tSurface, ua);
        }
        Result wet = wet(s, fraction, airIn, airMassFlow, refrigerantIn, refrigerantCapacity, insideCoefficient,
                tSurface, ua, w);
        // a dry result whose leaving air would be supersaturated is not physical: the surface is wet
        boolean dryPossible = airIn.humidityRatio() <= Psychrometrics.saturationHumidityRatio(tDryOut, airIn.pressure());
        if (wet.heat() >= q || !dryPossible) {
            return wet;
        }
        return new Result(q, new MoistAirState(tDryOut, airIn.humidityRatio(), airIn.pressure()), 0, false, tSurface, ua);
    }

    private static Result wet(CoilSurface s, double fraction, MoistAirState airIn, double mAir, double tR,
            double cR, double hi, double tSurfaceStart, double ua, Warnings w) {
        double p = airIn.pressure();
        double hIn = airIn.enthalpy();
        double wIn = airIn.humidityRatio();
        double cpA = CP_DRY + CP_VAPOUR * wIn;
        double ao = s.derived().airSideArea() * fraction;
        double hsR = Psychrometrics.saturatedEnthalpy(tR, p);
        double coatingR = s.coil().coating() == null ? 0 : s.coil().coating().resistance(s.coil().coatingThickness());
        // the effective surface temperature solves h_s(T) = h_s,eff(T), written g(T) = 0 below; g
        // falls with T. Plain substitution first, then secant steps kept inside the bracket the
        // signs of g give
        double tS = tSurfaceStart;
        double below = Double.NEGATIVE_INFINITY;
        double above = Double.POSITIVE_INFINITY;
        double lastT = Double.NaN;
        double lastG = Double.NaN;
        for (int i = 0; ; i++) {
            double hsS = Psychrometrics.saturatedEnthalpy(tS, p);
            double bW = Psychrometrics.saturatedEnthalpySlope(tS, p);
            double b = Math.abs(tS - tR) > 1e-3 ? (hsS - hsR) / (tS - tR) : Psychrometrics.saturatedEnthalpySlope(tR, p);
            double etaO = s.surfaceEffectiveness(s.airCoefficient() * bW / cpA, w);
            double filmSide = cpA / (s.airCoefficient() * etaO * ao);
            double deposit = bW * (s.fouling().airSide() + coatingR) / (etaO * ao);
            double inside = b * s.metalAndInside(hi) / fraction;
            double uaH = 1 / (filmSide + deposit + inside);
            double cRH = Double.isInfinite(cR) ? Double.POSITIVE_INFINITY : cR / b;
            double cMin = Math.min(mAir, cRH);
            double q = effectiveness(uaH / cMin, mAir, cRH) * cMin * (hIn - hsR);
            double hOut = hIn - q / mAir;
            double ntuO = 1 / (filmSide * mAir);
            double hsEff = hIn - (hIn - hOut) / -Math.expm1(-ntuO);
            // g = one Newton step of the inversion h_s(T_eff) = h_s,eff from T: zero exactly where
            // the full inversion's is (h_s(T) = h_s,eff), of the same sign, and equal to it near there
            double g = (hsEff - hsS) / bW;
            double tEff = tS + g;
            if (Math.abs(g) <= TOLERANCE_K) {
                double wEff = Psychrometrics.saturationHumidityRatio(tEff, p);
                double wOut = Math.max(wEff, Math.min(wIn, wEff + (wIn - wEff) * Math.exp(-ntuO)));
                double tOut = Psychrometrics.dryBulbFromEnthalpy(hOut, wOut);
                if (wOut > Psychrometrics.saturationHumidityRatio(tOut, p)) {
                    tOut = temperatureOfSaturatedEnthalpy(hOut, p, tR, airIn.dryBulb(), tEff);
                    wOut = Psychrometrics.saturationHumidityRatio(tOut, p);
                }
                return new Result(q, new MoistAirState(tOut, wOut, p), mAir * (wIn - wOut), true, tEff, ua);
            }
            if (i >= MAX_ITERATIONS) {
                throw new ConvergenceException("wet-surface temperature", i, Math.abs(g));
            }
            if (g > 0) {
                below = Math.max(below, tS);
            } else {
                above = Math.min(above, tS);
            }
            double next = Math.min(airIn.dryBulb() + 1, Math.max(tR - 1, tEff));
            if (!Double.isNaN(lastG) && g != lastG) {
                next = tS - g * (tS - lastT) / (g - lastG);
            }
            if (!(next > below && next < above)) {
                next = Double.isInfinite(below) || Double.isInfinite(above) ? tEff : 0.5 * (below + above);
            }
            lastT = tS;
            lastG = g;
            tS = next;
        }
    }

    /** eps of crossflow with the air unmixed and the refrigerant mixed; Cr = 0 while two-phase. */
    private static double effectiveness(double ntu, double cAir, double cRefrigerant) {
        if (Double.isInfinite(cRefrigerant)) {
            return EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, ntu, 0);
        }
        double cr = Math.min(cAir, cRefrigerant) / Math.max(cAir, cRefrigerant);
        return EpsilonNtu.effectiveness(cAir <= cRefrigerant ? FlowArrangement.CROSSFLOW_CMAX_MIXED
                : FlowArrangement.CROSSFLOW_CMIN_MIXED, ntu, cr);
    }

    /**
     * The temperature whose saturated-air enthalpy is h, between {@code low - 1} and
     * {@code high + 1} K: Newton steps on h_s(T) from a guess, kept inside a bracket that shrinks
     * with every step (a bisection step where Newton would leave it), to 1e-9 K.
     *
     * @param h     saturated-air enthalpy [J/kg dry air]
     * @param p     barometric pressure [Pa]
     * @param low   lower end of the search [K] (less 1 K)
     * @param high  upper end [K] (plus 1 K)
     * @param guess first trial [K]
     * @return [K]
     */
    static double temperatureOfSaturatedEnthalpy(double h, double p, double low, double high, double guess) {
        double lo = low - 1;
        double hi = high + 1;
        double t = Math.min(hi, Math.max(lo, guess));
        double hs = Psychrometrics.saturatedEnthalpy(t, p);
        double slope = Psychrometrics.saturatedEnthalpySlope(t, p);
        for (int i = 0; i < 200; i++) {
            double f = hs - h;
            if (f < 0) {
                lo = t;
            } else {
                hi = t;
            }
            double next = t - f / slope;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - t) < 1e-9 || hi - lo < 1e-9) {
                return next;
            }
            t = next;
            hs = Psychrometrics.saturatedEnthalpy(t, p);
            slope = Psychrometrics.saturatedEnthalpySlope(t, p);
        }
        throw new ConvergenceException("saturated-air temperature", 200, hi - lo);
    }
}
