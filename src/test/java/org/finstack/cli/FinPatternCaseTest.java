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
 * Fin patterns in case files, through the {@code rate} command: the louvered example rates end to
 * end and beats the plain-fin version of the same coil (common practice), and missing,
 * misplaced or unrated pattern parameters end with one line naming the field.
 */
class FinPatternCaseTest {

    private static final String LOUVERED = "examples/otterby-condenser-candidate-louvered.json";

    @TempDir
    Path dir;

    private RateCommandTest.Run rateText(String json) throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, json);
        return RateCommandTest.run("rate", f.toString(), "--json");
    }

    private static String louveredText() throws IOException {
        return Files.readString(Path.of(LOUVERED));
    }

    /** The louvered example with plain fins: same tubes, face, rows and fin pitch. */
    private static String plainTwin() throws IOException {
        String plain = louveredText().replace("\"finType\": \"louvered\"", "\"finType\": \"plain\"")
                .replace("\"louverPitch\": \"2.4 mm\", \"louverHeight\": \"1.0 mm\",", "");
        assertThat(plain).doesNotContain("louverPitch").contains("\"finType\": \"plain\"");
        return plain;
    }

    private static JsonNode results(RateCommandTest.Run r) throws IOException {
        assertThat(r.code()).as(r.err()).isZero();
        return new ObjectMapper().readTree(r.out()).get("results");
    }

    @Test
    void louveredExampleOutRatesItsPlainTwin() throws IOException {
        JsonNode louvered = results(RateCommandTest.run("rate", LOUVERED, "--json"));
        JsonNode plain = results(rateText(plainTwin()));
        assertThat(louvered.get("capacity_W").asDouble()).isGreaterThan(plain.get("capacity_W").asDouble());
        assertThat(louvered.get("colburnJ").asDouble()).isGreaterThan(plain.get("colburnJ").asDouble());
        assertThat(louvered.get("airPressureDrop_Pa").asDouble())
                .isGreaterThan(plain.get("airPressureDrop_Pa").asDouble());
        assertThat(louvered.get("warnings")).isEmpty();
    }

    private static void assertRefused(RateCommandTest.Run r, String start) {
        assertThat(r.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(r.err().lines().count()).as("one line: %s", r.err()).isEqualTo(1);
        assertThat(r.err()).startsWith("finstack: " + start).doesNotContain("Exception");
    }

    @Test
    void patternParametersAreCheckedNamingTheField() throws IOException {
        String ok = louveredText();
        assertRefused(rateText(ok.replace("\"louverHeight\": \"1.0 mm\",", "")), "coil.louverHeight: is missing");
        assertRefused(rateText(ok.replace("\"louverPitch\": \"2.4 mm\"", "\"louverPitch\": \"-2.4 mm\"")),
                "coil.louverPitch:");
        assertRefused(rateText(ok.replace("\"louverPitch\": \"2.4 mm\"", "\"louverPitch\": \"2.4 furlongs\"")),
                "coil.louverPitch: unknown unit");
        assertRefused(rateText(plainTwin().replace("\"finType\": \"plain\"",
                "\"finType\": \"plain\", \"waveHeight\": \"1.2 mm\"")), "coil.waveHeight: belongs to wavy fins");
        assertRefused(rateText(ok.replace("\"rows\": 3,", "\"rows\": 1,")), "coil.rows:");
        String wavyWithoutWave = plainTwin().replace("\"finType\": \"plain\"", "\"finType\": \"wavy\"");
        assertRefused(rateText(wavyWithoutWave), "coil.waveHeight: is missing");
        assertRefused(rateText(wavyWithoutWave.replace("\"finType\": \"wavy\"",
                "\"finType\": \"wavy\", \"waveHeight\": \"1.2 mm\"")), "coil.waveLength: is missing");
        assertRefused(rateText(wavyWithoutWave.replace("\"finType\": \"wavy\"",
                "\"finType\": \"wavy\", \"waveHeight\": \"1.2 mm\", \"waveLength\": \"5.5 mm\"")),
                "coil.finType: no published air-side correlation for wavy fins");
    }
}
