package org.finstack.study.search;

import org.finstack.coil.Duty;
import org.finstack.core.FinstackException;
import org.finstack.fluid.Fluids;
import org.finstack.geometry.CoilGeometry;
import org.finstack.study.pressure.DesignPressureCheck;
import org.finstack.study.pressure.DesignPressureMargin;
import org.finstack.study.pressure.DesignTemperatureLevel;
import org.finstack.study.pressure.PressureRating;
import org.finstack.study.pressure.TubePressureRating;

/**
 * The design-pressure margin of a candidate's tube: the allowable pressure of the tube
 * ({@link TubePressureRating}, seamless and annealed) over the pressure the refrigerant reaches
 * at the code's design level ({@link DesignPressureCheck}). A condenser is taken as the high
 * side of an air-cooled system ({@link DesignTemperatureLevel#B31_5_HIGH_SIDE_AIR}, 50 C), an
 * evaporator as the low side ({@link DesignTemperatureLevel#B31_5_LOW_SIDE}, 27 C); the metal
 * is taken at that temperature and a blend at its bubble pressure (the higher). An estimate to
 * screen candidates, never a rating: the maker's rated design pressure governs.
 */
public final class PressureMargins {

    private PressureMargins() {
    }

    /**
     * @param duty the coil's duty
     * @return the design level used for it
     */
    public static DesignTemperatureLevel level(Duty duty) {
        return duty == Duty.CONDENSER ? DesignTemperatureLevel.B31_5_HIGH_SIDE_AIR
                : DesignTemperatureLevel.B31_5_LOW_SIDE;
    }

    /**
     * @param coil  the coil
     * @param fluid refrigerant name
     * @param duty  the coil's duty
     * @return the margin, or {@code null} when the tube material has no allowable stress or the
     *         refrigerant has no saturation pressure at the design level (above its critical point)
     */
    public static DesignPressureMargin of(CoilGeometry coil, String fluid, Duty duty) {
        DesignTemperatureLevel level = level(duty);
        try {
            PressureRating tube = TubePressureRating.allowablePressure(coil.tubeMaterial().id(),
                    coil.tubeOuterDiameter(), coil.tubeWall(), level.temperature());
            double p = Fluids.byName(fluid).saturationAtTemperature(level.temperature()).bubblePressure();
            return DesignPressureCheck.margin(tube.allowableGauge(), p);
        } catch (FinstackException e) {
            return null;
        }
    }
}
