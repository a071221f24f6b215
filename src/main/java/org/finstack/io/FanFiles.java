package org.finstack.io;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.study.fan.ConstantAirflowEcFan;
import org.finstack.study.fan.FanCurve;
import org.finstack.study.fan.FixedSpeedFan;
import org.finstack.study.fouling.CoilFan;
import org.finstack.units.Dimension;

/**
 * Reads the optional {@code "fan"} object of a case file (the case reader itself ignores it).
 * Two forms:
 * <ul>
 * <li>a curve: {@code "fan": { "curve": [ { "volumeFlow": "0 m3/s", "pressure": "150 Pa" }, ... ] }},
 *     static pressure against volume flow, at least two points, flow rising, pressure not rising;</li>
 * <li>a generic fan: {@code "fan": { "type": "axial" | "forward-curved" | "ec", "designFlow":
 *     "1.2 m3/s", "designPressure": "80 Pa" }}; an {@code ec} fan (constant airflow, holding the
 *     design flow) also takes {@code "maxSpeedRatio"} (default 1: no speed reserve) and
 *     {@code "maxPower"} (electrical, default unlimited).</li>
 * </ul>
 * Quantities are strings "number unit" or bare SI numbers; every error names the field.
 */
public final class FanFiles {

    private static final Set<String> CURVE_KEYS = Set.of("curve");
    private static final Set<String> GENERIC_KEYS = Set.of("type", "designFlow", "designPressure", "maxSpeedRatio",
            "maxPower");
    private static final Set<String> POINT_KEYS = Set.of("volumeFlow", "pressure");

    private FanFiles() {
    }

    /**
     * @param file a case file
     * @return its fan, or empty when it has none
     */
    public static Optional<CoilFan> read(Path file) {
        String text = TextFiles.read(file);
        return parse(text, file.getFileName().toString());
    }

    /**
     * @param json   a case file's text
     * @param origin where it came from, for messages
     * @return its fan, or empty when it has none
     */
    public static Optional<CoilFan> parse(String json, String origin) {
        JsonNode root = CaseFiles.tree(json, origin);
        JsonFields top = new JsonFields(root, "");
        if (!top.has("fan")) {
            return Optional.empty();
        }
        JsonFields f = top.object("fan", true);
        if (f.has("curve")) {
            f.onlyKeys(CURVE_KEYS);
            return Optional.of(curve(root.get("fan").get("curve")));
        }
        if (!f.has("type")) {
            throw new InputException("fan", Msg.EITHER_REQUIRED, "a \"curve\" list", "a generic \"type\"");
        }
        f.onlyKeys(GENERIC_KEYS);
        String type = f.text("type").strip().toLowerCase(Locale.ROOT);
        double flow = f.quantity("designFlow", Dimension.VOLUME_FLOW);
        double pressure = f.quantity("designPressure", Dimension.PRESSURE_DIFFERENCE);
        return Optional.of(new CoilFan.Generic(switch (type) {
            case "axial" -> f.build(() -> FixedSpeedFan.axialPropeller(flow, pressure));
            case "forward-curved" -> f.build(() -> FixedSpeedFan.forwardCurved(flow, pressure));
            case "ec" -> {
                double speed = f.number("maxSpeedRatio", 1);
                double power = f.quantity("maxPower", Dimension.POWER, Double.MAX_VALUE);
                yield f.build(() -> ConstantAirflowEcFan.typical(flow, pressure, speed, power));
            }
            default -> throw new InputException("fan.type", Msg.UNKNOWN_NAME, type, "axial, forward-curved, ec");
        }));
    }

    private static CoilFan curve(JsonNode list) {
        if (!list.isArray()) {
            throw new InputException("fan.curve", Msg.IMPOSSIBLE,
                    "must be a list of points, e.g. [ { \"volumeFlow\": \"0 m3/s\", \"pressure\": \"150 Pa\" }, ... ]");
        }
        double[] q = new double[list.size()];
        double[] p = new double[list.size()];
        for (int i = 0; i < list.size(); i++) {
            JsonFields point = new JsonFields(list.get(i), "fan.curve[" + i + "]");
            point.onlyKeys(POINT_KEYS);
            q[i] = point.quantity("volumeFlow", Dimension.VOLUME_FLOW);
            p[i] = point.quantity("pressure", Dimension.PRESSURE_DIFFERENCE);
        }
        return new CoilFan.Curve(new FanCurve(q, p));
    }
}
