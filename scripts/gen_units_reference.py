"""Reference data for org.finstack.units: temperature scales and conversion factors
computed by scipy.constants (CODATA/NIST definitions), independent of the Java code.

Writes src/test/resources/reference/units_temperature.csv and
src/test/resources/reference/units_factors.csv. Run from the repository root:
    python3 scripts/gen_units_reference.py
"""
import scipy
from scipy import constants as c

HEADER = (
    "# source: scipy.constants {ver} (definitions of NIST SP 811 / CODATA)\n"
    "# table: {table}\n"
    "# units: {units}\n"
    "# tolerance: {tol}\n"
    "# generating script: scripts/gen_units_reference.py\n"
)

temps_c = [-273.15, -100.0, -40.0, -17.7777777778, 0.0, 4.0, 7.2, 15.5, 25.0, 35.0, 45.0, 54.4, 100.0, 150.0]
with open("src/test/resources/reference/units_temperature.csv", "w") as f:
    f.write(HEADER.format(ver=scipy.__version__,
                          table="one temperature on four scales (scipy.constants.convert_temperature)",
                          tol="relative 1e-12 on kelvin; absolute 1e-9 degree on the Celsius, Fahrenheit and Rankine scales",
                          units="celsius [degC], kelvin [K], fahrenheit [degF], rankine [degR]"))
    f.write("celsius,kelvin,fahrenheit,rankine\n")
    for t in temps_c:
        k = c.convert_temperature(t, "Celsius", "Kelvin")
        fa = c.convert_temperature(t, "Celsius", "Fahrenheit")
        ra = c.convert_temperature(t, "Celsius", "Rankine")
        f.write(f"{t!r},{float(k)!r},{float(fa)!r},{float(ra)!r}\n")

# case number, SI value of one unit; the Java test maps each case number to (dimension, unit)
factors = [
    (1, c.inch),                                  # LENGTH in
    (2, c.foot),                                  # LENGTH ft
    (3, c.pound),                                 # MASS lb
    (4, c.oz),                                    # MASS oz
    (5, c.gallon_US),                             # VOLUME gal
    (6, c.psi),                                   # PRESSURE psia
    (7, c.atm),                                   # PRESSURE atm
    (8, c.Btu_IT),                                # ENERGY Btu
    (9, c.calorie_IT * 1000),                     # ENERGY kcal
    (10, c.hp),                                   # POWER hp
    (11, c.Btu_IT / c.hour),                      # HEAT_FLOW Btu/h
    (12, 12000 * c.Btu_IT / c.hour),              # HEAT_FLOW TR
    (13, c.foot ** 3 / c.minute),                 # VOLUME_FLOW cfm
    (14, c.gallon_US / c.minute),                 # VOLUME_FLOW gpm
    (15, c.foot / c.minute),                      # VELOCITY ft/min
    (16, c.pound / c.hour),                       # MASS_FLOW lb/h
    (17, c.pound / c.foot ** 3),                  # DENSITY lb/ft3
    (18, c.Btu_IT / c.pound),                     # SPECIFIC_ENTHALPY Btu/lb
    (19, c.Btu_IT / (c.pound * c.degree_Fahrenheit)),                       # SPECIFIC_HEAT Btu/(lb·°F)
    (20, c.Btu_IT / (c.hour * c.foot ** 2 * c.degree_Fahrenheit)),          # HEAT_TRANSFER_COEFFICIENT
    (21, c.hour * c.foot ** 2 * c.degree_Fahrenheit / c.Btu_IT),            # FOULING_RESISTANCE
    (22, c.Btu_IT / (c.hour * c.foot * c.degree_Fahrenheit)),               # CONDUCTIVITY
    (23, c.degree_Fahrenheit),                    # TEMPERATURE_DIFFERENCE °F
    (24, c.inch / 12),                            # FIN_PITCH 12 fpi (pitch of twelve fins per inch)
]
with open("src/test/resources/reference/units_factors.csv", "w") as f:
    f.write(HEADER.format(ver=scipy.__version__,
                          table="SI value of one unit; case numbers are mapped to units in UnitsReferenceTest",
                          tol="relative 1e-12",
                          units="case [-], si [SI unit of the dimension]"))
    f.write("case,si\n")
    for n, v in factors:
        f.write(f"{n},{float(v)!r}\n")
