package org.finstack.tubeside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;

import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

class RegistriesTest {

    @Test
    void idsAreUniqueAcrossAllRegistries() {
        List<String> ids = new ArrayList<>();
        ids.addAll(BoilingCorrelations.ids());
        ids.addAll(CondensationCorrelations.ids());
        ids.addAll(TwoPhaseFrictions.ids());
        ids.addAll(VoidFractions.ids());
        assertThat(ids).doesNotHaveDuplicates().hasSize(11);
    }

    @Test
    void byIdReturnsTheRegisteredInstanceAndDefaultsComeFirst() {
        for (BoilingCorrelation c : BoilingCorrelations.all()) {
            assertThat(BoilingCorrelations.byId(c.id())).isSameAs(c);
            assertThat(c.source().reference()).isNotBlank();
        }
        for (CondensationCorrelation c : CondensationCorrelations.all()) {
            assertThat(CondensationCorrelations.byId(c.id())).isSameAs(c);
        }
        for (TwoPhaseFriction c : TwoPhaseFrictions.all()) {
            assertThat(TwoPhaseFrictions.byId(c.id())).isSameAs(c);
        }
        for (VoidFraction c : VoidFractions.all()) {
            assertThat(VoidFractions.byId(c.id())).isSameAs(c);
        }
        assertThat(BoilingCorrelations.all().get(0)).isSameAs(BoilingCorrelations.standard())
                .isSameAs(GungorWinterton1987.INSTANCE);
        assertThat(CondensationCorrelations.all().get(0)).isSameAs(CondensationCorrelations.standard())
                .isSameAs(Shah1979.INSTANCE);
        assertThat(TwoPhaseFrictions.all().get(0)).isSameAs(TwoPhaseFrictions.standard())
                .isSameAs(Friedel1979.INSTANCE);
        assertThat(VoidFractions.all().get(0)).isSameAs(VoidFractions.standard()).isSameAs(Steiner1993.INSTANCE);
    }

    @Test
    void unknownIdNamesTheFieldAndTheChoices() {
        assertThatThrownBy(() -> BoilingCorrelations.byId("chen-1966")).isInstanceOf(InputException.class)
                .hasMessageStartingWith("tubeSide.boiling:").hasMessageContaining("gungor-winterton-1987");
        assertThatThrownBy(() -> CondensationCorrelations.byId(null)).isInstanceOf(InputException.class)
                .hasMessageContaining("shah-1979");
        assertThatThrownBy(() -> TwoPhaseFrictions.byId("x")).hasMessageStartingWith("tubeSide.twoPhaseFriction:");
        assertThatThrownBy(() -> VoidFractions.byId("x")).hasMessageStartingWith("tubeSide.voidFraction:");
    }
}
