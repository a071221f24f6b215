package org.finstack.cli;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.psychro.MoistAirState;
import org.finstack.fluid.psychro.Psychrometrics;
import org.finstack.units.Dimension;
import org.finstack.units.Quantities;
import org.finstack.units.UnitSystem;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code finstack air}: the moist-air state from dry bulb and one humidity measure. */
@Command(name = "air", mixinStandardHelpOptions = true,
        description = "Moist-air properties (ASHRAE Handbook - Fundamentals psychrometrics).")
final class AirCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Option(names = "--temperature", required = true, paramLabel = "T", description = "dry-bulb temperature, e.g. \"25 C\"")
    private String temperature;

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    private Humidity humidity = new Humidity();

    static final class Humidity {
        @Option(names = "--relative-humidity", paramLabel = "RH", description = "relative humidity, 0..1 or \"50 %\"")
        String relative;
        @Option(names = "--wet-bulb", paramLabel = "T", description = "wet-bulb temperature")
        String wetBulb;
        @Option(names = "--dew-point", paramLabel = "T", description = "dew-point temperature")
        String dewPoint;
        @Option(names = "--humidity-ratio", paramLabel = "W", description = "humidity ratio [kg water / kg dry air]")
        String ratio;
    }

    @Option(names = "--pressure", paramLabel = "P", description = "barometric pressure (default 101.325 kPa)")
    private String pressure;

    @Option(names = "--altitude", paramLabel = "Z", description = "site altitude, for the standard-atmosphere pressure")
    private String altitude;

    @Option(names = "--units", paramLabel = "SYSTEM", defaultValue = "si", description = "si or us")
    private String units;

    @Option(names = "--json", description = "print one JSON object (SI values)")
    private boolean json;

    @Override
    public Integer call() throws Exception {
        UnitSystem system = Output.system(units);
        double t = Quantities.parse("--temperature", temperature, Dimension.TEMPERATURE);
        if (pressure != null && altitude != null) {
            throw new InputException("--pressure", Msg.EXCLUSIVE, "--pressure", "--altitude");
        }
        double p = pressure != null ? Quantities.parse("--pressure", pressure, Dimension.PRESSURE)
                : altitude != null ? Psychrometrics.standardAtmospherePressure(
                        Quantities.parse("--altitude", altitude, Dimension.LENGTH))
                : Psychrometrics.STANDARD_PRESSURE;
        MoistAirState s = state(t, p);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode root = JsonNodeFactory.instance.objectNode();
            root.put("command", "air");
            ObjectNode r = root.putObject("results");
            r.put("dryBulb_C", s.dryBulb() - 273.15);
            r.put("pressure_Pa", s.pressure());
            r.put("relativeHumidity", s.relativeHumidity());
            r.put("humidityRatio_kg_kg", s.humidityRatio());
            r.put("enthalpy_J_kg", s.enthalpy());
            r.put("dewPoint_C", s.dewPoint() - 273.15);
            r.put("wetBulb_C", s.wetBulb() - 273.15);
            r.put("density_kg_m3", s.density());
            r.put("specificVolume_m3_kg", s.specificVolume());
            r.put("vapourPressure_Pa", s.vapourPressure());
            root.putObject("source").put("method", Psychrometrics.SOURCE.toString());
            out.println(Output.pretty(root));
        } else {
            Output.Table tab = new Output.Table(out, system);
            out.println("Moist air (ASHRAE Handbook - Fundamentals psychrometrics)");
            tab.row("dry bulb", s.dryBulb(), Dimension.TEMPERATURE);
            tab.row("barometric pressure", s.pressure(), Dimension.PRESSURE);
            tab.percent("relative humidity", s.relativeHumidity());
            tab.plain("humidity ratio [kg/kg]", s.humidityRatio());
            tab.row("enthalpy (per kg dry air)", s.enthalpy(), Dimension.SPECIFIC_ENTHALPY);
            tab.row("dew point", s.dewPoint(), Dimension.TEMPERATURE);
            tab.row("wet bulb", s.wetBulb(), Dimension.TEMPERATURE);
            tab.row("density (moist air)", s.density(), Dimension.DENSITY);
        }
        return 0;
    }

    private MoistAirState state(double t, double p) {
        if (humidity.wetBulb != null) {
            return MoistAirState.fromWetBulb(t, Quantities.parse("--wet-bulb", humidity.wetBulb, Dimension.TEMPERATURE), p);
        }
        if (humidity.dewPoint != null) {
            return MoistAirState.fromDewPoint(t, Quantities.parse("--dew-point", humidity.dewPoint, Dimension.TEMPERATURE), p);
        }
        if (humidity.ratio != null) {
            return new MoistAirState(t, Quantities.parse("--humidity-ratio", humidity.ratio, Dimension.DIMENSIONLESS), p);
        }
        double rh = humidity.relative == null ? 0
                : Quantities.parse("--relative-humidity", humidity.relative, Dimension.DIMENSIONLESS);
        try {
            return MoistAirState.fromRelativeHumidity(t, rh, p);
        } catch (InputException e) {
            throw e.field().equals("relativeHumidity") ? new InputException("--relative-humidity", e.msg(), e.args()) : e;
        }
    }
}
