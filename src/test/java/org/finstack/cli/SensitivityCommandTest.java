package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import org.junit.jupiter.api.Test;

/** {@code finstack sensitivity}: tornado data sorted by effect, signs as common practice expects. */
class SensitivityCommandTest {

    @Test
    void jsonListsEffectsLargestFirstWithCommonPracticeSigns() throws IOException {
        var r = RateCommandTest.run("sensitivity", "examples/otterby-rooftop-condenser-full.json", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode effects = new ObjectMapper().readTree(r.out()).at("/results/effects");
        assertThat(effects.size()).isEqualTo(8);
        for (int i = 1; i < effects.size(); i++) {
            assertThat(Math.abs(effects.get(i - 1).get("capacityChange").asDouble()))
                    .isGreaterThanOrEqualTo(Math.abs(effects.get(i).get("capacityChange").asDouble()));
        }
        for (JsonNode e : effects) {
            String in = e.get("input").asText();
            double dq = e.get("capacityChange_W").asDouble();
            if (in.equals("rows") || in.equals("fin density")) {
                assertThat(dq).as(in).isPositive();
                assertThat(e.get("airPressureDropChange_Pa").asDouble()).as(in).isPositive();
            }
            if (in.equals("air-side fouling")) {
                assertThat(dq).as(in).isNegative();
            }
        }
        assertThat(new ObjectMapper().readTree(r.out()).at("/results/explanation/0").asText())
                .startsWith("The air film and fins hold back");
    }

    @Test
    void tablePrintsEveryInput() {
        var r = RateCommandTest.run("sensitivity", "examples/otterby-rooftop-condenser.json");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("fin density").contains("tube material").contains("saturation temperature")
                .doesNotContain("NaN");
    }
}
