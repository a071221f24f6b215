package org.finstack.core;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Locale;
import java.util.ResourceBundle;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * Invariant of the message catalogue: every {@link Msg} has its text in the bundle, and the
 * text uses exactly the placeholders {0}..{arity-1}.
 */
class MsgCatalogueTest {

    @Test
    void everyMessageHasItsPatternWithMatchingPlaceholders() {
        ResourceBundle b = ResourceBundle.getBundle("org.finstack.core.messages", Locale.ROOT);
        Pattern p = Pattern.compile("\\{(\\d+)}");
        for (Msg m : Msg.values()) {
            assertThat(b.containsKey(m.name())).as("bundle entry for %s", m).isTrue();
            Matcher mm = p.matcher(b.getString(m.name()));
            int max = -1;
            while (mm.find()) {
                max = Math.max(max, Integer.parseInt(mm.group(1)));
            }
            assertThat(max + 1).as("placeholders of %s", m).isEqualTo(m.arity());
        }
        assertThat(b.keySet()).hasSize(Msg.values().length);
    }

    @Test
    void inputExceptionReadsFieldColonReason() {
        InputException e = new InputException("finPitch", Msg.NOT_POSITIVE, -2.0);
        assertThat(e.under("coil").getMessage()).isEqualTo("coil.finPitch: must be greater than zero, got -2");
    }

    @Test
    void validityWarnsOutsideRangeAndNamesTheRange() {
        Validity v = Validity.of(Limit.of("ReDc", 300, 20000));
        Warnings w = new Warnings();
        assertThat(v.check("Test method", "ReDc", 25000.0, w)).isFalse();
        assertThat(v.check("Test method", "ReDc", 2000.0, w)).isTrue();
        assertThat(w.list()).containsExactly(
                "Test method: ReDc = 25000 is outside the published range 300 to 20000");
    }
}
