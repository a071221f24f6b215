package org.finstack.coil;

import java.util.List;
import org.finstack.airside.AirSideCorrelation;
import org.finstack.airside.AirSideCorrelations;
import org.finstack.airside.AirSideSurface;
import org.finstack.airside.ColburnFactor;
import org.finstack.airside.JF;
import org.finstack.airside.KaysLondonCorePressureDrop;
import org.finstack.core.Citation;
import org.finstack.core.Warnings;
import org.finstack.fluid.air.DryAir;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;

/**
 * The air through a coil: its entering state and mass flow, and the air-side coefficient and
 * friction factor from the fin type's correlation, with air properties at a given mean
 * temperature (dry-air transport properties; the moisture's effect on them is well under 1 %).
 *
 * <p>The case's {@link CorrelationFactors} act here: {@link #of} wraps the fin type's correlation
 * so that {@link #at} works with {@code j fj} (h_o scales by fj) and {@code f ff} (the core
 * friction term of {@link #pressureDrop} scales by ff). A flow built directly from another
 * flow's {@link #correlation()} keeps the factors.
 *
 * @param inlet       entering moist air
 * @param massFlow    dry-air mass flow [kg/s]
 * @param volumeFlow  volume flow at the inlet state [m3/s]
 * @param derived     the coil's derived geometry
 * @param correlation the air-side correlation, with the case's correlation factors applied
 * @param surface     what the correlation needs of the coil
 */
public record AirFlow(MoistAirState inlet, double massFlow, double volumeFlow, DerivedGeometry derived,
        AirSideCorrelation correlation, AirSideSurface surface) {

    /**
     * @param c the case
     * @param d its derived geometry
     * @return the air through the coil, its correlation carrying the case's correlation factors
     */
    public static AirFlow of(CoilCase c, DerivedGeometry d) {
        AirInlet a = c.air();
        CoilGeometry g = c.coil();
        MoistAirState in = MoistAirState.fromRelativeHumidity(a.temperature(), a.relativeHumidity(), a.pressure());
        double volume = a.volumeFlow(d.faceArea());
        double dryAirMass = volume * in.density() / (1 + in.humidityRatio());
        AirSideCorrelation corr = c.factors().applyTo(AirSideCorrelations.standard("coil.finType", g.finType()));
        return new AirFlow(in, dryAirMass, volume, d, corr, IsothermalCoilModel.surface(g, d));
    }

    /** @return mass flux in the minimum free-flow area, moist air [kg/(m2 s)] */
    public double maxMassFlux() {
        return massFlow * (1 + inlet.humidityRatio()) / derived.minFlowArea();
    }

    /**
     * Air-side heat transfer at a mean air temperature: j and f from the correlation (times the
     * case's correlation factors), h_o = j G cp Pr^(-2/3).
     *
     * @param meanTemperature [K]
     * @param w               warnings
     * @return the air side's figures
     */
    public Side at(double meanTemperature, Warnings w) {
        double p = inlet.pressure();
        Rating.AirProperties props = new Rating.AirProperties(meanTemperature, DryAir.density(meanTemperature, p),
                DryAir.cp(meanTemperature), DryAir.viscosity(meanTemperature), DryAir.conductivity(meanTemperature),
                DryAir.prandtl(meanTemperature));
        double g = maxMassFlux();
        double re = g * derived.collarDiameter() / props.viscosity();
        JF jf = correlation.evaluate(surface, re, w);
        double h = ColburnFactor.heatTransferCoefficient(jf.j(), g, props.cp(), props.prandtl());
        return new Side(props, re, jf, h, g / props.density());
    }

    /**
     * Core pressure drop from the Kays &amp; London equation with the correlation's f.
     *
     * @param side       the air side's figures
     * @param outletTemp leaving air temperature [K]
     * @return [Pa]
     */
    public double pressureDrop(Side side, double outletTemp) {
        double p = inlet.pressure();
        return KaysLondonCorePressureDrop.withoutEndLosses(maxMassFlux(), DryAir.density(inlet.dryBulb(), p),
                DryAir.density(outletTemp, p), derived.sigma(), side.jf().f(), derived.airSideArea() / derived.minFlowArea());
    }

    /** @return the published methods of the air side */
    public List<Citation> methods() {
        return List.of(correlation.source(), KaysLondonCorePressureDrop.SOURCE, KaysLondonCorePressureDrop.END_LOSS_SOURCE,
                DryAir.CP_SOURCE, DryAir.TRANSPORT_SOURCE);
    }

    /**
     * The air side at one mean temperature.
     *
     * @param properties  air properties used
     * @param reynoldsDc  Reynolds number on the collar diameter
     * @param jf          Colburn j and Fanning f
     * @param coefficient h_o [W/(m2 K)]
     * @param maxVelocity velocity in the minimum free-flow area [m/s]
     */
    public record Side(Rating.AirProperties properties, double reynoldsDc, JF jf, double coefficient,
            double maxVelocity) {
    }
}
