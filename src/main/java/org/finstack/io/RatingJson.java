package org.finstack.io;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.finstack.coil.Rating;
import org.finstack.core.Citation;
import org.finstack.geometry.DerivedGeometry;

/**
 * The machine-readable form of a {@link Rating}: one JSON object, SI values, keys carrying their
 * unit (e.g. {@code capacity_W}). Other tools rely on these keys; add keys, never rename them.
 */
public final class RatingJson {

    private static final double KELVIN_OFFSET = 273.15;

    /** How the reported temperature difference is defined (the basis refrigeration practice rates on). */
    public static final String TD_BASIS = "entering air minus the dew-point saturation temperature at the evaporator "
            + "outlet; for a condenser the dew-point condensing temperature at the inlet minus the entering air";

    private RatingJson() {
    }

    /**
     * The coil's temperature difference on the basis {@link #TD_BASIS}.
     *
     * @param r a full rating (with a refrigerant result)
     * @return [K]
     */
    public static double temperatureDifference(Rating r) {
        Rating.RefrigerantResult ref = r.refrigerant();
        return r.duty() == org.finstack.coil.Duty.EVAPORATOR
                ? r.airInletTemperature() - ref.outletDewTemperature()
                : ref.inletDewTemperature() - r.airInletTemperature();
    }

    /**
     * @param r a rating
     * @return its results object
     */
    public static ObjectNode results(Rating r) {
        return results(r, false);
    }

