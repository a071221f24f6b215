package org.finstack.study;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.finstack.fluid.Fluids;
import org.junit.jupiter.api.Test;

/**
 * Cautions by refrigerant, against the ASHRAE Standard 34 safety groups and the pressure levels
 * the trade knows (common practice: R-744 and R-410A are high-pressure, R-290 is A3, R-717 is
 * B2L, R-134a is A1 at ordinary pressure).
 */
class CautionsTest {

    @Test
    void hazardsFollowTheSafetyClassAndPressure() {
        assertThat(String.join(" ", Cautions.forFluid(Fluids.byName("R744")))).contains("high pressure");
        assertThat(String.join(" ", Cautions.forFluid(Fluids.byName("R410A")))).contains("high pressure");
        assertThat(String.join(" ", Cautions.forFluid(Fluids.byName("R290")))).contains("highly flammable");
        List<String> ammonia = Cautions.forFluid(Fluids.byName("R717"));
        assertThat(ammonia.get(0)).contains("toxic");
        assertThat(String.join(" ", ammonia)).contains("flammable");
        List<String> plain = Cautions.forFluid(Fluids.byName("R134a"));
        assertThat(String.join(" ", plain)).doesNotContain("toxic").doesNotContain("flammable").doesNotContain("high pressure");
        assertThat(plain).last().isEqualTo(Cautions.GOVERNING);
    }
}
