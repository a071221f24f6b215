package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code fouling} command: the documented JSON keys, the inferred level, the note without a
 * fan, and one-line errors with status 2 (an invariant: the project's input contract).
 */
class FoulingCommandTest {

    static final String EXAMPLE = "examples/otterby-rooftop-condenser-fouling-fan.json";

    @TempDir
    Path dir;

    @Test
    void jsonCarriesTheCurveAndTheInferredLevel() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("fouling", EXAMPLE, "--json", "--levels", "3",
                "--measured-rise", "10 Pa");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        assertThat(res.get("curve")).hasSize(3);
        for (JsonNode p : res.get("curve")) {
            assertThat(p.has("level")).isTrue();
            assertThat(p.get("level").has("depositThickness_m")).isTrue();
            assertThat(p.get("level").has("blockedFraction")).isTrue();
            for (String key : new String[] {"capacity_W", "airflow_m3_s", "airPressureDrop_Pa", "capacityLossFraction",
                    "fanPower_W"}) {
                assertThat(p.get(key).isNumber()).as(key).isTrue();
            }
        }
        assertThat(res.get("curve").get(0).get("capacityLossFraction").asDouble()).isZero();
        assertThat(res.get("airflowHeldConstant").asBoolean()).isFalse();
        JsonNode inf = res.get("inferred");
        assertThat(inf.get("measuredRise_Pa").asDouble()).isEqualTo(10.0);
        assertThat(inf.get("capacityLossFraction").asDouble()).isPositive();
        assertThat(inf.get("level").get("depositThickness_m").asDouble()).isPositive();
    }

    @Test
    void withoutAFanTheOutputSaysTheAirflowIsHeld() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("fouling", "examples/otterby-rooftop-condenser-full.json", "--levels", "2");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("airflow held constant").contains("understated");
    }

    @Test
    void badInputsEndWithOneLineAndStatusTwo() throws IOException {
        String text = Files.readString(Path.of(EXAMPLE));
        Path badType = dir.resolve("bad-type.json");
        Files.writeString(badType, text.replace("\"type\": \"axial\"", "\"type\": \"turbine\""));
        Path badCurve = dir.resolve("bad-curve.json");
        Files.writeString(badCurve, text.replace("\"fan\": { \"type\": \"axial\", \"designFlow\": \"0.72 m3/s\", \"designPressure\": \"45 Pa\" }",
                "\"fan\": { \"curve\": [ { \"volumeFlow\": \"0 m3/s\", \"pressure\": \"50 Pa\" }, { \"volumeFlow\": \"1 m3/s\", \"pressure\": \"80 Pa\" } ] }"));
        String[][] cases = {
            {"fan.type", badType.toString()},
            {"fan.curve[1].pressure", badCurve.toString()},
            {"--measured-rise", EXAMPLE, "--measured-rise", "35 kg"},
            // a refusal of an option's value names the option as typed (it named the study's parameter)
            {"finstack: --measured-rise: ", EXAMPLE, "--measured-rise", "5000 Pa", "--levels", "2"},
            {"finstack: --measured-ratio: ", EXAMPLE, "--measured-ratio", "0.5", "--levels", "2"},
            {"finstack: --levels: ", EXAMPLE, "--levels", "1"},
            {"finstack: --max-thickness: ", EXAMPLE, "--max-thickness", "-1 mm"},
            {"finstack: --max-thickness: ", EXAMPLE, "--max-thickness", "50 mm"},
            {"finstack: --deposit-conductivity: ", EXAMPLE, "--deposit-conductivity", "0 W/(m K)"},
            {"finstack: --inside-fouling: ", EXAMPLE, "--inside-fouling", "-1 m2 K/W"},
        };
        for (String[] c : cases) {
            String[] args = new String[c.length];
            args[0] = "fouling";
            System.arraycopy(c, 1, args, 1, c.length - 1);
            RateCommandTest.Run r = RateCommandTest.run(args);
            assertThat(r.code()).as(String.join(" ", args)).isEqualTo(Main.EXIT_INPUT);
            assertThat(r.err().strip().lines().count()).as(r.err()).isEqualTo(1);
            assertThat(r.err()).contains(c[0]).doesNotContain("Exception").doesNotContain("NaN");
        }
    }
}
