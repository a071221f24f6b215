"""Reference air-side duties for MeasuredDutyTest, from CoolProp's humid-air functions (HAPropsSI).

Writes src/test/resources/reference/diagnosis_measured_duty.csv. Each row: entering dry bulb,
relative humidity, leaving dry bulb, volume flow at the entering state, pressure; the dry-air
mass flow m_da = V / v_da (CoolProp's specific volume per kg dry air) and the sensible duty
m_da (h(T_in, W_in) - h(T_out, W_in)) at constant humidity ratio.
Run: python3 scripts/diagnosis_measured_duty.py
"""
import CoolProp
from CoolProp.HumidAirProp import HAPropsSI

ROWS = [
    # T_in [K], RH [-], T_out [K], V [m3/s], p [Pa]
    (303.15, 0.0, 313.15, 1.5, 101325.0),
    (305.15, 0.4, 312.45, 0.7222, 101325.0),
    (275.15, 0.85, 273.40, 1.5, 101325.0),
    (297.15, 0.5, 285.15, 0.5, 95000.0),
]

with open("src/test/resources/reference/diagnosis_measured_duty.csv", "w") as f:
    f.write("# source: CoolProp %s HumidAir (HAPropsSI; Hyland & Wexler 1983 with virial terms)\n" % CoolProp.__version__)
    f.write("# table: sensible air-side duty of a coil from entering state, leaving dry bulb and volume flow\n")
    f.write("# units: T_in K, rh -, T_out K, V m3/s, p Pa, m_da kg/s, Q_sensible W\n")
    f.write("# tolerance: 0.3 % relative (ASHRAE ideal-gas relations against CoolProp's real-gas humid air)\n")
    f.write("# script: scripts/diagnosis_measured_duty.py\n")
    f.write("T_in,rh,T_out,V,p,m_da,Q_sensible\n")
    for t_in, rh, t_out, v, p in ROWS:
        w = HAPropsSI("W", "T", t_in, "P", p, "R", rh)
        vda = HAPropsSI("Vda", "T", t_in, "P", p, "W", w)
        m_da = v / vda
        h_in = HAPropsSI("Hda", "T", t_in, "P", p, "W", w)
        h_out = HAPropsSI("Hda", "T", t_out, "P", p, "W", w)
        f.write("%.2f,%.2f,%.2f,%.4f,%.1f,%.6f,%.3f\n" % (t_in, rh, t_out, v, p, m_da, m_da * (h_in - h_out)))
