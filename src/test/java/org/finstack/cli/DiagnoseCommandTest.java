package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code diagnose} command as a user meets it: the measured examples diagnose, the JSON
 * carries the documented keys with a range for each, and impossible or malformed files end with
 * status 2 and one line naming the field (the project's input contract).
 */
class DiagnoseCommandTest {

    static final String CONDENSER = "examples/measured/otterby-rooftop-condenser-measured.json";
    static final String EVAPORATOR = "examples/measured/otterby-cooler-evaporator-measured.json";

    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void condenserExampleGivesEveryResultWithItsRangeAndThePayback() throws IOException {
        Run r = run("diagnose", CONDENSER, "--json");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).doesNotContain("NaN").doesNotContain("Infinity");
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        List<String> keys = List.of("UA_W_K", "cleanUA_W_K", "foulingLevel", "airSideFouling_m2K_W", "capacityNow_W",
                "capacityClean_W", "capacityLossFraction", "depositLevel", "depositBlockedFraction");
        for (String k : keys) {
            assertThat(res.has(k)).as(k).isTrue();
            JsonNode u = res.get("uncertainty").get(k);
            assertThat(u).as(k + " range").isNotNull();
            assertThat(u.get("p10").asDouble()).as(k).isLessThanOrEqualTo(res.get(k).asDouble());
            assertThat(u.get("p90").asDouble()).as(k).isGreaterThanOrEqualTo(res.get(k).asDouble());
        }
        assertThat(res.get("foulingLevelDefinition").asText()).startsWith("resistance-based");
        assertThat(res.get("depositLevelDefinition").asText()).startsWith("thickness of a dust layer");
        // the deposit model's conductivity (FoulingLevel.DUST_CONDUCTIVITY) times R_f
        assertThat(res.get("depositLevel").asDouble()).isCloseTo(0.1 * res.get("airSideFouling_m2K_W").asDouble(),
                org.assertj.core.data.Offset.offset(1e-12));
        assertThat(res.has("depositLevelFromPressureDrop")).as("no pressure drop was measured").isFalse();
        assertThat(res.get("airSideFouling_m2K_W").asDouble()).isPositive();
        assertThat(res.get("cleanUA_W_K").asDouble()).isGreaterThan(res.get("UA_W_K").asDouble());
        assertThat(res.get("readings").get(0).get("basis").asText()).isEqualTo("common practice");
        // the example's stated limit 0.3 K on the entering air, standard uncertainty 0.3 / sqrt 3 (GUM 4.3.7)
        JsonNode tIn = res.get("measured").get("airInletTemperature_C");
        assertThat(tIn.get("value").asDouble()).isCloseTo(32.0, org.assertj.core.data.Offset.offset(1e-9));
        assertThat(tIn.get("standardUncertainty").asDouble()).isCloseTo(0.3 / Math.sqrt(3),
                org.assertj.core.data.Offset.offset(1e-12));
        // 10 % of 2600 m3/h as the airflow's limit
        assertThat(res.get("measured").get("volumeFlow_m3_s").get("accuracy").asDouble())
                .isCloseTo(260 / 3600.0, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(res.get("payback").get("summary").asText()).startsWith("Cleaning this condenser");
        assertThat(res.get("payback").get("paybackYears").asDouble()).isPositive();
    }

    /** The condenser example with a manometer reading across the coil (accuracy as a share of the value). */
    @Test
    void aMeasuredAirPressureDropGivesTheSecondDepositLevel() throws IOException {
        Path f = dir.resolve("dp.json");
        Files.writeString(f, Files.readString(Path.of(CONDENSER)).replace("\"massFlow\": {",
                "\"airPressureDrop\": { \"value\": \"75 Pa\", \"accuracy\": \"4 %\" },\n    \"massFlow\": {"));
        Run r = run("diagnose", f.toString(), "--json");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).doesNotContain("NaN").doesNotContain("Infinity");
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        for (String k : List.of("depositLevel", "depositLevelFromPressureDrop", "depositBlockedFractionFromPressureDrop")) {
            JsonNode u = res.get("uncertainty").get(k);
            assertThat(u).as(k + " range").isNotNull();
            assertThat(u.get("p10").asDouble()).as(k).isLessThan(res.get(k).asDouble());
            assertThat(u.get("p90").asDouble()).as(k).isGreaterThan(res.get(k).asDouble());
        }
        assertThat(res.get("depositLevelFromPressureDrop").asDouble()).isPositive()
                .isLessThan(res.get("depositMaxThickness_m").asDouble());
        // 4 % of 75 Pa as the reading's limit
        assertThat(res.get("measured").get("airPressureDrop_Pa").get("accuracy").asDouble())
                .isCloseTo(3.0, org.assertj.core.data.Offset.offset(1e-12));
        Run table = run("diagnose", f.toString());
        assertThat(table.code()).as(table.err()).isZero();
        assertThat(table.out()).contains("air pressure drop", "deposit (from duty)", "deposit (from air dp)",
                "of the free-flow area");
    }

    @Test
    void evaporatorExamplePrintsATable() {
        Run r = run("diagnose", EVAPORATOR);
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("capacity lost", "air-side fouling", "healthy", "Cleaning this evaporator")
                .doesNotContain("NaN");
    }

    @Test
    void impossibleReadingsAreRefusedInOneLineNamingTheField() throws IOException {
        String base = Files.readString(Path.of(CONDENSER));
        refused(base.replace("\"39.3 C\"", "\"30.0 C\""), "measured.airOutletTemperature");
        refused(base.replace("\"2600 m3/h\"", "\"0 m3/h\""), "measured.volumeFlow");
        refused(base.replace("\"40 %\"", "\"120 %\""), "measured.airInletRelativeHumidity");
        refused(base.replace("\"47.0 C\"", "\"25 C\""), "measured.saturationTemperature");
        refused(base.replace("\"subcooling\": {", "\"superheat\": {"), "measured.superheat");
        refused(base.replace("\"inletTemperature\": \"72 C\"", "\"inletTemperature\": \"72 C\", \"saturationTemperature\": \"47 C\""),
                "refrigerant.saturationTemperature");
        refused(base.replace("\"air\": { \"pressure\": \"101.325 kPa\" }",
                "\"air\": { \"pressure\": \"101.325 kPa\" }, \"fouling\": { \"airSide\": \"0.0002 m2 K/W\" }"), "fouling.airSide");
        refused(base.replace("\"accuracy\": \"0.3 K\"", "\"accuracy\": \"-0.3 K\""), "measured.airInletTemperature.accuracy");
        refused(base.replace("\"runHours\": 3000,", ""), "cleaning.runHours");
        refused(base.replace("\"massFlow\": {", "\"airPressureDrop\": \"-5 Pa\", \"massFlow\": {"), "measured.airPressureDrop");
        refused(base.replace("\"massFlow\": {", "\"airPressureDrop\": \"50 kPa\", \"massFlow\": {"), "measured.airPressureDrop");
    }

    private void refused(String json, String field) throws IOException {
        Path f = dir.resolve("m.json");
        Files.writeString(f, json);
        Run r = run("diagnose", f.toString(), "--json");
        assertThat(r.code()).as(r.out()).isEqualTo(Main.EXIT_INPUT);
        assertThat(r.err()).startsWith("finstack: " + field + ":");
        assertThat(r.err().strip()).doesNotContain("\n").doesNotContain("Exception");
    }
}
