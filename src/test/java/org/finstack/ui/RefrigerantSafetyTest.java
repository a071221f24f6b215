package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Set;
import org.finstack.coil.CoilCase;
import org.finstack.coil.RefrigerantSide;
import org.finstack.io.CaseFiles;
import org.finstack.ui.RefrigerantSafety.Hazard;
import org.junit.jupiter.api.Test;

/**
 * The cautions table: the refrigerants the product issue names, in ASHRAE Standard 34 safety
 * groups (from memory), found however the user spells them; the cautions text appears only for
 * them and always defers to local codes.
 */
class RefrigerantSafetyTest {

    @Test
    void issueListIsClassified() {
        for (String hp : new String[] {"R-744", "R-410A", "R-32", "R-454B"}) {
            assertThat(RefrigerantSafety.hazards(hp)).as(hp).contains(Hazard.HIGH_PRESSURE);
        }
        for (String fl : new String[] {"R-32", "R-1234yf", "R-1234ze(E)", "R-454B", "R-290", "R-600a", "R-1270"}) {
            assertThat(RefrigerantSafety.hazards(fl)).as(fl).contains(Hazard.FLAMMABLE);
        }
        assertThat(RefrigerantSafety.hazards("R-717")).contains(Hazard.TOXIC);
        assertThat(RefrigerantSafety.of("R-717").group()).startsWith("B");
        assertThat(RefrigerantSafety.hazards("R-134a")).isEmpty();
        assertThat(RefrigerantSafety.hazards("R-999")).isEmpty();
    }

    @Test
    void spellingsAreForgiven() {
        assertThat(RefrigerantSafety.of("r410a")).isSameAs(RefrigerantSafety.of("R-410A"));
        assertThat(RefrigerantSafety.of("R 32")).isSameAs(RefrigerantSafety.of("R-32"));
        assertThat(RefrigerantSafety.of("CO2")).isSameAs(RefrigerantSafety.of("R-744"));
        assertThat(RefrigerantSafety.of("R1234ze")).isSameAs(RefrigerantSafety.of("R-1234ze(E)"));
    }

    @Test
    void cautionsOnlyWhereCalledForAndAlwaysDeferToCodes() {
        CoilCase c = CaseFiles.read(Path.of("examples", "otterby-rooftop-condenser.json"));
        assertThat(Cautions.forCase(c)).isEmpty();
        RefrigerantSide r = c.refrigerant();
        CoilCase propane = new CoilCase(c.coil(), c.air(), new RefrigerantSide("R290", r.duty(),
                r.saturationTemperature(), r.insideCoefficient()), c.fouling());
        String text = Cautions.forCase(propane);
        assertThat(text).contains("A3").contains(Messages.get("cautions.flammable")).contains(Messages.get("cautions.codes"))
                .contains(Messages.get("cautions.height")).doesNotContain(Messages.get("cautions.toxic"));
        assertThat(Cautions.full()).contains(RefrigerantSafety.SOURCE.reference());
        assertThat(Set.copyOf(RefrigerantSafety.table().keySet())).contains("R-717", "R-744");
    }
}