    /**
     * @param r     a rating
     * @param tubes whether to add the per-tube table (tube-by-tube model)
     * @return its results object
     */
    public static ObjectNode results(Rating r, boolean tubes) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        ObjectNode o = f.objectNode();
        DerivedGeometry g = r.geometry();
        o.put("model", r.model());
        o.put("duty", r.duty().id());
        o.put("capacity_W", r.capacity());
        o.put("airInletTemperature_C", r.airInletTemperature() - KELVIN_OFFSET);
        o.put("airOutletTemperature_C", r.airOutletTemperature() - KELVIN_OFFSET);
        o.put("airMassFlow_kg_s", r.airMassFlow());
        o.put("airVolumeFlow_m3_s", r.airVolumeFlow());
        o.put("faceVelocity_m_s", r.faceVelocity());
        o.put("airPressureDrop_Pa", r.airPressureDrop());
        o.put("faceArea_m2", g.faceArea());
        o.put("airSideArea_m2", g.airSideArea());
        o.put("finArea_m2", g.finArea());
        o.put("insideArea_m2", g.insideArea());
        o.put("minFlowArea_m2", g.minFlowArea());
        o.put("sigma", g.sigma());
        o.put("hydraulicDiameter_m", g.hydraulicDiameter());
        o.put("collarDiameter_m", g.collarDiameter());
        o.put("internalVolume_m3", g.internalVolume());
        o.put("metalMass_kg", g.metalMass());
        o.put("maxVelocity_m_s", r.maxVelocity());
        o.put("reynoldsDc", r.reynoldsDc());
        o.put("colburnJ", r.colburnJ());
        o.put("frictionF", r.frictionF());
        o.put("airCoefficient_W_m2K", r.airCoefficient());
        o.put("finEfficiency", r.finEfficiency());
        o.put("surfaceEffectiveness", r.surfaceEffectiveness());
        o.put("UA_W_K", r.ua());
        o.put("NTU", r.ntu());
        o.put("effectiveness", r.effectiveness());
        ObjectNode shares = o.putObject("resistanceShare");
        for (Map.Entry<String, Double> e : r.resistances().shares().entrySet()) {
            shares.put(e.getKey(), e.getValue());
        }
        Rating.Moisture m = r.moisture();
        o.put("sensibleCapacity_W", m.sensibleCapacity());
        o.put("latentCapacity_W", m.latentCapacity());
        o.put("sensibleHeatRatio", m.sensibleHeatRatio());
        o.put("condensate_kg_s", m.condensate());
        o.put("frost", m.frost());
        o.put("airOutletHumidityRatio_kg_kg", m.airOutletHumidityRatio());
        o.put("airOutletRelativeHumidity", m.airOutletRelativeHumidity());
        Rating.RefrigerantResult ref = r.refrigerant();
        if (ref != null) {
            o.put("refrigerant", ref.fluid());
            o.put("refrigerantMassFlow_kg_s", ref.massFlow());
            o.put("refrigerantInletPressure_Pa", ref.inletPressure());
            o.put("refrigerantOutletPressure_Pa", ref.outletPressure());
            o.put("refrigerantInletTemperature_C", ref.inletTemperature() - KELVIN_OFFSET);
            o.put("refrigerantOutletTemperature_C", ref.outletTemperature() - KELVIN_OFFSET);
            if (r.duty() == org.finstack.coil.Duty.EVAPORATOR) {
                o.put("outletSuperheat_K", ref.outletSuperheat());
            } else {
                o.put("outletSubcooling_K", ref.outletSubcooling());
            }
            if (ref.outletQuality() >= 0) {
                o.put("outletQuality", ref.outletQuality());
            }
            o.put("refrigerantPressureDrop_Pa", ref.pressureDrop());
            o.put("temperatureDifference_K", temperatureDifference(r));
            o.put("temperatureDifferenceBasis", TD_BASIS);
            o.put("saturationTemperatureDrop_K", ref.saturationTemperatureDrop());
            o.put("charge_kg", ref.charge());
            o.put("energyBalanceError", ref.energyBalanceError());
            ArrayNode circuits = o.putArray("circuits");
            for (Rating.CircuitResult c : ref.circuits()) {
                ObjectNode n = circuits.addObject();
                n.put("index", c.index());
                n.put("massFlow_kg_s", c.massFlow());
                n.put("duty_W", Math.abs(c.duty()));
                n.put("outletTemperature_C", c.outletTemperature() - KELVIN_OFFSET);
                n.put(r.duty() == org.finstack.coil.Duty.EVAPORATOR ? "outletSuperheat_K" : "outletSubcooling_K",
                        r.duty() == org.finstack.coil.Duty.EVAPORATOR ? c.outletSuperheat() : c.outletSubcooling());
                n.put("pressureDrop_Pa", c.pressureDrop());
            }
        }
        ArrayNode zones = o.putArray("zones");
        for (Rating.ZoneResult z : r.zones()) {
            zones.addObject().put("name", z.name()).put("areaFraction", z.areaFraction()).put("duty_W", z.duty())
                    .put("insideCoefficient_W_m2K", z.insideCoefficient()).put("wet", z.wet());
        }
        if (tubes) {
            ArrayNode t = o.putArray("tubes");
            for (Rating.TubeResult tr : r.tubes()) {
                ObjectNode n = t.addObject();
                n.put("circuit", tr.circuit());
                n.put("row", tr.row() + 1);
                n.put("tube", tr.position() + 1);
                n.put("refrigerantInTemperature_C", tr.refrigerantInTemperature() - KELVIN_OFFSET);
                n.put("refrigerantOutTemperature_C", tr.refrigerantOutTemperature() - KELVIN_OFFSET);
                n.put("qualityIn", tr.qualityIn());
                n.put("qualityOut", tr.qualityOut());
                n.put("airInTemperature_C", tr.airInTemperature() - KELVIN_OFFSET);
                n.put("airOutTemperature_C", tr.airOutTemperature() - KELVIN_OFFSET);
                n.put("duty_W", tr.duty());
            }
        }
        ArrayNode warnings = o.putArray("warnings");
        r.warnings().forEach(warnings::add);
        ArrayNode methods = o.putArray("methods");
        for (Citation c : r.methods()) {
            methods.addObject().put("key", c.key()).put("reference", c.reference());
        }
        return o;
    }
}
