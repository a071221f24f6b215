package org.finstack.airside.fin;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.HashSet;
import java.util.List;
import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

/** Checks of the registry {@link FinEfficiencyMethods}. */
class FinEfficiencyMethodsTest {

    /** Identifiers are unique and each class's own ID constant names its instance. */
    @Test
    void idsAreUniqueAndMatchTheClassConstants() {
        List<String> ids = FinEfficiencyMethods.ids();
        assertThat(new HashSet<>(ids)).hasSameSizeAs(ids);
        assertThat(ids).containsExactly(SchmidtFinEfficiency.ID, AnnularFinEfficiency.ID);
        assertThat(SchmidtFinEfficiency.INSTANCE.id()).isEqualTo(SchmidtFinEfficiency.ID);
        assertThat(AnnularFinEfficiency.INSTANCE.id()).isEqualTo(AnnularFinEfficiency.ID);
    }

    /** byId(m.id()) returns m for every method, and each names its source. */
    @Test
    void roundTrip() {
        for (FinEfficiencyMethod m : FinEfficiencyMethods.all()) {
            assertThat(FinEfficiencyMethods.byId(m.id())).isSameAs(m);
            assertThat(m.source().reference()).isNotBlank();
        }
    }

    /** An unknown identifier is refused, listing the accepted ones. */
    @Test
    void unknownIdIsRefusedListingTheAcceptedOnes() {
        assertThatThrownBy(() -> FinEfficiencyMethods.byId("sector-method"))
                .isInstanceOf(InputException.class)
                .hasMessageStartingWith("finEfficiencyMethod:")
                .hasMessageContaining(SchmidtFinEfficiency.ID)
                .hasMessageContaining(AnnularFinEfficiency.ID);
        assertThatThrownBy(() -> FinEfficiencyMethods.byId(null)).isInstanceOf(InputException.class);
    }
}
