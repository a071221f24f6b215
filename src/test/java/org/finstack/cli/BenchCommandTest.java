package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;

/**
 * The {@code bench} command runs a tiny configuration and reports its keys (not a timed test);
 * the invariant checked is the output contract, not a speed.
 */
class BenchCommandTest {

    @Test
    void jsonHasTheKeysAndAFiniteSpeedup() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("bench", "--fluid", "R134a", "--points", "20", "--seconds", "0.01",
                "--coil-runs", "1", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        for (String k : new String[] {"eosCallsPerSecond", "tableCallsPerSecond", "tableSpeedup", "fluids",
            "pointsPerFluid", "eosCalls", "tableCalls", "perFluid", "zoneRatingMedian_ms", "tubeRatingMedian_ms",
            "tubeRatingBySegments", "searchCandidatesPerSecond", "searchModel", "searchCandidatesPerSearch",
            "searchCandidatesPerSecondIsothermal", "uncertaintyBand_ms"}) {
            assertThat(res.has(k)).as(k).isTrue();
        }
        double speedup = res.get("tableSpeedup").asDouble();
        assertThat(Double.isFinite(speedup) && speedup > 0).as("speed-up " + speedup).isTrue();
        assertThat(res.get("fluids").asInt()).isEqualTo(1);
        assertThat(res.get("perFluid").get(0).get("fluid").asText()).isEqualTo("R134a");
        assertThat(res.get("perFluid").get(0).get("maxTemperatureDeviation_K").asDouble()).isLessThan(0.01);
        assertThat(res.get("zoneRatingMedian_ms").asDouble()).isPositive();
        assertThat(res.get("tubeRatingBySegments").size()).isEqualTo(3);
        // the search timing uses the refrigerant-side model of its demo project
        assertThat(res.get("searchModel").asText()).isEqualTo("zones");
        assertThat(res.get("searchCandidatesPerSearch").asInt()).isGreaterThan(1000);
    }

    @Test
    void tableModeForPeople() {
        RateCommandTest.Run r = RateCommandTest.run("bench", "--fluid", "R32", "--points", "10", "--seconds", "0.01",
                "--coil-runs", "0");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("speed-up").contains("R32").contains("all");
    }

    @Test
    void badSettingsNameTheOption() {
        RateCommandTest.Run r = RateCommandTest.run("bench", "--points", "0", "--coil-runs", "0");
        assertThat(r.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(r.err()).startsWith("finstack: --points:");
        RateCommandTest.Run u = RateCommandTest.run("bench", "--fluid", "R-12", "--points", "5");
        assertThat(u.code()).isEqualTo(Main.EXIT_INPUT);
    }
}
