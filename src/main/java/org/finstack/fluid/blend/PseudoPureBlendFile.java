package org.finstack.fluid.blend;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.HelmholtzFluid;
import org.finstack.fluid.eos.Ancillary;

/**
 * Reads the blend section of a pseudo-pure blend's data file (written by
 * {@code scripts/fluid_blend_extract.py}); the equation of state in the same file is read by the
 * pure-fluid reader and handed in. The section:
 * <pre>
 * blend{composition[{component, massFraction}], compositionSource,
 *       bubblePressure, dewPressure: {form: exp, tauFactor: true, reducingTemperature [K],
 *                                     reducingValue [Pa], n[], t[]}, pressureSource}
 * </pre>
 */
public final class PseudoPureBlendFile {

    private static final ObjectMapper JSON = new ObjectMapper();

    private PseudoPureBlendFile() {
    }

    /**
     * @param resource class-path resource of the blend's data file
     * @param eos      the blend's equation of state, read from the same file
     * @return the blend
     */
    public static Lemmon2003PseudoPureBlend load(String resource, HelmholtzFluid eos) {
        JsonNode root;
        try (InputStream in = PseudoPureBlendFile.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new FinstackException(Msg.FILE_UNREADABLE, resource, "not on the class path");
            }
            root = JSON.readTree(in);
        } catch (IOException e) {
            throw new FinstackException(Msg.FILE_UNREADABLE, resource, e.getMessage());
        }
        JsonNode blend = req(root, "blend");
        List<FluidInfo.Component> comp = new ArrayList<>();
        double sum = 0;
        for (JsonNode c : req(blend, "composition")) {
            double x = num(c, "massFraction");
            comp.add(new FluidInfo.Component(req(c, "component").asText(), x));
            sum += x;
        }
        if (comp.isEmpty() || Math.abs(sum - 1) > 1e-9) {
            throw new FinstackException(Msg.MALFORMED_FILE, "blend mass fractions sum to " + sum + ", not 1");
        }
        FluidInfo e = eos.info();
        FluidInfo info = new FluidInfo(e.name(), e.aliases(), e.chemicalName(), e.safetyClass(), e.gwp100(),
                e.gwpBasis(), e.criticalTemperature(), e.criticalPressure(), e.criticalDensity(), e.molarMass(),
                e.tripleTemperature(), e.triplePressure(), e.minTemperature(), e.maxTemperature(), e.maxPressure(),
                e.equationOfState(), e.referenceState(), comp);
        JsonNode rhoL = req(req(root, "ancillaries"), "liquidDensity");
        if (!"linear".equals(req(rhoL, "form").asText())) {
            throw new FinstackException(Msg.MALFORMED_FILE, "the liquid-density ancillary must have form linear");
        }
        Ancillary liquidStart = new Ancillary(Ancillary.Form.LINEAR, rhoL.path("tauFactor").asBoolean(),
                num(rhoL, "reducingTemperature"), num(rhoL, "reducingValue"), arr(rhoL, "n"), arr(rhoL, "t"));
        return new Lemmon2003PseudoPureBlend(info, eos, equation(req(blend, "bubblePressure")),
                equation(req(blend, "dewPressure")), liquidStart);
    }

    private static SaturationPressureEquation equation(JsonNode n) {
        if (!"exp".equals(req(n, "form").asText()) || !n.path("tauFactor").asBoolean()) {
            throw new FinstackException(Msg.MALFORMED_FILE,
                    "a blend pressure equation must have form exp with the Tc/T factor");
        }
        return new SaturationPressureEquation(num(n, "reducingTemperature"), num(n, "reducingValue"),
                arr(n, "n"), arr(n, "t"));
    }

    private static JsonNode req(JsonNode n, String key) {
        JsonNode v = n.get(key);
        if (v == null || v.isNull()) {
            throw new FinstackException(Msg.MALFORMED_FILE, "missing \"" + key + "\"");
        }
        return v;
    }

    private static double num(JsonNode n, String key) {
        JsonNode v = req(n, key);
        if (!v.isNumber()) {
            throw new FinstackException(Msg.MALFORMED_FILE, "\"" + key + "\" is not a number");
        }
        return v.asDouble();
    }

    private static double[] arr(JsonNode n, String key) {
        JsonNode v = req(n, key);
        double[] out = new double[v.size()];
        for (int i = 0; i < out.length; i++) {
            if (!v.get(i).isNumber()) {
                throw new FinstackException(Msg.MALFORMED_FILE, "\"" + key + "\" holds a value that is not a number");
            }
            out[i] = v.get(i).asDouble();
        }
        return out;
    }
}
