package org.finstack.material;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.junit.jupiter.api.Test;

/** The material library against its handbook sources and the trade's known ordering. */
class MaterialsTest {

    private final Materials lib = Materials.library();

    /** Incropera et al. 2007, Table A.1 at 300 K: AISI 304 k = 14.9 W/(m K), rho = 7900 kg/m3. */
    @Test
    void incroperaTableA1Stainless304() {
        Material m = lib.tube("coil.tubeMaterial", "SS304");
        assertThat(m.conductivity()).isEqualTo(14.9);
        assertThat(m.density()).isEqualTo(7900);
        assertThat(m.source().key()).isEqualTo("incropera2007");
    }

    /** Incropera et al. 2007, Table A.1 at 300 K: plain carbon steel k = 60.5 W/(m K). */
    @Test
    void incroperaTableA1CarbonSteel() {
        assertThat(lib.tube("t", "carbon-steel").conductivity()).isEqualTo(60.5);
    }

    /**
     * Common practice: alloys conduct less than pure copper (401 W/(m K) at 300 K, Incropera
     * Table A.1), refrigeration copper more than aluminium alloys, and those far more than
     * cupronickel and stainless steel.
     */
    @Test
    void conductivityOrderingOfTheTrade() {
        double cu = lib.tube("t", "copper").conductivity();
        double al = lib.tube("t", "aluminium-3003").conductivity();
        double cuni = lib.tube("t", "cupronickel").conductivity();
        double ss = lib.tube("t", "stainless").conductivity();
        assertThat(cu).isLessThan(401).isGreaterThan(al);
        assertThat(al).isGreaterThan(cuni);
        assertThat(cuni).isGreaterThan(ss);
        assertThat(lib.fin("f", "aluminium").conductivity()).isGreaterThan(al);
    }

    @Test
    void everyValueNamesAResolvableSource() {
        for (Material m : lib.materials()) {
            assertThat(lib.references()).containsValue(m.source());
            assertThat(m.note()).as("note of %s", m.id()).isNotBlank();
        }
        for (Coating c : lib.coatings()) {
            assertThat(lib.references()).containsValue(c.source());
        }
    }

    @Test
    void namesAreCaseInsensitiveAndUnknownNamesListTheAccepted() {
        assertThat(lib.fin("f", "Aluminum").id()).isEqualTo("aluminium");
        assertThatThrownBy(() -> lib.tube("coil.tubeMaterial", "brass"))
                .isInstanceOf(InputException.class)
                .hasMessageStartingWith("coil.tubeMaterial: unknown name \"brass\"; accepted: copper");
        assertThatThrownBy(() -> lib.tube("coil.tubeMaterial", "aluminium"))
                .as("fin stock is not offered as tube").isInstanceOf(InputException.class);
    }

    /** A 25 um epoxy film at 0.2 W/(m K) (from memory) adds 1.25e-4 m2 K/W. */
    @Test
    void coatingResistanceIsThicknessOverConductivity() {
        assertThat(lib.coating("c", "epoxy").resistance(25e-6)).isCloseTo(1.25e-4, org.assertj.core.data.Offset.offset(1e-12));
    }
}
