package org.finstack.fluid.blend;

import static org.finstack.fluid.internal.JsonFields.arr;
import static org.finstack.fluid.internal.JsonFields.num;
import static org.finstack.fluid.internal.JsonFields.req;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;
import org.finstack.fluid.FluidInfo;
import org.finstack.fluid.HelmholtzFluid;
import org.finstack.fluid.eos.Ancillary;
import org.finstack.fluid.internal.JsonFields;

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

    private PseudoPureBlendFile() {
    }

    /**
     * @param resource class-path resource of the blend's data file
     * @param eos      the blend's equation of state, read from the same file
     * @return the blend
     */
    public static Lemmon2003PseudoPureBlend load(String resource, HelmholtzFluid eos) {
        JsonNode root = JsonFields.read(resource);
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
}
