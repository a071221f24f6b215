package org.finstack.study.search;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import org.finstack.core.InputException;
import org.finstack.geometry.Arrangement;
import org.junit.jupiter.api.Test;

/**
 * The shipped pattern table (coil-library/patterns.json; its dimensions are common practice, not
 * a published table) reads as the file states it, and a damaged entry is refused by name.
 */
class TubePatternTest {

    @Test
    void libraryReadsTheFourGenericPatterns() {
        List<TubePattern> lib = TubePattern.library();
        assertThat(lib).extracting(TubePattern::id)
                .containsExactly("7mm-21x12.7", "3/8in-25.4x22", "1/2in-31.75x27.5", "5/8in-38.1x33");
        TubePattern p = lib.get(1);
        // common practice: 3/8 in tube on a 1 x 0.866 in staggered pattern, fins 6 to 14 per inch
        assertThat(p.tubeOuterDiameter()).isEqualTo(0.00952, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(p.transversePitch()).isEqualTo(0.0254, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(p.rowPitch()).isEqualTo(0.022, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(p.arrangement()).isEqualTo(Arrangement.STAGGERED);
        assertThat(p.finPitches()).hasSize(5);
        assertThat(p.finPitches().get(0)).isEqualTo(0.0254 / 6, org.assertj.core.data.Offset.offset(1e-12));
        assertThat(p.finPitches().get(4)).isEqualTo(0.0254 / 14, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void aMissingDimensionIsRefusedNamingPatternAndKey() throws Exception {
        String json = "{\"patterns\":[{\"id\":\"x\",\"tubeOuterDiameter\":\"9.52 mm\",\"tubeWall\":\"0.3 mm\","
                + "\"arrangement\":\"staggered\",\"transversePitch\":\"25.4 mm\",\"finThickness\":\"0.1 mm\","
                + "\"finDensities\":[\"10 fpi\"]}]}";
        assertThatThrownBy(() -> TubePattern.parse(new ObjectMapper().readTree(json)))
                .isInstanceOf(InputException.class).hasMessageContaining("x.rowPitch");
    }
}
