package org.finstack.coil;

import java.util.Locale;
import java.util.Set;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.Fluids;
import org.finstack.fluid.SaturationState;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;

/**
 * What every full rating model needs from a case, worked out once: geometry, the refrigerant and
 * its in-tube model, the circuits, and the refrigerant pressure that the stated saturation
 * temperature refers to.
 *
 * @param c              the case
 * @param derived        derived geometry
 * @param fluid          the refrigerant
 * @param flow           in-tube model
 * @param circuiting     the circuits
 * @param tubeFlowArea   inside cross-section of one tube [m2]
 * @param referencePressure the pressure at the evaporator outlet or condenser inlet [Pa]
 */
record CoilSetup(CoilCase c, DerivedGeometry derived, Fluid fluid, RefrigerantFlow flow, Circuiting circuiting,
        double tubeFlowArea, double referencePressure) {

    /** Copper and its alloys are attacked by ammonia (common practice; ASHRAE Handbook—Refrigeration). */
    private static final Set<String> COPPER_ALLOYS = Set.of("copper", "copper-etp", "cupronickel-90-10");

    /** Field of the refusal of a refrigerant flow that loses most of the pressure in the circuits. */
    static final String TOO_MUCH_FLOW = "refrigerant.massFlow";

    /**
     * The refusal of a flow that loses most of the refrigerant pressure.
     *
     * @param massFlow total refrigerant mass flow [kg/s]
     * @param circuits circuits it runs through
     * @param percent  share of the pressure lost that is refused [%]
     * @return the exception, field {@value #TOO_MUCH_FLOW}
     */
    static InputException tooMuchFlow(double massFlow, int circuits, int percent) {
        return new InputException(TOO_MUCH_FLOW, Msg.IMPOSSIBLE, String.format(Locale.ROOT,
                "%.4g kg/s through %d circuits loses more than %d %% of the refrigerant pressure", massFlow, circuits,
                percent));
    }

    static CoilSetup of(CoilCase c) {
        CoilGeometry g = c.coil();
        Fluid fluid = Fluids.fast(c.refrigerant().fluid());
        if (fluid.name().toUpperCase(Locale.ROOT).equals("R717")) {
            if (COPPER_ALLOYS.contains(g.tubeMaterial().id())) {
                throw new InputException("coil.tubeMaterial", Msg.IMPOSSIBLE, g.tubeMaterial().id()
                        + " is attacked by ammonia (R-717); ammonia coils use steel, stainless steel or aluminium tubes");
            }
            if (COPPER_ALLOYS.contains(g.finMaterial().id())) {
                throw new InputException("coil.finMaterial", Msg.IMPOSSIBLE, g.finMaterial().id()
                        + " is attacked by ammonia (R-717); use aluminium or steel fins");
            }
        }
        DerivedGeometry d = g.derive();
        RefrigerantSide r = c.refrigerant();
        double di = g.insideDiameter();
        return new CoilSetup(c, d, fluid, new RefrigerantFlow(fluid, r.duty(), di, r.insideCoefficient()),
                c.effectiveCircuiting(), Math.PI * di * di / 4, referencePressure(fluid, r));
    }

    /** Dew pressure at the saturation temperature, or for the mid convention the pressure whose mean of bubble and dew is it. */
    static double referencePressure(Fluid fluid, RefrigerantSide r) {
        double t = r.saturationTemperature();
        if (t >= fluid.info().criticalTemperature() - 1) {
            throw new InputException("refrigerant.saturationTemperature", Msg.NOT_BELOW, t,
                    fluid.info().criticalTemperature() - 1);
        }
        SaturationState sat = fluid.saturationAtTemperature(t);
        if (r.convention() == RefrigerantSide.SaturationConvention.DEW || sat.glide() < 1e-3) {
            return sat.dewPressure();
        }
        double lo = sat.dewPressure();
        double hi = sat.bubblePressure();
        for (int i = 0; i < 100; i++) {
            double mid = 0.5 * (lo + hi);
            SaturationState s = fluid.saturationAtPressure(mid);
            if (0.5 * (s.bubbleTemperature() + s.dewTemperature()) < t) {
                lo = mid;
            } else {
                hi = mid;
            }
            if (hi - lo < 1e-6 * hi) {
                break;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** @return number of circuits */
    int circuits() {
        return circuiting.count();
    }

    /** @return mean circuit length inside the finned length [m] */
    double circuitLength() {
        return derived.totalTubeLength() / circuits();
    }

    /** @return mean number of return bends per circuit */
    double bendsPerCircuit() {
        return (double) c.coil().tubes() / circuits() - 1;
    }
}
