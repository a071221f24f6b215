package org.finstack.study.fouling;

import static org.assertj.core.api.Assertions.assertThat;

import org.finstack.coil.CoilCase;
import org.finstack.geometry.CoilGeometry;
import org.finstack.geometry.DerivedGeometry;
import org.finstack.io.CaseFiles;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

/** The fouled geometry, its blocked fraction and the deposit's resistance. */
class DepositLayerTest {

    private static CoilGeometry dairyCooler() throws java.io.IOException {
        CoilCase c = CaseFiles.read(java.nio.file.Path.of("examples/otterby-dairy-cooler-wet.json"));
        return c.coil();
    }

    @Test
    void workedExampleDairyCoolerBlockedFraction() throws java.io.IOException {
        // Hand calculation from DerivedGeometry's definitions (independent of the code): gap between tubes
        // 31.75 - 13.0 = 18.75 mm clean, 31.75 - 13.8 = 17.95 mm fouled; fin share 1 - 0.15/4.2333 clean,
        // 1 - 0.55/4.2333 fouled; blocked = 1 - (17.95 x 0.870079) / (18.75 x 0.964567) = 0.136437.
        double blocked = DepositLayer.blockedFraction(dairyCooler(), 2e-4);
        Reference.assertRelative(0.136437, blocked, 1e-4, "DepositLayer Javadoc worked example");
    }

    @Test
    void passagesNarrowAndFinConductionIsKept() throws java.io.IOException {
        CoilGeometry clean = dairyCooler();
        CoilGeometry fouled = DepositLayer.fouled(clean, 2e-4, "d");
        DerivedGeometry a = clean.derive();
        DerivedGeometry b = fouled.derive();
        assertThat(b.minFlowArea()).isLessThan(a.minFlowArea());
        assertThat(b.hydraulicDiameter()).isLessThan(a.hydraulicDiameter());
        Reference.assertRelative(clean.finThickness() * clean.finMaterial().conductivity(),
                fouled.finThickness() * fouled.finMaterial().conductivity(), 1e-12, "k t of the fin kept");
        assertThat(fouled.insideDiameter()).isEqualTo(clean.insideDiameter());
        assertThat(DepositLayer.fouled(clean, 0, "d")).isSameAs(clean);
    }

    @Test
    void depositResistanceIsThicknessOverConductivity() {
        Reference.assertRelative(0.001, FoulingLevel.dust(1e-4).resistance(), 1e-12, "FoulingLevel worked example");
    }

    @Test
    void louveredAndDenseFinsDrawTheDustWarnings() throws java.io.IOException {
        assertThat(FoulingSusceptibility.warnings(dairyCooler())).isEmpty();
        CoilGeometry louvered = SmallCoils.evaporator(14, 2, 0.5, -6, "louvered").coil();
        assertThat(FoulingSusceptibility.warnings(louvered)).hasSize(2);
    }

    @Test
    void oilFilmValueIsTheTemaFigureConverted() {
        // TEMA 0.002 h ft2 F/Btu; 1 h ft2 F/Btu = 0.17611 m2 K/W (NIST SP 811)
        Reference.assertRelative(3.5222e-4, InsideFouling.OIL_BEARING_VAPOUR, 1e-4, "InsideFouling worked example");
        CoilCase c = InsideFouling.withOilFilm(SmallCoils.condenser(12), InsideFouling.OIL_BEARING_VAPOUR);
        assertThat(c.fouling().inside()).isEqualTo(InsideFouling.OIL_BEARING_VAPOUR);
    }
}
