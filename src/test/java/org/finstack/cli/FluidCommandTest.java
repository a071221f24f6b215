package org.finstack.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.finstack.testing.Reference.assertRelative;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The {@code fluid} command: keys the product fixes, values against the ASHRAE Handbook -
 * Fundamentals (2017) Ch. 30 R-134a table at 0 C (292.8 kPa, liquid 1294.8 kg/m3, h' = 200.00
 * and h'' = 398.60 kJ/kg; from memory), and the lists a user needs.
 */
class FluidCommandTest {

    @Test
    void saturationAtZeroCelsiusMatchesTheHandbookTable() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("fluid", "R-134a", "--temperature", "0 C", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        for (String k : List.of("pressure_Pa", "liquidDensity_kg_m3", "vaporDensity_kg_m3", "liquidEnthalpy_J_kg",
                "vaporEnthalpy_J_kg", "latentHeat_J_kg", "liquidCp_J_kgK", "vaporCp_J_kgK", "liquidViscosity_Pa_s",
                "vaporViscosity_Pa_s", "liquidConductivity_W_mK", "vaporConductivity_W_mK", "surfaceTension_N_m")) {
            assertThat(res.has(k)).as(k).isTrue();
            assertThat(res.get(k).asDouble()).as(k).isPositive();
        }
        assertRelative(292.8e3, res.get("pressure_Pa").asDouble(), 5e-4, "ASHRAE Ch. 30, R-134a, 0 C, pressure");
        assertRelative(1294.8, res.get("liquidDensity_kg_m3").asDouble(), 5e-4, "ASHRAE Ch. 30, R-134a, 0 C, liquid density");
        assertRelative(200.0e3, res.get("liquidEnthalpy_J_kg").asDouble(), 1e-5, "IIR reference state");
        assertRelative(398.6e3, res.get("vaporEnthalpy_J_kg").asDouble(), 5e-4, "ASHRAE Ch. 30, R-134a, 0 C, vapour enthalpy");
    }

    @Test
    void listNamesSafetyClassGwpAndTheUnsupportedBlends() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("fluid", "--list", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        assertThat(res.get("fluids").size()).isGreaterThanOrEqualTo(16);
        boolean ammonia = false;
        for (JsonNode f : res.get("fluids")) {
            if (f.get("name").asText().equals("R717")) {
                ammonia = true;
                assertThat(f.get("safetyClass").asText()).isEqualTo("B2L"); // ASHRAE 34 (common practice)
            }
        }
        assertThat(ammonia).isTrue();
        assertThat(res.get("unsupported").toString()).contains("R448A");
    }

    @Test
    void stateByPressureAndEnthalpyAndClearRefusals() throws IOException {
        RateCommandTest.Run r = RateCommandTest.run("fluid", "R134a", "--pressure", "300 kPa", "--enthalpy", "300 kJ/kg", "--json");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode res = new ObjectMapper().readTree(r.out()).get("results");
        assertThat(res.get("phase").asText()).isEqualTo("two_phase");
        assertThat(res.get("quality").asDouble()).isBetween(0.45, 0.55); // (300 - 200) / 198.6 near 0.5 (common practice)
        RateCommandTest.Run bad = RateCommandTest.run("fluid", "R999", "--temperature", "0 C");
        assertThat(bad.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(bad.err()).startsWith("finstack: refrigerant.fluid: unknown name");
        RateCommandTest.Run blend = RateCommandTest.run("fluid", "R-448A", "--temperature", "0 C");
        assertThat(blend.err()).contains("needs a multi-fluid mixture model");
        RateCommandTest.Run hot = RateCommandTest.run("fluid", "R744", "--temperature", "40 C");
        assertThat(hot.code()).isEqualTo(Main.EXIT_INPUT);
        assertThat(hot.err().lines().count()).isEqualTo(1);
    }
}
