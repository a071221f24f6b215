package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.finstack.testing.Reference.assertRelative;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;

/**
 * The {@code air} command against the ASHRAE Handbook - Fundamentals (2017, Ch. 1) relations
 * evaluated here by hand from PsychroLib 1.1.1's saturation pressure at 25 C (3169.216 Pa, the
 * committed reference data psychro_psychrolib.csv), and the chart reading a practitioner knows
 * (common practice: 25 C / 50 % has a dew point near 13.9 C and a wet bulb near 17.9 C).
 */
class AirCommandTest {

    @Test
    void jsonResultsAtTwentyFiveCelsiusFiftyPercent() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("air", "--temperature", "25 C", "--relative-humidity", "50 %", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        double pw = 0.5 * 3169.2164701436277; // PsychroLib 1.1.1 saturation pressure at 25 C (reference CSV)
        double w = 0.621945 * pw / (101325 - pw); // ASHRAE Fundamentals 2017 Ch. 1, W = 0.621945 pw/(p - pw)
        double h = 1006 * 25 + w * (2501e3 + 1860 * 25); // ASHRAE Fundamentals 2017 Ch. 1 enthalpy, J/kg dry air
        assertRelative(w, res.get("humidityRatio_kg_kg").asDouble(), 1e-9, "W at 25 C, 50 %");
        assertRelative(h, res.get("enthalpy_J_kg").asDouble(), 1e-9, "h at 25 C, 50 %");
        assertThat(res.get("dewPoint_C").asDouble()).isBetween(13.8, 14.0); // common practice
        assertThat(res.get("wetBulb_C").asDouble()).isBetween(17.8, 18.0); // common practice
        for (String k : new String[] {"humidityRatio_kg_kg", "enthalpy_J_kg", "dewPoint_C", "wetBulb_C", "density_kg_m3"}) {
            assertThat(res.has(k)).as(k).isTrue();
        }
    }

    @Test
    void impossibleHumidityIsRefusedNamingTheOption() {
        RateCommandTest.Run r = RateCommandTest.run("air", "--temperature", "25 C", "--relative-humidity", "50");
        assertThat(r.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(r.err()).startsWith("finstack: --relative-humidity: must lie between 0 and 1");
        RateCommandTest.Run w = RateCommandTest.run("air", "--temperature", "25 C", "--wet-bulb", "30 C");
        assertThat(w.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(w.err().lines().count()).isEqualTo(1);
    }
}
