package org.finstack.coil;

import org.finstack.core.Check;
import org.finstack.core.InputException;
import org.finstack.core.Msg;

/**
 * The air entering the coil. The airflow is given either as a face velocity or as a volume
 * flow, both at the inlet state; exactly one of them is positive, the other zero.
 *
 * @param temperature      dry-bulb temperature [K]
 * @param faceVelocity     face velocity at the inlet state [m/s], or 0 when a volume flow is given
 * @param volumeFlow       volume flow at the inlet state [m3/s], or 0 when a face velocity is given
 * @param pressure         barometric (absolute) pressure [Pa]
 * @param relativeHumidity relative humidity [0..1]
 */
public record AirInlet(double temperature, double faceVelocity, double volumeFlow, double pressure,
        double relativeHumidity) {

    /** Validates the inlet state. */
    public AirInlet {
        Check.within("inletTemperature", temperature, 173.15, 373.15);
        Check.nonNegative("faceVelocity", faceVelocity);
        Check.nonNegative("volumeFlow", volumeFlow);
        if (faceVelocity > 0 && volumeFlow > 0) {
            throw new InputException("faceVelocity", Msg.EXCLUSIVE, "faceVelocity", "volumeFlow");
        }
        if (faceVelocity == 0 && volumeFlow == 0) {
            throw new InputException("faceVelocity", Msg.EITHER_REQUIRED, "a positive faceVelocity",
                    "a positive volumeFlow");
        }
        Check.within("pressure", pressure, 50_000, 120_000);
        Check.within("relativeHumidity", relativeHumidity, 0, 1);
    }

    /**
     * @param faceArea the coil's face area [m2]
     * @return the volume flow at the inlet state [m3/s]
     */
    public double volumeFlow(double faceArea) {
        return volumeFlow > 0 ? volumeFlow : faceVelocity * faceArea;
    }
}
