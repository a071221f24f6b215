package org.finstack.airside;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

class AirSideCorrelationsTest {

    @Test
    void idsAreUniqueAndRoundTrip() {
        List<AirSideCorrelation> all = AirSideCorrelations.all();
        assertThat(all).isNotEmpty();
        Set<String> ids = new HashSet<>();
        for (AirSideCorrelation c : all) {
            assertThat(ids.add(c.id())).as("unique id %s", c.id()).isTrue();
            assertThat(AirSideCorrelations.byId(c.id())).isSameAs(c);
            assertThat(AirSideCorrelations.FIN_TYPES).contains(c.finType());
            assertThat(AirSideCorrelations.byFinType(c.finType())).contains(c);
            assertThat(c.scatterJ()).isBetween(0.0, 1.0);
            assertThat(c.scatterF()).isBetween(0.0, 1.0);
            assertThat(c.scatterBand()).isPositive();
            assertThat(c.validity().limit("ReDc").min()).isPositive();
        }
    }

    @Test
    void plainFinIsRegistered() {
        assertThat(AirSideCorrelations.byId(WangChiChang2000PlainFin.ID)).isSameAs(WangChiChang2000PlainFin.INSTANCE);
        assertThat(AirSideCorrelations.byFinType("plain")).containsExactly(WangChiChang2000PlainFin.INSTANCE);
        assertThat(AirSideCorrelations.byFinType("wavy")).isEmpty();
    }

    @Test
    void louveredFinIsRegisteredAndWavyIsNot() {
        assertThat(AirSideCorrelations.byId(WangLeeChangLin1999LouveredFin.ID))
                .isSameAs(WangLeeChangLin1999LouveredFin.INSTANCE);
        assertThat(AirSideCorrelations.byFinType("louvered")).containsExactly(WangLeeChangLin1999LouveredFin.INSTANCE);
        assertThat(AirSideCorrelations.standard("coil.finType", " Louvered "))
                .isSameAs(WangLeeChangLin1999LouveredFin.INSTANCE);
        assertThatThrownBy(() -> AirSideCorrelations.standard("coil.finType", "wavy"))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("coil.finType")
                .hasMessageContaining("plain, louvered");
    }

    @Test
    void unknownNamesAreRejected() {
        assertThatThrownBy(() -> AirSideCorrelations.byId("no-such-method"))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("no-such-method")
                .hasMessageContaining(WangChiChang2000PlainFin.ID);
        assertThatThrownBy(() -> AirSideCorrelations.byFinType("spine"))
                .isInstanceOf(InputException.class)
                .hasMessageContaining("plain, wavy, louvered");
        assertThatThrownBy(() -> AirSideCorrelations.byId(null)).isInstanceOf(InputException.class);
    }
}
