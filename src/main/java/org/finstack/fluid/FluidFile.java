package org.finstack.fluid;

import static org.finstack.fluid.internal.JsonFields.arr;
import static org.finstack.fluid.internal.JsonFields.num;
import static org.finstack.fluid.internal.JsonFields.req;
import static org.finstack.fluid.internal.JsonFields.text;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.finstack.core.Citation;
import org.finstack.core.FinstackException;
import org.finstack.core.Msg;
import org.finstack.fluid.eos.Ancillary;
import org.finstack.fluid.eos.HelmholtzEos;
import org.finstack.fluid.eos.IdealGasPart;
import org.finstack.fluid.eos.NonAnalyticTerms;
import org.finstack.fluid.eos.SeparableTerms;
import org.finstack.fluid.eos.TermGroup;
import org.finstack.fluid.internal.JsonFields;

/**
 * Reads one fluid data file (JSON, Finstack's own format, version 1) from the class path into a
 * {@link HelmholtzFluid}. The format (written by {@code scripts/fluid_eos_extract.py}):
 * <pre>
 * name, aliases[], chemicalName, safetyClass, gwp100, gwpBasis, source{key, reference},
 * referenceState, molarMass [kg/mol], gasConstant [J/(mol K)],
 * reducing{temperature [K], molarDensity [mol/m3]},
 * critical{temperature [K], pressure [Pa], molarDensity [mol/m3]}, tripleTemperature [K],
 * range{minTemperature, maxTemperature [K], maxPressure [Pa]},
 * ideal{a1, a2, logTau, power{n[], t[]}, planckEinstein{n[], u[]}},
 * residual[ {type: power|powerExpTau|gaussian|gaoB|nonAnalytic, coefficient arrays} ],
 * ancillaries{vapourPressure, liquidDensity, vapourDensity:
 *             {form: exp|linear, tauFactor, reducingTemperature, reducingValue, n[], t[]}}
 * </pre>
 */
final class FluidFile {

    private static final int FORMAT = 1;

    private FluidFile() {
    }

    /**
     * @param resource class-path resource, e.g. {@code /org/finstack/fluid/r134a.json}
     * @return the fluid
     */
    static HelmholtzFluid load(String resource) {
        JsonNode root = JsonFields.read(resource, FORMAT);
        String name = text(root, "name");
        List<String> aliases = new ArrayList<>();
        root.path("aliases").forEach(n -> aliases.add(n.asText()));
        double molarMass = num(root, "molarMass");
        JsonNode crit = req(root, "critical");
        JsonNode range = req(root, "range");
        JsonNode source = req(root, "source");
        FluidInfo info = new FluidInfo(name, aliases, text(root, "chemicalName"), text(root, "safetyClass"),
                num(root, "gwp100"), text(root, "gwpBasis"), num(crit, "temperature"), num(crit, "pressure"),
                num(crit, "molarDensity") * molarMass, molarMass, num(root, "tripleTemperature"), 0,
                num(range, "minTemperature"), num(range, "maxTemperature"), num(range, "maxPressure"),
                Citation.of(text(source, "key"), text(source, "reference")), referenceState(text(root, "referenceState")));
        JsonNode red = req(root, "reducing");
        HelmholtzEos eos = new HelmholtzEos(molarMass, num(root, "gasConstant"), num(red, "temperature"),
                num(red, "molarDensity"), ideal(req(root, "ideal")), residual(req(root, "residual")));
        JsonNode anc = req(root, "ancillaries");
        return new HelmholtzFluid(info, eos, ancillary(req(anc, "vapourPressure")),
                ancillary(req(anc, "liquidDensity")), ancillary(req(anc, "vapourDensity")));
    }

    private static String referenceState(String code) {
        if (!"IIR".equals(code)) {
            throw new FinstackException(Msg.MALFORMED_FILE, "unknown reference state " + code);
        }
        return "IIR: h = 200 kJ/kg and s = 1 kJ/(kg K) for saturated liquid at 0 degC";
    }

    private static IdealGasPart ideal(JsonNode n) {
        JsonNode pw = req(n, "power");
        JsonNode pe = req(n, "planckEinstein");
        return new IdealGasPart(num(n, "a1"), num(n, "a2"), num(n, "logTau"), arr(pw, "n"), arr(pw, "t"),
                arr(pe, "n"), arr(pe, "u"));
    }

    private static List<TermGroup> residual(JsonNode groups) {
        List<TermGroup> out = new ArrayList<>();
        for (JsonNode g : groups) {
            String type = text(g, "type");
            TermGroup group = switch (type) {
                case "power" -> SeparableTerms.power(arr(g, "n"), arr(g, "d"), arr(g, "t"), arr(g, "l"));
                case "powerExpTau" -> SeparableTerms.powerExpTau(arr(g, "n"), arr(g, "d"), arr(g, "t"),
                        arr(g, "l"), arr(g, "m"));
                case "gaussian" -> SeparableTerms.gaussian(arr(g, "n"), arr(g, "d"), arr(g, "t"), arr(g, "eta"),
                        arr(g, "epsilon"), arr(g, "beta"), arr(g, "gamma"));
                case "gaoB" -> SeparableTerms.gaoB(arr(g, "n"), arr(g, "d"), arr(g, "t"), arr(g, "eta"),
                        arr(g, "epsilon"), arr(g, "beta"), arr(g, "gamma"), arr(g, "b"));
                case "nonAnalytic" -> new NonAnalyticTerms(arr(g, "n"), arr(g, "a"), arr(g, "b"), arr(g, "beta"),
                        arr(g, "A"), arr(g, "B"), arr(g, "C"), arr(g, "D"));
                default -> throw new FinstackException(Msg.MALFORMED_FILE, "unknown residual term type " + type);
            };
            out.add(group);
        }
        return out;
    }

    private static Ancillary ancillary(JsonNode n) {
        Ancillary.Form form = switch (text(n, "form")) {
            case "exp" -> Ancillary.Form.EXP;
            case "linear" -> Ancillary.Form.LINEAR;
            default -> throw new FinstackException(Msg.MALFORMED_FILE, "unknown ancillary form " + n.path("form"));
        };
        return new Ancillary(form, n.path("tauFactor").asBoolean(), num(n, "reducingTemperature"),
                num(n, "reducingValue"), arr(n, "n"), arr(n, "t"));
    }
}
