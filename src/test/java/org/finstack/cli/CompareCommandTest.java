package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.finstack.coil.CoilModels;
import org.finstack.io.ProjectFiles;
import org.finstack.study.Project;
import org.finstack.study.uncertainty.UncertaintyBand;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code finstack compare}: the JSON carries the documented keys and agrees with single ratings
 * of the same coils (CoilModels.rate), every example project compares in both unit systems, and
 * a damaged option in the file is reported while the rest compare (read by ProjectFiles, no second
 * path), the capacity band equals study.uncertainty's for the same cases, count and seed, and the
 * project's room feeds the charge screen.
 */
class CompareCommandTest {

    static final Path FULL = Path.of("examples/projects/otterby-condenser-options-full.finstack.json");

    @TempDir
    Path dir;

    @Test
    void everyExampleProjectComparesInBothUnitSystems() throws IOException {
        try (var files = Files.list(Path.of("examples/projects"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(".finstack.json")).toList()) {
                for (String u : List.of("si", "us")) {
                    var r = RateCommandTest.run("compare", p.toString(), "--units", u);
                    assertThat(r.code()).as("%s %s: %s", p, u, r.err()).isZero();
                    assertThat(r.out()).contains("capacity").doesNotContain("NaN").doesNotContain("Infinity");
                }
            }
        }
    }

