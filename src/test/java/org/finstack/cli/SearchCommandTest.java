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
 * The {@code search} command as a user meets it, on the demo project (isothermal model, 300
 * candidates): the JSON carries the documented keys and counts, {@code --limit} cuts the list
 * but not the counts, progress goes to standard error only for a person, and bad input ends
 * with status 2 and one line (the project's input contract, an invariant).
 */
class SearchCommandTest {

    private static final String DEMO = "examples/projects/otterby-condenser-options.finstack.json";

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
    void jsonCarriesTheDocumentedKeysAndLimitCutsTheList() throws IOException {
        Run r = run("search", DEMO, "--json", "--limit", "3");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.err()).as("no progress in --json").isEmpty();
        assertThat(r.out()).doesNotContain("NaN").doesNotContain("Infinity");
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertThat(root.get("command").asText()).isEqualTo("search");
        JsonNode res = root.get("results");
        JsonNode counts = res.get("counts");
        for (String k : List.of("generated", "rated", "failed", "meeting", "paretoOptimal", "listed")) {
            assertThat(counts.has(k)).as(k).isTrue();
        }
        // 4 patterns, 18 fin densities over 950 x 420 x 100 mm: rows 7/4/3/3, copper and aluminium tubes and fins
        assertThat(counts.get("generated").asInt()).isEqualTo(counts.get("rated").asInt() + counts.get("failed").asInt());
        assertThat(counts.get("rated").asInt()).isGreaterThan(3);
        assertThat(counts.get("listed").asInt()).isEqualTo(3);
        assertThat(res.get("requirement").get("capacity_W").asDouble()).isEqualTo(7000);
        JsonNode list = res.get("candidates");
        assertThat(list).hasSize(3);
        for (int i = 0; i < 3; i++) {
            JsonNode c = list.get(i);
            assertThat(c.get("rank").asInt()).isEqualTo(i + 1);
            for (String k : List.of("meetsRequirement", "paretoOptimal", "name", "description", "dimensions",
                    "capacity_W", "airPressureDrop_Pa", "charge_kg", "mass_kg", "pressureMargin", "fanReserve_Pa",
                    "coil")) {
                assertThat(c.has(k)).as(k).isTrue();
            }
            for (String k : List.of("tubeOuterDiameter_m", "rows", "tubesPerRow", "faceWidth_m", "faceHeight_m",
                    "depth_m", "finPitch_m", "finType", "tubeMaterial", "finMaterial", "circuits")) {
                assertThat(c.get("dimensions").has(k)).as(k).isTrue();
            }
            assertThat(c.get("dimensions").get("depth_m").asDouble()).isLessThanOrEqualTo(0.1 * (1 + 1e-9));
            assertThat(c.get("dimensions").get("circuits").asInt()).isEqualTo(4);
            assertThat(c.get("charge_kg").isNull()).as("isothermal model gives no charge").isTrue();
        }
        assertThat(list.get(0).get("meetsRequirement").asBoolean()).isTrue();
    }

    @Test
    void tableListsTheBestWithProgressOnStandardError() {
        Run r = run("search", DEMO, "--limit", "5", "--threads", "2");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("Candidate search for").contains("Requirement: 7 kW").contains("   5 ")
                .doesNotContain("   6 ").contains("more (--limit 0 lists all)");
        assertThat(r.err()).contains("rating candidates on 2 thread(s)").contains("(100 %)");
    }

    @Test
    void badInputEndsWithOneLine() throws IOException {
        Path broken = dir.resolve("broken.finstack.json");
        Files.writeString(broken, "{ \"version\": 1, \"name\": \"x\" ");
        Path noOptions = dir.resolve("empty.finstack.json");
        Files.writeString(noOptions, Files.readString(Path.of(DEMO)).replaceAll("(?s)\"existing\".*?\"constraints\"",
                "\"constraints\""));
        for (String[] args : List.of(new String[] {"search", broken.toString()},
                new String[] {"search", dir.resolve("missing.finstack.json").toString()},
                new String[] {"search", noOptions.toString()},
                new String[] {"search", DEMO, "--limit", "-1"},
                new String[] {"search", DEMO, "--threads", "-2"},
                new String[] {"search", DEMO, "--units", "furlongs"})) {
            Run r = run(args);
            assertThat(r.code()).as(String.join(" ", args)).isEqualTo(Main.EXIT_INPUT);
            assertThat(r.err().strip().lines()).as(r.err()).hasSize(1);
            assertThat(r.err()).startsWith("finstack: ").doesNotContain("Exception");
        }
    }
}
