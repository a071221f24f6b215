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
 * The {@code rate} command as a user meets it: the examples rate, JSON carries the documented
 * keys, and every kind of bad input ends with status 2 and one line naming the field (the
 * project's input contract, an invariant: no stack trace, no NaN).
 */
class RateCommandTest {

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
    void everyExampleRatesInBothUnitSystems() throws IOException {
        try (var files = Files.list(Path.of("examples"))) {
            List<Path> cases = files.filter(p -> p.toString().endsWith(".json")).toList();
            assertThat(cases).hasSizeGreaterThanOrEqualTo(3);
            for (Path p : cases) {
                for (String u : List.of("si", "us")) {
                    Run r = run("rate", p.toString(), "--units", u);
                    assertThat(r.code()).as("%s --units %s: %s", p, u, r.err()).isZero();
                    assertThat(r.out()).contains("capacity").doesNotContain("NaN").doesNotContain("Infinity");
                }
            }
        }
    }

    @Test
    void jsonCarriesTheDocumentedKeys() throws IOException {
        Run r = run("rate", "examples/otterby-rooftop-condenser.json", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        for (String k : List.of("capacity_W", "airOutletTemperature_C", "airMassFlow_kg_s", "airPressureDrop_Pa",
                "faceArea_m2", "airSideArea_m2", "finArea_m2", "insideArea_m2", "minFlowArea_m2",
                "hydraulicDiameter_m", "collarDiameter_m", "maxVelocity_m_s", "reynoldsDc", "colburnJ", "frictionF",
                "airCoefficient_W_m2K", "finEfficiency", "surfaceEffectiveness", "UA_W_K", "NTU", "effectiveness",
                "resistanceShare", "warnings")) {
            assertThat(res.has(k)).as("results.%s", k).isTrue();
        }
        for (String k : List.of("airFilm", "airFouling", "contact", "wall", "insideFouling", "insideFilm")) {
            assertThat(res.get("resistanceShare").has(k)).as("resistanceShare.%s", k).isTrue();
        }
        assertThat(res.get("capacity_W").asDouble()).isPositive();
    }

    private Run rateText(String json) throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, json);
        return run("rate", f.toString());
    }

    private static String example() throws IOException {
        return Files.readString(Path.of("examples/otterby-rooftop-condenser.json"));
    }

    private void assertRefused(Run r, String start) {
        assertThat(r.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(r.err().lines().count()).as("one line: %s", r.err()).isEqualTo(1);
        assertThat(r.err()).startsWith("finstack: " + start).doesNotContain("Exception").doesNotContain("\tat ");
    }

    @Test
    void badInputEndsWithOneLineNamingTheField() throws IOException {
        String ok = example();
        assertRefused(rateText(ok.replace("\"2.1 mm\"", "\"0.1 mm\"")), "coil.finPitch: fin pitch");
        assertRefused(rateText(ok.replace("\"0.30 mm\"", "\"-0.30 mm\"")), "coil.tubeWall:");
        assertRefused(rateText(ok.replace("\"9.52 mm\"", "\"9.52 furlongs\"")), "coil.tubeOuterDiameter: unknown unit");
        assertRefused(rateText(ok.replace("\"copper\"", "\"unobtainium\"")), "coil.tubeMaterial: unknown name");
        assertRefused(rateText(ok.replace("\"rows\": 3,", "")), "coil.rows: is missing");
        assertRefused(rateText(ok.replace("\"rows\": 3,", "\"rows\": 2.5,")), "coil.rows: must be a whole number");
        assertRefused(rateText(ok.replace("\"rows\": 3,", "\"rows\": 0,")), "coil.rows:");
        assertRefused(rateText(ok.replace("\"finType\"", "\"finTipe\"")), "coil.finTipe: is not a key");
        assertRefused(rateText(ok.replace("\"condenser\"", "\"chiller\"")), "refrigerant.duty: unknown name");
        assertRefused(rateText(ok.replace("\"45 C\"", "\"25 C\"")), "refrigerant.saturationTemperature:");
        assertRefused(rateText(ok.replace("\"faceVelocity\": \"2.2 m/s\"", "\"faceVelocity\": \"2.2 m/s\", \"volumeFlow\": \"1 m3/s\"")),
                "air.faceVelocity: give either");
        assertRefused(rateText(ok.substring(0, ok.length() / 2)), "case.json: is not valid JSON");
        assertRefused(rateText(""), "case.json: is not valid JSON");
        assertRefused(run("rate", dir.resolve("missing.json").toString()), dir.resolve("missing.json").toString());
        assertRefused(run("rate", "examples/otterby-rooftop-condenser.json", "--units", "imperial"), "--units: unknown name");
        assertRefused(rateText(ok.replace("\"version\": 1", "\"version\": 9")), "version: was written by a newer Finstack");
    }

    /**
     * Damaged copies found in the review of the study commands: a fin pitch typed in the wrong
     * unit (longer than the coil) was rated to a pressure drop of 1e119 Pa; an explicit zero film
     * coefficient was reported as missing; a file holding an array or {@code null} named no field.
     */
    @Test
    void damagedCaseFilesAreRefusedForTheirOwnReason() throws IOException {
        String ok = example();
        assertRefused(rateText(ok.replace("\"2.1 mm\"", "\"2000 mm\"")),
                "coil.finPitch: fin pitch 2 m must be less than the finned length 0.9 m");
        assertRefused(rateText(ok.replace("\"2500 W/(m2 K)\"", "\"0 W/(m2 K)\"")),
                "refrigerant.insideCoefficient: must be greater than zero");
        assertRefused(rateText(ok.replace("\"2.2 m/s\"", "\"1000 m/s\"")),
                "air.faceVelocity: gives an air Reynolds number of");
        String zones = Files.readString(Path.of("examples/otterby-cooler-evaporator-tubes.json"))
                .replace("\"6000 m3/h\"", "\"2 m3/h\"").replace("\"tubes\"", "\"zones\"");
        assertRefused(rateText(zones), "air.volumeFlow: gives an air Reynolds number of");
        assertRefused(rateText("[1, 2]"), "case.json: must be a JSON object");
        assertRefused(rateText("null"), "case.json: must be a JSON object");
    }
}