    @Test
    void jsonCarriesTheDocumentedKeysAndAgreesWithSingleRatings() throws IOException {
        var r = RateCommandTest.run("compare", FULL.toString(), "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode options = new ObjectMapper().readTree(r.out()).at("/results/options");
        Project p = ProjectFiles.read(FULL);
        assertThat(options.size()).isEqualTo(p.allOptions().size());
        double existing = CoilModels.rate(p.caseOf(0)).capacity();
        for (int i = 0; i < options.size(); i++) {
            JsonNode o = options.get(i);
            for (String k : List.of("name", "capacity_W", "capacityRatio", "airPressureDrop_Pa", "airflow_m3_s",
                    "refrigerantPressureDrop_Pa", "charge_kg", "mass_kg", "pressureMargin", "warnings")) {
                assertThat(o.has(k)).as("options[%d].%s", i, k).isTrue();
            }
            var alone = CoilModels.rate(p.caseOf(i));
            Reference.assertRelative(alone.capacity(), o.get("capacity_W").asDouble(), 1e-12, "capacity " + i);
            Reference.assertRelative(alone.capacity() / existing, o.get("capacityRatio").asDouble(), 1e-12, "ratio " + i);
            Reference.assertRelative(alone.refrigerant().charge(), o.get("charge_kg").asDouble(), 1e-12, "charge " + i);
            Reference.assertRelative(alone.geometry().metalMass(), o.get("mass_kg").asDouble(), 1e-12, "mass " + i);
        }
    }

    @Test
    void isothermalProjectSaysChargeIsNotComputed() throws IOException {
        var r = RateCommandTest.run("compare", "examples/projects/otterby-condenser-options.finstack.json", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode o = new ObjectMapper().readTree(r.out()).at("/results/options/0");
        assertThat(o.get("charge_kg").isNull()).isTrue();
        assertThat(o.at("/chargeScreening/notes/0").asText()).contains("not computed");
    }

    @Test
    void damagedOptionInTheFileIsReportedAndTheRestCompare() throws IOException {
        ObjectNode root = (ObjectNode) new ObjectMapper().readTree(Files.readString(FULL));
        ArrayNode options = (ArrayNode) root.get("options");
        ObjectNode bad = options.get(0).deepCopy();
        bad.put("name", "Damaged: fins thicker than their pitch");
        ((ObjectNode) bad.get("coil")).put("finThickness", "3 mm");
        options.insert(1, bad);
        Path file = dir.resolve("damaged.finstack.json");
        Files.writeString(file, root.toString());
        var r = RateCommandTest.run("compare", file.toString(), "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode out = new ObjectMapper().readTree(r.out()).at("/results/options");
        assertThat(out.size()).isEqualTo(5);
        assertThat(out.get(2).get("name").asText()).startsWith("Damaged");
        assertThat(out.get(2).get("error").asText()).startsWith("options[1].coil.finPitch");
        assertThat(out.get(3).get("name").asText()).startsWith("B:");
        assertThat(out.get(3).has("capacity_W")).isTrue();
        var table = RateCommandTest.run("compare", file.toString());
        assertThat(table.code()).isZero();
        assertThat(table.out()).contains("#3 not rated: options[1].coil.finPitch");
    }

    @Test
    void capacityBandIsInTheJsonAndTheTable() throws IOException {
        // reference: study.uncertainty's UncertaintyBand of each option's case, default count and seed (30, 1)
        Path demo = Path.of("examples/projects/otterby-condenser-options.finstack.json");
        var r = RateCommandTest.run("compare", demo.toString(), "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode options = new ObjectMapper().readTree(r.out()).at("/results/options");
        Project p = ProjectFiles.read(demo);
        for (int i = 0; i < options.size(); i++) {
            UncertaintyBand band = UncertaintyBand.of(p.caseOf(i), 30, 1);
            assertThat(options.get(i).get("capacityP10_W").asDouble()).isEqualTo(band.capacityP10());
            assertThat(options.get(i).get("capacityP90_W").asDouble()).isEqualTo(band.capacityP90());
            assertThat(options.get(i).at("/capacityBand/samples").asInt()).isEqualTo(30);
            assertThat(options.get(i).has("capacity_W")).isTrue();
        }
        var table = RateCommandTest.run("compare", demo.toString());
        assertThat(table.out()).contains("capacity p10").contains("capacity p90").contains("30 samples, seed 1");
        var off = RateCommandTest.run("compare", demo.toString(), "--json", "--samples", "0");
        JsonNode first = new ObjectMapper().readTree(off.out()).at("/results/options/0");
        assertThat(first.get("capacityP10_W").isNull()).isTrue();
        assertThat(first.has("capacityBand")).isFalse();
        assertThat(RateCommandTest.run("compare", demo.toString(), "--samples", "0").out()).doesNotContain("p10");
        var seeded = RateCommandTest.run("compare", demo.toString(), "--json", "--samples", "12", "--seed", "7");
        assertThat(new ObjectMapper().readTree(seeded.out()).at("/results/options/0/capacityP90_W").asDouble())
                .isEqualTo(UncertaintyBand.of(p.caseOf(0), 12, 7).capacityP90());
    }

    @Test
    void badSampleCountEndsWithStatus2NamingTheOption() {
        var r = RateCommandTest.run("compare", FULL.toString(), "--samples", "2");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err().strip().lines()).singleElement().asString().contains("--samples");
    }

    @Test
    void roomFromTheProjectFileScreensTheCharge() throws IOException {
        // the propane example's invented room; the verdict is ChargeScreening's (EN 378-1 Annex C)
        Path propane = Path.of("examples/projects/marrowfield-propane-cooler.finstack.json");
        var r = RateCommandTest.run("compare", propane.toString(), "--json", "--samples", "0");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode o = new ObjectMapper().readTree(r.out()).at("/results/options/0/chargeScreening");
        assertThat(o.has("within")).isTrue();
        assertThat(o.has("limit_kg")).isTrue();
        assertThat(RateCommandTest.run("compare", propane.toString(), "--samples", "0").out()).contains("charge screen");
    }

    @Test
    void badProjectEndsWithStatus2AndOneLine() throws IOException {
        Path file = dir.resolve("broken.finstack.json");
        Files.writeString(file, "{ \"version\": 1, \"name\": \"x\" }");
        var r = RateCommandTest.run("compare", file.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err().strip().lines()).hasSize(1);
    }
}
