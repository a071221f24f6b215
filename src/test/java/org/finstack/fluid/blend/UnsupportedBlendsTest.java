package org.finstack.fluid.blend;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.finstack.core.InputException;
import org.finstack.core.Msg;
import org.finstack.fluid.Fluids;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Blends that need a multi-fluid mixture model are refused by name, with the reason. */
class UnsupportedBlendsTest {

    @ParameterizedTest
    @ValueSource(strings = {"R448A", "R-449A", "r454b", "R 513A", "R-407F"})
    void refusedByNameWithTheReason(String name) {
        InputException e = assertThrows(InputException.class, () -> Fluids.byName(name));
        assertEquals("refrigerant.fluid", e.field());
        assertEquals(Msg.UNSUPPORTED_FLUID, e.msg());
        assertThat(e.getMessage()).contains("needs a multi-fluid mixture model that Finstack does not have yet")
                .contains("supported blends: R410A, R404A, R407C, R507A");
    }

    @Test
    void registryListsTheRefusedBlendsAndTheSupportedOnes() {
        assertEquals(List.of("R448A", "R449A", "R454B", "R513A", "R407F"), List.copyOf(Fluids.unsupported().keySet()));
        assertThat(Fluids.unsupported().get("R454B")).startsWith("R454B (R-32/R-1234yf, 68.9/31.1 mass %)");
        assertEquals(List.of("R410A", "R404A", "R407C", "R507A"), Fluids.blendNames());
        assertThat(Fluids.names()).doesNotContainAnyElementsOf(Fluids.blendNames());
        assertThat(Fluids.byName("R-410A")).isSameAs(Fluids.byName("r410a"));
        assertThat(Fluids.byName("R507").name()).isEqualTo("R507A");
    }

    @Test
    void unknownNamesStillListEveryKnownFluidAndBlend() {
        InputException e = assertThrows(InputException.class, () -> Fluids.byName("R999"));
        assertEquals(Msg.UNKNOWN_NAME, e.msg());
        assertThat(e.getMessage()).contains("R134a").contains("R407C");
    }
}
