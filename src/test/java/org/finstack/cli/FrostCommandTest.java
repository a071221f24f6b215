package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;

/** The {@code frost} command: the documented JSON keys, no frost on a warm coil (common practice), one-line errors (invariant of the input contract). */
class FrostCommandTest {

    static final String EXAMPLE = "examples/marrowfield-chill-evaporator-frost-fan.json";

    @Test
    void jsonCarriesTheTimelineAndTheDefrostInterval() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("frost", EXAMPLE, "--hours", "3", "--steps", "6", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        assertThat(res.get("frosting").asBoolean()).isTrue();
        assertThat(res.get("timeline").size()).isGreaterThan(1);
        for (JsonNode p : res.get("timeline")) {
            for (String key : new String[] {"time_h", "frostMass_kg", "frostThickness_m", "airflow_m3_s", "capacity_W"}) {
                assertThat(p.get(key).isNumber()).as(key).isTrue();
            }
        }
        assertThat(res.get("defrostInterval_h").isNumber()).isTrue();
    }

    @Test
    void shortRunGivesANullInterval() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("frost", EXAMPLE, "--hours", "0.25", "--steps", "1", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(new ObjectMapper().readTree(r.out()).get("results").get("defrostInterval_h").isNull()).isTrue();
    }

    @Test
    void condenserGrowsNoFrostAndSaysSo() {
        RateCommandTest.Run r = RateCommandTest.run("frost", "examples/otterby-rooftop-condenser-full.json", "--hours", "2");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("no frost grows").contains("not reached");
    }

    @Test
    void badInputsEndWithOneLineAndStatusTwo() {
        // the refusal names the option as typed (it named the study's parameter, "hours: ...")
        String[][] cases = {{"finstack: --threshold: ", "--threshold", "1.5"}, {"finstack: --steps: ", "--steps", "0"},
            {"finstack: --hours: must be greater than zero", "--hours", "-1"}};
        for (String[] c : cases) {
            String[] args = c[1].equals("--hours") ? new String[] {"frost", EXAMPLE, c[1], c[2]}
                    : new String[] {"frost", EXAMPLE, "--hours", "1", c[1], c[2]};
            RateCommandTest.Run r = RateCommandTest.run(args);
            assertThat(r.code()).as(String.join(" ", args)).isEqualTo(Main.EXIT_INPUT);
            assertThat(r.err().strip().lines().count()).as(r.err()).isEqualTo(1);
            assertThat(r.err()).startsWith(c[0]);
        }
        RateCommandTest.Run missing = RateCommandTest.run("frost", EXAMPLE);
        assertThat(missing.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(missing.err()).contains("--hours");
    }
}
