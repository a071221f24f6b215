package org.finstack.coil;

import java.util.List;
import org.finstack.core.Citation;
import org.finstack.core.Warnings;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidState;
import org.finstack.fluid.InputPair;
import org.finstack.fluid.Phase;
import org.finstack.fluid.SaturationState;
import org.finstack.fluid.TransportProperties;
import org.finstack.tubeside.AccelerationPressureChange;
import org.finstack.tubeside.BoilingCorrelation;
import org.finstack.tubeside.BoilingCorrelations;
import org.finstack.tubeside.Churchill1977;
import org.finstack.tubeside.CondensationCorrelation;
import org.finstack.tubeside.CondensationCorrelations;
import org.finstack.tubeside.Dryout;
import org.finstack.tubeside.Gnielinski1976;
import org.finstack.tubeside.SaturatedProperties;
import org.finstack.tubeside.TubeFlow;
import org.finstack.tubeside.TwoPhaseFriction;
import org.finstack.tubeside.TwoPhaseFrictions;
import org.finstack.tubeside.VoidFraction;
import org.finstack.tubeside.VoidFractions;

/**
 * The refrigerant inside one tube: its local state from pressure and enthalpy, and the in-tube
 * correlations for the film coefficient, the frictional pressure gradient and the void fraction
 * (the package defaults: Gungor &amp; Winterton 1987 boiling with the common-practice dryout
 * treatment, Shah 1979 condensation, Gnielinski 1976 single phase, Friedel 1979 two-phase
 * friction, Churchill 1977 single-phase friction, Rouhani &amp; Axelsson 1970 void fraction).
 *
 * @param fluid     the refrigerant (tabulated for speed)
 * @param duty      condenser or evaporator
 * @param diameter  tube inside diameter [m]
 * @param override  a film coefficient the user fixed [W/(m2 K)], or 0
 */
public record RefrigerantFlow(Fluid fluid, Duty duty, double diameter, double override) {

    private static final BoilingCorrelation BOILING = BoilingCorrelations.standard();
    private static final CondensationCorrelation CONDENSING = CondensationCorrelations.standard();
    private static final TwoPhaseFriction FRICTION = TwoPhaseFrictions.standard();
    private static final VoidFraction VOID = VoidFractions.standard();

    /** Wall-to-saturation temperature difference assumed by condensation correlations that need one [K]. */
    private static final double CONDENSING_WALL_DT = 5; // common practice for air-cooled condensers

    /**
     * A local refrigerant state.
     *
     * @param state       the fluid state
     * @param twoPhase    whether liquid and vapour coexist
     * @param quality     vapour quality (0..1 two-phase; below 0 subcooled, above 1 superheated, by enthalpy)
     */
    public record Local(FluidState state, boolean twoPhase, double quality) {

        /** @return temperature [K] */
        public double temperature() {
            return state.temperature();
        }
    }

    /** @return the published methods this refrigerant side uses */
    public List<Citation> methods() {
        return List.of(duty == Duty.EVAPORATOR ? BOILING.source() : CONDENSING.source(), Dryout.SOURCE,
                Gnielinski1976.SOURCE, FRICTION.source(), Churchill1977.SOURCE, VOID.source());
    }

    /**
     * @param pressure [Pa]
     * @param enthalpy [J/kg]
     * @return the local state, with a thermodynamic quality also outside the dome
     */
    public Local at(double pressure, double enthalpy) {
        FluidState s = fluid.at(InputPair.PH, pressure, enthalpy);
        SaturationState sat = fluid.saturationAtPressure(pressure);
        double hl = sat.liquid().enthalpy();
        double hv = sat.vapour().enthalpy();
        double x = (enthalpy - hl) / (hv - hl);
        return new Local(s, s.phase() == Phase.TWO_PHASE, x);
    }

    /**
     * Saturated-phase properties at a pressure, as the in-tube correlations take them.
     *
     * @param pressure [Pa]
     * @return the properties
     */
    public SaturatedProperties saturated(double pressure) {
        SaturationState sat = fluid.saturationAtPressure(pressure);
        FluidState l = sat.liquid();
        FluidState v = sat.vapour();
        TransportProperties t = fluid.transport();
        return new SaturatedProperties(fluid.name(), pressure, fluid.info().criticalPressure(), fluid.info().molarMass(),
                l.density(), v.density(), t.viscosity(l), t.viscosity(v), t.conductivity(l), t.conductivity(v), l.cp(),
                v.cp(), t.surfaceTension(l.temperature()), v.enthalpy() - l.enthalpy());
    }

    /**
     * Film coefficient at a local state.
     *
     * @param local    the local state
     * @param massFlux [kg/(m2 s)]
     * @param heatFlux heat flux at the inner wall, magnitude [W/m2]
     * @param w        warnings
     * @return [W/(m2 K)]
     */
    public double insideCoefficient(Local local, double massFlux, double heatFlux, Warnings w) {
        if (override > 0) {
            return override;
        }
        if (local.twoPhase()) {
            return twoPhaseCoefficient(saturated(local.state().pressure()), local.quality(), massFlux, heatFlux, w);
        }
        FluidState s = local.state();
        TransportProperties t = fluid.transport();
        double mu = t.viscosity(s);
        double k = t.conductivity(s);
        double re = massFlux * diameter / mu;
        double pr = s.cp() * mu / k;
        return Gnielinski1976.heatTransferCoefficient(re, pr, k, diameter, Gnielinski1976.Wall.UNIFORM_HEAT_FLUX, w);
    }

