package org.finstack.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.BiFunction;
import org.finstack.coil.AirInlet;
import org.finstack.coil.CoilCase;
import org.finstack.coil.CoilModels;
import org.finstack.coil.FoulingResistances;
import org.finstack.coil.Rating;
import org.finstack.coil.RefrigerantSide;
import org.finstack.coil.RefrigerantSide.Target;
import org.finstack.core.FinstackException;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.io.CaseFiles;
import org.finstack.study.Sweep;
import org.finstack.study.explain.Sensitivity;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code finstack sweep CASE.json --vary NAME=FROM:TO:STEP [--unit UNIT] [--csv|--json]}: rates a
 * case with one numeric input stepped, printing one row per value. FROM, TO and STEP are in the
 * parameter's SI unit unless {@code --unit} names another (e.g. {@code --unit C},
 * {@code --unit fpi}). The CSV follows RFC 4180 (comma separated, CRLF line ends, fields with a
 * comma, quote or line break quoted), uses '.' as decimal mark and names the unit of every column
 * in its header, so it opens cleanly in a spreadsheet.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Rates a case over a range of one input. Inputs: finPitch, finDensity, rows, faceVelocity, "
                + "volumeFlow, tubeWall, finThickness, finnedLength, airInletTemperature, relativeHumidity, "
                + "saturationTemperature, airSideFouling, insideFouling, insideCoefficient, superheat, subcooling.")
final class SweepCommand implements Callable<Integer> {

    /** Most values one sweep may rate. */
    static final int MAX_POINTS = 1000;

    /** The inputs that can be swept, each with its dimension and how it changes a case. */
    enum Input {
        FIN_PITCH("finPitch", Dimension.FIN_PITCH, (c, v) -> c.withCoil(c.coil().withFinPitch(v))),
        FIN_DENSITY("finDensity", null, (c, v) -> Sweep.Parameter.FIN_DENSITY.apply(c, v)),
        ROWS("rows", Dimension.DIMENSIONLESS, (c, v) -> Sweep.Parameter.ROWS.apply(c, v)),
        FACE_VELOCITY("faceVelocity", Dimension.VELOCITY, (c, v) -> Sweep.Parameter.FACE_VELOCITY.apply(c, v)),
        VOLUME_FLOW("volumeFlow", Dimension.VOLUME_FLOW, (c, v) -> c.withAir(new AirInlet(c.air().temperature(), 0,
                v, c.air().pressure(), c.air().relativeHumidity()))),
        TUBE_WALL("tubeWall", Dimension.LENGTH, (c, v) -> Sweep.Parameter.TUBE_WALL.apply(c, v)),
        FIN_THICKNESS("finThickness", Dimension.LENGTH, (c, v) -> c.withCoil(c.coil().withFinThickness(v))),
        FINNED_LENGTH("finnedLength", Dimension.LENGTH, (c, v) -> c.withCoil(c.coil().withFinnedLength(v))),
        AIR_INLET_TEMPERATURE("airInletTemperature", Dimension.TEMPERATURE, (c, v) -> c.withAir(new AirInlet(v,
                c.air().faceVelocity(), c.air().volumeFlow(), c.air().pressure(), c.air().relativeHumidity()))),
        RELATIVE_HUMIDITY("relativeHumidity", Dimension.DIMENSIONLESS, (c, v) -> c.withAir(new AirInlet(
                c.air().temperature(), c.air().faceVelocity(), c.air().volumeFlow(), c.air().pressure(), v))),
        SATURATION_TEMPERATURE("saturationTemperature", Dimension.TEMPERATURE,
                (c, v) -> c.withRefrigerant(Sensitivity.withSaturation(c.refrigerant(), v))),
        AIR_SIDE_FOULING("airSideFouling", Dimension.FOULING_RESISTANCE, (c, v) -> Sweep.Parameter.AIR_FOULING.apply(c, v)),
        INSIDE_FOULING("insideFouling", Dimension.FOULING_RESISTANCE, (c, v) -> c.withFouling(new FoulingResistances(
                c.fouling().airSide(), v, c.fouling().contact()))),
        INSIDE_COEFFICIENT("insideCoefficient", Dimension.HEAT_TRANSFER_COEFFICIENT, (c, v) -> c.withRefrigerant(
                refrigerant(c.refrigerant(), v, c.refrigerant().target()))),
        SUPERHEAT("superheat", Dimension.TEMPERATURE_DIFFERENCE, (c, v) -> c.withRefrigerant(refrigerant(
                c.refrigerant(), c.refrigerant().insideCoefficient(), new Target.Superheat(v)))),
        SUBCOOLING("subcooling", Dimension.TEMPERATURE_DIFFERENCE, (c, v) -> c.withRefrigerant(refrigerant(
                c.refrigerant(), c.refrigerant().insideCoefficient(), new Target.Subcooling(v))));

