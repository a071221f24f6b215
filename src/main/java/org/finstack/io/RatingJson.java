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

    private RatingJson() {
    }

    /**
     * @param r a rating
     * @return its results object
     */
    public static ObjectNode results(Rating r) {
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
        ArrayNode warnings = o.putArray("warnings");
        r.warnings().forEach(warnings::add);
        ArrayNode methods = o.putArray("methods");
        for (Citation c : r.methods()) {
            methods.addObject().put("key", c.key()).put("reference", c.reference());
        }
        return o;
    }
}