    /**
     * Two-phase film coefficient from saturated properties already at hand (the user's override
     * if there is one).
     *
     * @param sp       saturated properties at the local pressure
     * @param quality  vapour quality [-] (kept within 0.001..0.999)
     * @param massFlux [kg/(m2 s)]
     * @param heatFlux heat flux at the inner wall, magnitude [W/m2]
     * @param w        warnings
     * @return [W/(m2 K)]
     */
    public double twoPhaseCoefficient(SaturatedProperties sp, double quality, double massFlux, double heatFlux,
            Warnings w) {
        if (override > 0) {
            return override;
        }
        TubeFlow f = new TubeFlow(diameter, massFlux, clampQuality(quality), Math.max(heatFlux, 100));
        return duty == Duty.EVAPORATOR ? Dryout.apply(BOILING, sp, f, w)
                : CONDENSING.heatTransferCoefficient(sp, f, CONDENSING_WALL_DT, w);
    }

    /**
     * Frictional pressure gradient at a local state.
     *
     * @param local    the local state
     * @param massFlux [kg/(m2 s)]
     * @param w        warnings
     * @return [Pa/m], positive
     */
    public double frictionGradient(Local local, double massFlux, Warnings w) {
        if (local.twoPhase()) {
            return twoPhaseFrictionGradient(saturated(local.state().pressure()), local.quality(), massFlux, w);
        }
        FluidState s = local.state();
        double mu = fluid.transport().viscosity(s);
        double re = massFlux * diameter / mu;
        double darcy = Churchill1977.darcy(re, 0, w);
        return darcy / diameter * massFlux * massFlux / (2 * s.density());
    }

    /**
     * Two-phase frictional pressure gradient from saturated properties already at hand.
     *
     * @param sp       saturated properties at the local pressure
     * @param quality  vapour quality [-] (kept within 0.001..0.999)
     * @param massFlux [kg/(m2 s)]
     * @param w        warnings
     * @return [Pa/m], positive
     */
    public double twoPhaseFrictionGradient(SaturatedProperties sp, double quality, double massFlux, Warnings w) {
        return FRICTION.gradient(sp, TubeFlow.adiabatic(diameter, massFlux, clampQuality(quality)), w);
    }

    /**
     * Pressure change by acceleration between two two-phase qualities at one pressure.
     *
     * @param pressure   [Pa]
     * @param massFlux   [kg/(m2 s)]
     * @param qualityIn  [-]
     * @param qualityOut [-]
     * @param w          warnings
     * @return inlet minus outlet pressure [Pa] (positive when the flow speeds up)
     */
    public double accelerationDrop(double pressure, double massFlux, double qualityIn, double qualityOut, Warnings w) {
        return accelerationDrop(saturated(pressure), massFlux, qualityIn, qualityOut, w);
    }

    /**
     * Pressure change by acceleration from saturated properties already at hand.
     *
     * @param sp         saturated properties at the local pressure
     * @param massFlux   [kg/(m2 s)]
     * @param qualityIn  [-]
     * @param qualityOut [-]
     * @param w          warnings
     * @return inlet minus outlet pressure [Pa] (positive when the flow speeds up)
     */
    public double accelerationDrop(SaturatedProperties sp, double massFlux, double qualityIn, double qualityOut,
            Warnings w) {
        return AccelerationPressureChange.between(VOID, sp, diameter, massFlux, clampQuality(qualityIn),
                clampQuality(qualityOut), w);
    }

    /**
     * Mean density of the refrigerant at a local state, for the charge: two-phase from the void
     * fraction, alpha rho_v + (1 - alpha) rho_l.
     *
     * @param local    the local state
     * @param massFlux [kg/(m2 s)]
     * @param w        warnings
     * @return [kg/m3]
     */
    public double chargeDensity(Local local, double massFlux, Warnings w) {
        if (!local.twoPhase()) {
            return local.state().density();
        }
        return twoPhaseChargeDensity(saturated(local.state().pressure()), local.quality(), massFlux, w);
    }

    /**
     * Two-phase mean density for the charge from saturated properties already at hand.
     *
     * @param sp       saturated properties at the local pressure
     * @param quality  vapour quality [-] (kept within 0.001..0.999)
     * @param massFlux [kg/(m2 s)]
     * @param w        warnings
     * @return [kg/m3]
     */
    public double twoPhaseChargeDensity(SaturatedProperties sp, double quality, double massFlux, Warnings w) {
        double alpha = VOID.voidFraction(sp, TubeFlow.adiabatic(diameter, massFlux, clampQuality(quality)), w);
        return alpha * sp.vapourDensity() + (1 - alpha) * sp.liquidDensity();
    }

    private static double clampQuality(double x) {
        return Math.min(0.999, Math.max(0.001, x));
    }
}
