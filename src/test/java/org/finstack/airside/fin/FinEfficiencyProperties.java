package org.finstack.airside.fin;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.finstack.core.Warnings;

/** Invariants of every {@link FinEfficiencyMethod} over random valid cells and conditions. */
class FinEfficiencyProperties {

    /** eta_f lies in (0, 1] and does not rise when h rises. */
    @Property(tries = 300)
    void efficiencyIsAFractionAndFallsWithH(
            @ForAll @DoubleRange(min = 5, max = 20) double dcMm,
            @ForAll @DoubleRange(min = 50, max = 500) double tMicron,
            @ForAll @DoubleRange(min = 1.05, max = 4) double ptOverDc,
            @ForAll @DoubleRange(min = 1.05, max = 4) double plOverDc,
            @ForAll boolean staggered,
            @ForAll @DoubleRange(min = 0.1, max = 2000) double h,
            @ForAll @DoubleRange(min = 10, max = 400) double k) {
        double dc = dcMm * 1e-3;
        PlateFinCell cell = new PlateFinCell(dc, tMicron * 1e-6, ptOverDc * dc, plOverDc * dc, staggered);
        for (FinEfficiencyMethod m : FinEfficiencyMethods.all()) {
            double eta = m.efficiency(cell, h, k, Warnings.discard());
            double higherH = m.efficiency(cell, 1.5 * h, k, Warnings.discard());
            assertThat(eta).as(m.id()).isGreaterThan(0).isLessThanOrEqualTo(1);
            assertThat(higherH).as(m.id()).isLessThanOrEqualTo(eta);
        }
    }
}
