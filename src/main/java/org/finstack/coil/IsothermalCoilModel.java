package org.finstack.coil;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.finstack.airside.AirSideCorrelation;
import org.finstack.airside.AirSideCorrelations;
import org.finstack.airside.AirSideSurface;
import org.finstack.airside.ColburnFactor;
import org.finstack.airside.JF;
import org.finstack.airside.KaysLondonCorePressureDrop;
import org.finstack.airside.fin.FinEfficiencyMethod;
import org.finstack.airside.fin.PlateFinCell;
import org.finstack.airside.fin.SchmidtFinEfficiency;
import org.finstack.airside.fin.SurfaceEffectiveness;
import org.finstack.core.Citation;
import org.finstack.core.ConvergenceException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.core.Warnings;
import org.finstack.exchanger.EpsilonNtu;
import org.finstack.exchanger.FlowArrangement;
import org.finstack.fluid.air.DryAir;
import org.finstack.fluid.psychro.Psychrometrics;
import org.finstack.geometry.Arrangement;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;

/**
 * Rating of a dry coil whose refrigerant is two-phase at one saturation temperature along the
 * whole coil, with the inside film coefficient given. The refrigerant's capacity rate is then
 * infinite (Cr = 0), so eps = 1 - exp(-NTU) whatever the flow arrangement.
 *
 * <p>Steps: air mass flow from the inlet state; air properties at the mean of inlet and outlet
 * air temperature (outlet found by a bounded fixed-point iteration); ReDc on the minimum
 * free-flow area; Colburn j and Fanning f from the fin type's correlation; h = j G cp Pr^(-2/3);
 * fin efficiency (Schmidt) and surface effectiveness; the series resistances; UA, NTU, eps;
 * the air-side pressure drop from the Kays &amp; London core equation with the correlation's f.
 * The case's {@link CorrelationFactors} multiply j and f as in {@link AirFlow}.
 */
public final class IsothermalCoilModel {

    /** Model name reported in ratings. */
    public static final String ID = "isothermal";

    private static final int MAX_ITERATIONS = 100;
    private static final double TOLERANCE_K = 1e-9;

    private final FinEfficiencyMethod finEfficiency;

    /** A model using Schmidt's fin efficiency. */
    public IsothermalCoilModel() {
        this(SchmidtFinEfficiency.INSTANCE);
    }

    /** @param finEfficiency the fin-efficiency method to use */
    public IsothermalCoilModel(FinEfficiencyMethod finEfficiency) {
        this.finEfficiency = finEfficiency;
    }

    /**
     * Rates a case.
     *
     * @param c the case
     * @return the rating
     */
    public Rating rate(CoilCase c) {
        CoilGeometry g = c.coil();
        DerivedGeometry d = g.derive();
        AirInlet air = c.air();
        RefrigerantSide ref = c.refrigerant();
        checkDirection(air, ref);
        org.finstack.fluid.Fluids.byName(ref.fluid()); // an unknown or unsupported refrigerant is refused by name
        AirSideCorrelation correlation = c.factors().applyTo(AirSideCorrelations.standard("coil.finType", g.finType()));
        AirSideSurface surface = surface(g, d);
        PlateFinCell cell = new PlateFinCell(d.collarDiameter(), g.finThickness(), g.transversePitch(),
                g.rowPitch(), g.arrangement() == Arrangement.STAGGERED);

        double tIn = air.temperature();
        double p = air.pressure();
        double rhoIn = DryAir.density(tIn, p);
        double volumeFlow = air.volumeFlow(d.faceArea());
        double mAir = rhoIn * volumeFlow;
        double gMax = mAir / d.minFlowArea();
        double dTmax = ref.saturationTemperature() - tIn;

        double tOut = tIn + 0.5 * dTmax;
        for (int i = 0; ; i++) {
            Warnings w = new Warnings();
            State s = evaluate(c, g, d, correlation, surface, cell, mAir, gMax, 0.5 * (tIn + tOut), w);
            double q = s.effectiveness * s.capacityRate * dTmax;
            double next = tIn + q / s.capacityRate;
            double residual = Math.abs(next - tOut);
            tOut = next;
            if (residual <= TOLERANCE_K) {
                moistureWarnings(air, ref, w);
                return finish(c, d, s, tIn, tOut, mAir, volumeFlow, gMax, rhoIn, w, correlation);
            }
            if (i >= MAX_ITERATIONS) {
                throw new ConvergenceException("air outlet temperature", i, residual);
            }
        }
    }

    private Rating finish(CoilCase c, DerivedGeometry d, State s, double tIn, double tOut, double mAir,
            double volumeFlow, double gMax, double rhoIn, Warnings w, AirSideCorrelation correlation) {
        double rhoOut = DryAir.density(tOut, c.air().pressure());
        double dp = KaysLondonCorePressureDrop.withoutEndLosses(gMax, rhoIn, rhoOut, d.sigma(), s.jf.f(),
                d.airSideArea() / d.minFlowArea());
        double q = Math.abs(s.capacityRate * (tOut - tIn));
        List<Citation> methods = new ArrayList<>();
        methods.add(correlation.source());
        methods.add(finEfficiency.source());
        methods.add(KaysLondonCorePressureDrop.SOURCE);
        methods.add(KaysLondonCorePressureDrop.END_LOSS_SOURCE);
        methods.add(DryAir.CP_SOURCE);
        methods.add(DryAir.TRANSPORT_SOURCE);
        return new Rating(ID, c.refrigerant().duty(), q, tIn, tOut, mAir, volumeFlow, volumeFlow / d.faceArea(), dp,
                d, gMax / s.props.density(), s.reynolds, s.jf.j(), s.jf.f(), s.h, s.etaFin, s.etaO, s.resistances,
                s.ntu, s.effectiveness, s.props, w.list(), methods, dryMoisture(c, q, tOut), null, List.of(), List.of());
    }

