package org.finstack.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.finstack.fluid.Fluid;
import org.finstack.fluid.FluidInfo;

/**
 * The cautions that go with a rating: the refrigerant's hazards by its safety class (ASHRAE
 * Standard 34 / ISO 817) and its pressure level, and the standing statement that local codes and
 * licensed practice govern. Shown by the command line, the workbench and the report.
 */
public final class Cautions {

    /** Saturation pressure at 45 C above which a refrigerant counts as high-pressure [Pa] (common practice: R-410A, R-32, R-744). */
    public static final double HIGH_PRESSURE_AT_45C = 2.5e6;

    /** The statement every rating carries. */
    public static final String GOVERNING = "Finstack estimates; it does not certify. Local codes, the applicable "
            + "standards (EN 378, ASHRAE 15, IEC 60335-2-40/-89) and licensed practice govern every installation and "
            + "repair; the coil maker's rated design pressure governs the coil.";

    private Cautions() {
    }

    /**
     * @param fluid the refrigerant
     * @return the cautions for it, most serious first, then the governing statement
     */
    public static List<String> forFluid(Fluid fluid) {
        FluidInfo info = fluid.info();
        String safety = info.safetyClass() == null ? "" : info.safetyClass().toUpperCase(Locale.ROOT);
        List<String> out = new ArrayList<>();
        if (safety.startsWith("B")) {
            out.add(info.name() + " is toxic (safety class " + safety + "): leak detection, ventilation and "
                    + "breathing protection as the codes require; work only with training for it.");
        }
        if (safety.endsWith("3")) {
            out.add(info.name() + " is highly flammable (safety class " + safety + "): charge limits apply, keep "
                    + "ignition sources away, use tools and recovery equipment rated for flammable refrigerants.");
        } else if (safety.endsWith("2L") || safety.endsWith("2")) {
            out.add(info.name() + " is flammable (safety class " + safety + "): charge limits and room-size rules "
                    + "apply; use equipment rated for it.");
        }
        boolean high = info.criticalTemperature() <= 318.15
                || fluid.saturationAtTemperature(318.15).bubblePressure() > HIGH_PRESSURE_AT_45C;
        if (high) {
            out.add(info.name() + " runs at high pressure: the coil, its tubes and joints must be built and rated "
                    + "for it; never fit a coil made for lower-pressure refrigerants.");
        }
        out.add("Rooftop and high-level coils are work at height: use the access and fall protection the site requires.");
        out.add(GOVERNING);
        return out;
    }
}
