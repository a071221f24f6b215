package org.finstack.units;

/** The system of units a person reads and writes in; internally everything is SI. */
public enum UnitSystem {
    /** International System of Units, with the display units usual in refrigeration practice (mm, °C, kW, kPa). */
    SI,
    /** US customary units (in, °F, Btu/h, psia, cfm, fpi). */
    US
}