    /** This model is sensible-only: the air leaves with the humidity it came with. */
    static Rating.Moisture dryMoisture(CoilCase c, double q, double tOut) {
        AirInlet a = c.air();
        double w = Psychrometrics.humidityRatioFromRelativeHumidity(a.temperature(), a.relativeHumidity(), a.pressure());
        double rh = Psychrometrics.relativeHumidity(tOut, w, a.pressure());
        return new Rating.Moisture(q, 0, 0, false, w, Math.min(1, rh));
    }

    private State evaluate(CoilCase c, CoilGeometry g, DerivedGeometry d, AirSideCorrelation correlation,
            AirSideSurface surface, PlateFinCell cell, double mAir, double gMax, double tMean, Warnings w) {
        double p = c.air().pressure();
        Rating.AirProperties props = new Rating.AirProperties(tMean, DryAir.density(tMean, p), DryAir.cp(tMean),
                DryAir.viscosity(tMean), DryAir.conductivity(tMean), DryAir.prandtl(tMean));
        double reynolds = gMax * d.collarDiameter() / props.viscosity();
        JF jf;
        try {
            jf = correlation.evaluate(surface, reynolds, w);
        } catch (InputException e) {
            throw caseField(e);
        }
        double h = ColburnFactor.heatTransferCoefficient(jf.j(), gMax, props.cp(), props.prandtl());
        double etaFin = finEfficiency.efficiency(cell, h, g.finMaterial().conductivity(), w);
        double etaO = SurfaceEffectiveness.of(etaFin, d.finArea(), d.airSideArea());
        FoulingResistances f = c.fouling();
        double ao = d.airSideArea();
        double perfect = 1 / (h * ao);
        double coating = g.coating() == null ? 0 : g.coating().resistance(g.coatingThickness()) / (etaO * ao);
        Resistances r = new Resistances(perfect, perfect / etaO - perfect, f.airSide() / (etaO * ao), coating,
                f.contact() / d.tubeOuterArea(),
                Math.log(g.tubeOuterDiameter() / g.insideDiameter())
                        / (2 * Math.PI * g.tubeMaterial().conductivity() * d.totalTubeLength()),
                f.inside() / d.insideArea(), 1 / (c.refrigerant().insideCoefficient() * d.insideArea()));
        double capacityRate = mAir * props.cp();
        double ntu = 1 / (r.total() * capacityRate);
        double eps = EpsilonNtu.effectiveness(FlowArrangement.COUNTERFLOW, ntu, 0.0);
        return new State(props, reynolds, jf, h, etaFin, etaO, r, capacityRate, ntu, eps);
    }

    /** Names a surface field the way the case file does, where there is such a key. */
    private static InputException caseField(InputException e) {
        return switch (e.field()) {
            case "rows" -> e.under("coil");
            case "pattern" -> new InputException("coil.finType", e.msg(), e.args());
            default -> e;
        };
    }

    static AirSideSurface surface(CoilGeometry g, DerivedGeometry d) {
        CoilGeometry.FinPattern p = g.finPattern();
        AirSideSurface.Pattern pattern = switch (g.finType().strip().toLowerCase(Locale.ROOT)) {
            case CoilGeometry.WAVY -> new AirSideSurface.Pattern.Wavy(p.waveHeight(), p.waveLength());
            case CoilGeometry.LOUVERED -> new AirSideSurface.Pattern.Louvered(p.louverPitch(), p.louverHeight());
            default -> AirSideSurface.Pattern.Plain.INSTANCE;
        };
        return new AirSideSurface(d.collarDiameter(), g.transversePitch(), g.rowPitch(), g.finPitch(),
                g.finThickness(), g.rows(), d.hydraulicDiameter(), g.arrangement() == Arrangement.STAGGERED, pattern);
    }

    /**
     * This model rates sensible heat only. An evaporator whose refrigerant runs below the
     * entering air's dew point wets its fins (and frosts them below 0 C); say so.
     */
    private static void moistureWarnings(AirInlet air, RefrigerantSide ref, Warnings w) {
        if (ref.duty() != Duty.EVAPORATOR || air.relativeHumidity() == 0) {
            return;
        }
        double humidity = Psychrometrics.humidityRatioFromRelativeHumidity(air.temperature(),
                air.relativeHumidity(), air.pressure());
        double dewPoint = Psychrometrics.dewPointFromHumidityRatio(humidity, air.pressure());
        if (ref.saturationTemperature() < dewPoint) {
            w.add(String.format(Locale.ROOT, "the refrigerant (%.1f C) runs below the entering air's dew point "
                    + "(%.1f C): moisture will condense on the fins%s; this dry rating counts sensible heat "
                    + "only, so the total capacity is understated", ref.saturationTemperature() - 273.15,
                    dewPoint - 273.15, ref.saturationTemperature() < 273.15 ? " and freeze as frost" : ""));
        }
    }

    private static void checkDirection(AirInlet air, RefrigerantSide ref) {
        double tSat = ref.saturationTemperature();
        double tIn = air.temperature();
        boolean ok = ref.duty() == Duty.CONDENSER ? tSat > tIn : tSat < tIn;
        if (!ok) {
            throw new InputException("refrigerant.saturationTemperature", Msg.DUTY_DIRECTION, ref.duty().id(),
                    ref.duty() == Duty.CONDENSER ? "above" : "below", tSat - 273.15, tIn - 273.15);
        }
    }

    private record State(Rating.AirProperties props, double reynolds, JF jf, double h, double etaFin,
            double etaO, Resistances resistances, double capacityRate, double ntu, double effectiveness) {
    }
}
