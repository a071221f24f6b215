package org.finstack.airside;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.finstack.core.InputException;
import org.finstack.testing.Reference;
import org.junit.jupiter.api.Test;

class ColburnFactorTest {

    @Test
    void javadocWorkedExample() {
        // hand calculation: 0.01 * 5 * 1007 / 0.707^(2/3) = 50.35 / 0.793637 = 63.443 W/(m2 K)
        Reference.assertRelative(63.44, ColburnFactor.heatTransferCoefficient(0.01, 5, 1007, 0.707), 1e-4,
                "worked example");
    }

    @Test
    void unitPrandtlNumberGivesStantonNumberDefinition() {
        // with Pr = 1, j = St = h / (G cp)
        Reference.assertRelative(0.02 * 3 * 1005, ColburnFactor.heatTransferCoefficient(0.02, 3, 1005, 1), 1e-15,
                "Pr = 1");
    }

    @Test
    void invalidInputIsRejected() {
        assertThatThrownBy(() -> ColburnFactor.heatTransferCoefficient(0.01, 5, 1007, 0))
                .isInstanceOf(InputException.class).hasMessageContaining("prandtl");
        assertThatThrownBy(() -> ColburnFactor.heatTransferCoefficient(Double.NaN, 5, 1007, 0.7))
                .isInstanceOf(InputException.class).hasMessageContaining("j");
    }
}
