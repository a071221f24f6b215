package org.finstack.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Invariant of the catalogue: every key the fouling and diagnosis tabs build from names exists in
 * Messages.properties.
 */
class MessagesFieldKeysTest {

    @Test
    void keysBuiltFromNamesExist() {
        List<String> keys = new ArrayList<>();
        for (FoulingPanel.FanChoice c : FoulingPanel.FanChoice.values()) {
            keys.add("field.fan." + c.name());
        }
        for (String c : FoulingPanel.COLUMNS) {
            keys.add("field.fouling.column." + c);
        }
        for (String r : DiagnosisPanel.RESULTS) {
            keys.add("field.diagnosis.result." + r);
        }
        for (String r : List.of("airInletTemperature", "airOutletTemperature", "airInletRelativeHumidity", "volumeFlow",
                "saturationTemperature", "superheat", "subcooling")) {
            keys.add("field.diagnosis.reading." + r);
        }
        assertThat(keys).isNotEmpty().allMatch(Messages::has, "present in Messages.properties");
    }
}