        final String id;
        final Dimension dimension;
        final BiFunction<CoilCase, Double, CoilCase> apply;

        Input(String id, Dimension dimension, BiFunction<CoilCase, Double, CoilCase> apply) {
            this.id = id;
            this.dimension = dimension;
            this.apply = apply;
        }

        String unit() {
            return dimension == null ? "1/m" : dimension.siUnit();
        }

        static Input byId(String id) {
            for (Input i : values()) {
                if (i.id.equalsIgnoreCase(id.strip())) {
                    return i;
                }
            }
            throw new InputException("--vary", Msg.UNKNOWN_NAME, id,
                    String.join(", ", Arrays.stream(values()).map(i -> i.id).toList()));
        }
    }

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CASE", description = "case file (JSON)")
    private Path caseFile;

    @Option(names = "--vary", required = true, paramLabel = "NAME=FROM:TO:STEP",
            description = "the input and its range, e.g. rows=1:6:1 or saturationTemperature=313.15:323.15:2")
    private String vary;

    @Option(names = "--unit", paramLabel = "UNIT",
            description = "unit of FROM, TO and STEP (default: the input's SI unit), e.g. C, fpi, mm")
    private String unit;

    @Option(names = "--csv", description = "print CSV (the default)")
    private boolean csv;

    @Option(names = "--json", description = "print one JSON object instead of CSV")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        if (csv && json) {
            throw new InputException("--csv", Msg.EXCLUSIVE, "--csv", "--json");
        }
        int eq = vary.indexOf('=');
        if (eq < 0) {
            throw new InputException("--vary", Msg.IMPOSSIBLE, "must read NAME=FROM:TO:STEP, got " + vary);
        }
        Input in = Input.byId(vary.substring(0, eq));
        double[] values = values(in, vary.substring(eq + 1));
        CoilCase base = CaseFiles.read(caseFile);
        List<Object[]> rows = new ArrayList<>();
        for (double v : values) {
            try {
                Rating r = CoilModels.rate(in.apply.apply(base, v));
                rows.add(new Object[] {v, r, null});
            } catch (FinstackException e) {
                rows.add(new Object[] {v, null, e.getMessage()});
            }
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = Output.envelope("sweep", caseFile);
            ObjectNode res = root.putObject("results");
            res.put("input", in.id);
            res.put("unit", in.unit());
            ArrayNode pts = res.putArray("points");
            for (Object[] row : rows) {
                ObjectNode p = pts.addObject();
                p.put("value", (double) row[0]);
                Rating r = (Rating) row[1];
                if (r == null) {
                    p.put("error", (String) row[2]);
                    continue;
                }
                p.put("capacity_W", r.capacity());
                p.put("airPressureDrop_Pa", r.airPressureDrop());
                p.put("airOutletTemperature_C", r.airOutletTemperature() - 273.15);
                p.put("airflow_m3_s", r.airVolumeFlow());
                p.put("sensible_W", r.moisture().sensibleCapacity());
                p.put("latent_W", r.moisture().latentCapacity());
                if (r.refrigerant() != null) {
                    p.put("refrigerantPressureDrop_Pa", r.refrigerant().pressureDrop());
                    p.put("charge_kg", r.refrigerant().charge());
                }
            }
            out.println(Output.pretty(root));
            return 0;
        }
        StringBuilder b = new StringBuilder();
        line(b, List.of(in.id + " [" + in.unit() + "]", "capacity [W]", "airPressureDrop [Pa]",
                "airOutletTemperature [C]", "airflow [m3/s]", "sensible [W]", "latent [W]",
                "refrigerantPressureDrop [Pa]", "charge [kg]", "error"));
        for (Object[] row : rows) {
            Rating r = (Rating) row[1];
            List<String> f = new ArrayList<>();
            f.add(number((double) row[0]));
            if (r == null) {
                f.addAll(List.of("", "", "", "", "", "", "", "", (String) row[2]));
            } else {
                f.add(number(r.capacity()));
                f.add(number(r.airPressureDrop()));
                f.add(number(r.airOutletTemperature() - 273.15));
                f.add(number(r.airVolumeFlow()));
                f.add(number(r.moisture().sensibleCapacity()));
                f.add(number(r.moisture().latentCapacity()));
                f.add(r.refrigerant() == null ? "" : number(r.refrigerant().pressureDrop()));
                f.add(r.refrigerant() == null ? "" : number(r.refrigerant().charge()));
                f.add("");
            }
            line(b, f);
        }
        out.print(b);
        out.flush();
        return 0;
    }

    private double[] values(Input in, String range) {
        String[] parts = range.split(":");
        if (parts.length != 3) {
            throw new InputException("--vary", Msg.IMPOSSIBLE, "must read NAME=FROM:TO:STEP, got " + vary);
        }
        double[] v = new double[3];
        for (int i = 0; i < 3; i++) {
            try {
                v[i] = Double.parseDouble(parts[i].strip());
            } catch (NumberFormatException e) {
                throw new InputException("--vary", Msg.NOT_A_NUMBER, parts[i]);
            }
            if (!Double.isFinite(v[i])) {
                throw new InputException("--vary", Msg.NOT_A_NUMBER, parts[i]);
            }
        }
        if (!(v[2] > 0)) {
            throw new InputException("--vary STEP", Msg.NOT_POSITIVE, v[2]);
        }
        if (v[1] < v[0]) {
            throw new InputException("--vary", Msg.IMPOSSIBLE, "TO must not be below FROM, got " + range);
        }
        long n = (long) Math.floor((v[1] - v[0]) / v[2] + 1e-9) + 1;
        if (n > MAX_POINTS) {
            throw new InputException("--vary", Msg.IMPOSSIBLE, "asks for " + n + " values; at most " + MAX_POINTS);
        }
        double[] out = new double[(int) n];
        for (int i = 0; i < n; i++) {
            double x = v[0] + i * v[2];
            out[i] = unit == null || unit.isBlank() ? x : toSi(in, x);
        }
        return out;
    }

    private double toSi(Input in, double x) {
        if (in.dimension == null) {
            return 1 / Quantities.fromUnit(x, Dimension.FIN_PITCH, unit);
        }
        return Quantities.fromUnit(x, in.dimension, unit);
    }

    private static RefrigerantSide refrigerant(RefrigerantSide r, double insideCoefficient, Target t) {
        return new RefrigerantSide(r.fluid(), r.duty(), r.saturationTemperature(), r.convention(), insideCoefficient,
                r.liquidTemperature(), r.inletTemperature(), t, r.model(), r.segments());
    }

    /** @return the value with 7 significant digits, '.' decimal mark, no exponent */
    static String number(double v) {
        return new BigDecimal(v).round(new MathContext(7)).stripTrailingZeros().toPlainString();
    }

    private static void line(StringBuilder b, List<String> fields) {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                b.append(',');
            }
            String f = fields.get(i);
            if (f.contains(",") || f.contains("\"") || f.contains("\n") || f.contains("\r")) {
                b.append('"').append(f.replace("\"", "\"\"")).append('"');
            } else {
                b.append(f);
            }
        }
        b.append("\r\n");
    }
}
