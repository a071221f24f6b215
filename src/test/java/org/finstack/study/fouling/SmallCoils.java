package org.finstack.study.fouling;

import java.util.Locale;
import org.finstack.coil.CoilCase;
import org.finstack.io.CaseFiles;

/**
 * Small zone-model cases for the fouling and frost tests (invented coils; kept small so each
 * rating is quick); dimensions are the trade's usual 3/8 in pattern (common practice), and the
 * checks that use them are invariants (trends), not values.
 */
public final class SmallCoils {

    private SmallCoils() {
    }

    /**
     * @param fpi          fins per inch
     * @param airC         entering air [C]
     * @param rh           relative humidity [-]
     * @param saturationC  saturation temperature [C]
     * @param finType      fin type ("plain" or "louvered")
     * @return a 3-row, 8-tube R-134a evaporator, 0.6 m finned length, on the zone model
     */
    public static CoilCase evaporator(double fpi, double airC, double rh, double saturationC, String finType) {
        String fluid = "R134a";
        String pattern = finType.equals("louvered") ? ", \"louverPitch\": \"1.7 mm\", \"louverHeight\": \"1.0 mm\"" : "";
        String json = String.format(Locale.ROOT, """
                { "version": 2,
                  "coil": { "tubeOuterDiameter": "9.52 mm", "tubeWall": "0.35 mm", "tubeMaterial": "copper",
                            "arrangement": "staggered", "transversePitch": "25.4 mm", "rowPitch": "22 mm",
                            "rows": 3, "tubesPerRow": 8, "finnedLength": "600 mm", "finType": "%s",
                            "finPitch": "%s fpi", "finThickness": "0.15 mm", "finMaterial": "aluminium",
                            "circuits": 1 %s},
                  "air": { "inletTemperature": "%s C", "volumeFlow": "0.5 m3/s", "relativeHumidity": %s },
                  "refrigerant": { "fluid": "%s", "duty": "evaporator", "saturationTemperature": "%s C",
                                   "liquidTemperature": "30 C", "superheat": "5 K", "model": "zones" } }
                """, finType, fpi, pattern, airC, rh, fluid, saturationC);
        return CaseFiles.parse(json, "small-evaporator");
    }

    /**
     * @param fpi fins per inch
     * @return a 2-row, 8-tube R-134a condenser, 0.6 m finned length, 32 C air at 0.6 m3/s, 45 C
     *         condensing, 3 K subcooling, on the zone model (a dry coil)
     */
    public static CoilCase condenser(double fpi) {
        String json = String.format(Locale.ROOT, """
                { "version": 2,
                  "coil": { "tubeOuterDiameter": "9.52 mm", "tubeWall": "0.30 mm", "tubeMaterial": "copper",
                            "arrangement": "staggered", "transversePitch": "25.4 mm", "rowPitch": "22 mm",
                            "rows": 2, "tubesPerRow": 8, "finnedLength": "600 mm", "finType": "plain",
                            "finPitch": "%s fpi", "finThickness": "0.115 mm", "finMaterial": "aluminium",
                            "circuits": 1 },
                  "air": { "inletTemperature": "32 C", "volumeFlow": "0.6 m3/s", "relativeHumidity": 0.4 },
                  "refrigerant": { "fluid": "R134a", "duty": "condenser", "saturationTemperature": "45 C",
                                   "inletTemperature": "70 C", "subcooling": "3 K", "model": "zones" } }
                """, fpi);
        return CaseFiles.parse(json, "small-condenser");
    }

    /** @return the dairy-cooler-like small coil at 6 fpi, +2 C air at 85 %, -6 C saturation */
    public static CoilCase cooler() {
        return evaporator(6, 2, 0.85, -6, "plain");
    }
}
