#!/usr/bin/env python3
"""Transport-property coefficient files and reference data for Finstack's 12 refrigerants.

Reference library: CoolProp 8.0.0 (pip install coolprop==8.0.0; Bell, I.H., Wronski, J., Quoilin, S.,
Lemort, V.: Ind. Eng. Chem. Res. 53 (2014) 2498-2508), HEOS backend. For R1234yf the Richter et al.
(2011) equation of state is registered from Finstack's data file (see fluid_reference_coolprop.py),
so that reference densities match Finstack's.

Two jobs:
  python3 scripts/fluid_transport_reference.py coefficients
      writes src/main/resources/org/finstack/fluid/transport/<fluid>.json: the published
      correlations' coefficients, transcribed from CoolProp 8.0.0's fluid data (which carries the
      papers' values in SI units), each block naming its source paper. Finstack's own evaluation
      code implements the equations from the papers.
  python3 scripts/fluid_transport_reference.py reference
      writes src/test/resources/reference/fluid-transport-saturation.csv and
      fluid-transport-states.csv: viscosity, thermal conductivity and surface tension computed by
      CoolProp at saturated states -50..+60 degC (every 10 K, within the triple point and Tc - 1 K)
      and at single-phase states.
"""
import json
import math
import os
import sys

import CoolProp
import CoolProp.CoolProp as CP

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from fluid_reference_coolprop import FLUIDS, register_r1234yf_2011, stem  # noqa: E402

HERE = os.path.dirname(os.path.abspath(__file__))
RES = os.path.join(HERE, "..", "src", "main", "resources", "org", "finstack", "fluid", "transport")
OUT = os.path.join(HERE, "..", "src", "test", "resources", "reference")

REFERENCES = {
    "Huber-IECR-2003": ("Huber, Laesecke & Perkins 2003",
                        "Huber, M.L., Laesecke, A., Perkins, R.A.: Model for the Viscosity and Thermal Conductivity "
                        "of Refrigerants, Including a New Correlation for the Viscosity of R134a. Ind. Eng. Chem. "
                        "Res. 42(13), 3163-3178 (2003)"),
    "McLinden-IJR-2000": ("McLinden, Klein & Perkins 2000",
                          "McLinden, M.O., Klein, S.A., Perkins, R.A.: An extended corresponding states model for "
                          "the thermal conductivity of refrigerants and refrigerant mixtures. Int. J. Refrig. 23(1), "
                          "43-63 (2000)"),
    "Klein-IJR-1997": ("Klein, McLinden & Laesecke 1997",
                       "Klein, S.A., McLinden, M.O., Laesecke, A.: An improved extended corresponding states method "
                       "for estimation of viscosity of pure refrigerants and mixtures. Int. J. Refrig. 20(3), "
                       "208-217 (1997)"),
    "Perkins-JCED-2006": ("Perkins & Huber 2006",
                          "Perkins, R.A., Huber, M.L.: Measurement and Correlation of the Thermal Conductivity of "
                          "Pentafluoroethane (R125) from 190 K to 512 K at Pressures to 70 MPa. J. Chem. Eng. Data "
                          "51(3), 898-904 (2006)"),
    "Huber-IECR-2006": ("Huber & Laesecke 2006",
                        "Huber, M.L., Laesecke, A.: Correlation for the Viscosity of Pentafluoroethane (R125) from "
                        "the Triple Point to 500 K at Pressures up to 60 MPa. Ind. Eng. Chem. Res. 45(12), "
                        "4447-4453 (2006)"),
    "Marsh-JCED-2002": ("Marsh, Perkins & Ramires 2002",
                        "Marsh, K.N., Perkins, R.A., Ramires, M.L.V.: Measurement and Correlation of the Thermal "
                        "Conductivity of Propane from 86 K to 600 K at Pressures to 70 MPa. J. Chem. Eng. Data 47(4), "
                        "932-940 (2002)"),
    "Vogel-JPCRD-1998": ("Vogel et al. 1998",
                         "Vogel, E., Kuechenmeister, C., Bich, E., Laesecke, A.: Reference Correlation of the "
                         "Viscosity of Propane. J. Phys. Chem. Ref. Data 27(5), 947-970 (1998)"),
    "Vogel-IJT-2000": ("Vogel, Kuechenmeister & Bich 2000",
                       "Vogel, E., Kuechenmeister, C., Bich, E.: Viscosity Correlation for Isobutane over Wide Ranges "
                       "of the Fluid Region. Int. J. Thermophys. 21(2), 343-356 (2000)"),
    "Perkins-JCED-2002-Isobutane": ("Perkins 2002",
                                    "Perkins, R.A.: Measurement and Correlation of the Thermal Conductivity of "
                                    "Isobutane from 114 K to 600 K at Pressures to 70 MPa. J. Chem. Eng. Data 47(5), "
                                    "1272-1279 (2002)"),
    "Fenghour-JPCRD-1995": ("Fenghour et al. 1995",
                            "Fenghour, A., Wakeham, W.A., Vesovic, V., Watson, J.T.R., Millat, J., Vogel, E.: The "
                            "Viscosity of Ammonia. J. Phys. Chem. Ref. Data 24(5), 1649-1667 (1995)"),
    "Tufeu-BBPC-1984": ("Tufeu et al. 1984",
                        "Tufeu, R., Ivanov, D.Y., Garrabos, Y., Le Neindre, B.: Thermal Conductivity of Ammonia in a "
                        "Large Temperature and Pressure Range Including the Critical Region. Ber. Bunsenges. Phys. "
                        "Chem. 88, 422-427 (1984)"),
    "Perkins-JCED-2011": ("Perkins & Huber 2011",
                          "Perkins, R.A., Huber, M.L.: Measurement and Correlation of the Thermal Conductivity of "
                          "2,3,3,3-Tetrafluoroprop-1-ene (R1234yf) and trans-1,3,3,3-Tetrafluoropropene (R1234ze(E)). "
                          "J. Chem. Eng. Data 56(12), 4868-4874 (2011)"),
    "Bell-PURDUE-2016-ETA": ("Bell & Laesecke 2016",
                             "Bell, I.H., Laesecke, A.: Viscosity of refrigerants and other working fluids from "
                             "residual entropy scaling. 16th International Refrigeration and Air Conditioning "
                             "Conference at Purdue, paper 1692 (2016)"),
    "Laesecke-JPCRD-2017-CO2": ("Laesecke & Muzny 2017",
                                "Laesecke, A., Muzny, C.D.: Reference Correlation for the Viscosity of Carbon Dioxide. "
                                "J. Phys. Chem. Ref. Data 46(1), 013107 (2017)"),
    "Huber-JPCRD-2016-CO2": ("Huber et al. 2016",
                             "Huber, M.L., Sykioti, E.A., Assael, M.J., Perkins, R.A.: Reference Correlation of the "
                             "Thermal Conductivity of Carbon Dioxide from the Triple Point to 1100 K and up to 200 MPa. "
                             "J. Phys. Chem. Ref. Data 45(1), 013102 (2016)"),
    "Mulero-JPCRD-2012": ("Mulero, Cachadina & Parra 2012",
                          "Mulero, A., Cachadina, I., Parra, M.I.: Recommended Correlations for the Surface Tension "
                          "of Common Fluids. J. Phys. Chem. Ref. Data 41(4), 043105 (2012)"),
    "Mulero-JPCRD-2014": ("Mulero & Cachadina 2014",
                          "Mulero, A., Cachadina, I.: Recommended Correlations for the Surface Tension of Several "
                          "Fluids Included in the REFPROP Program. J. Phys. Chem. Ref. Data 43(2), 023104 (2014)"),
}

# CoolProp's reference-fluid names to Finstack's
REFERENCE_FLUID = {"R134a": "R134a", "Propane": "R290"}

TRANSCRIBED = "coefficients transcribed from CoolProp 8.0.0 fluid data (SI units), which cites this paper"


def source(key):
    k, ref = REFERENCES[key]
    return {"key": k, "reference": ref, "note": TRANSCRIBED}


def cp_json(name):
    j = json.loads(CP.get_fluid_param_string(name, "JSON"))
    return j[0] if isinstance(j, list) else j


def viscosity_block(name, v):
    if isinstance(v, list):
        # the first entry is CoolProp's default (Bell & Laesecke 2016 where listed); the ECS entry
        # carries the published Lennard-Jones parameters used for the ECS conductivity
        ecs = [e for e in v if e.get("type") == "ECS"]
        out = rhosr_block(v[0])
        if ecs and ecs[0]["BibTeX"] in REFERENCES:
            out["lennardJones"] = {"sigma": ecs[0]["sigma_eta"], "epsilonOverK": ecs[0]["epsilon_over_k"],
                                   "source": source(ecs[0]["BibTeX"])}
        return out
    if v.get("type") == "ECS":
        p = v["psi"]
        return {"model": "ecs", "source": source(v["BibTeX"]), "referenceFluid": REFERENCE_FLUID[v["reference_fluid"]],
                "sigma": v["sigma_eta"], "epsilonOverK": v["epsilon_over_k"],
                "psi": {"a": p["a"], "t": p["t"], "reducingMolarDensity": p["rhomolar_reducing"]}}
    if v["BibTeX"] == "Laesecke-JPCRD-2017-CO2":
        return {"model": "laeseckeMuzny2017", "source": source(v["BibTeX"]), "sigma": v["sigma_eta"],
                "epsilonOverK": v["epsilon_over_k"], "initialDensity": {"b": v["initial_density"]["b"],
                                                                       "t": v["initial_density"]["t"]}}
    d = v["dilute"]
    if d["type"] == "kinetic_theory":
        dil = {"type": "neufeld"}
    else:
        dil = {"type": "collisionIntegral", "C": d["C"], "a": d["a"], "t": d["t"], "molarMass": d["molar_mass"]}
    h = v["higher_order"]
    return {"model": "vogel1998", "source": source(v["BibTeX"]), "sigma": v["sigma_eta"],
            "epsilonOverK": v["epsilon_over_k"], "dilute": dil,
            "initialDensity": {"b": v["initial_density"]["b"], "t": v["initial_density"]["t"]},
            "higherOrder": {"reducingTemperature": h["T_reduce"], "reducingMolarDensity": h["rhomolar_reduce"],
                            **{k: h[k] for k in ("a", "d1", "t1", "gamma", "l", "f", "d2", "t2", "g", "h", "p", "q")}}}


def rhosr_block(v):
    return {"model": "bellLaesecke2016", "source": source(v["BibTeX"]), "C": v["C"], "cLiquid": v["c_liq"],
            "cVapour": v["c_vap"], "crossover": v["x_crossover"]}


def conductivity_block(c):
    if c.get("type") == "ECS":
        p = c["psi"]
        return {"model": "ecs", "source": source(c["BibTeX"]), "referenceFluid": REFERENCE_FLUID[c["reference_fluid"]],
                "fInt": {"a": c["f_int"]["a"], "t": c["f_int"]["t"]},
                "psi": {"a": p["a"], "t": p["t"], "reducingMolarDensity": p["rhomolar_reducing"]},
                "critical": {"qD": c["q_D"], "xi0": 1.94e-10, "Gamma": 0.0496, "R0": 1.03, "gamma": 1.239,
                             "nu": 0.63}}
    out = {"model": "polynomial", "source": source(c["BibTeX"])}
    d = c["dilute"]
    if "hardcoded" in d:
        out["dilute"] = {"type": "huber2016co2"}
    else:
        out["dilute"] = {"type": "ratio", "reducingTemperature": d["T_reducing"], "A": d["A"], "n": d["n"],
                         "B": d["B"], "m": d["m"]}
    r = c["residual"]
    out["residual"] = {"reducingTemperature": r["T_reducing"], "reducingDensity": r["rhomass_reducing"],
                       "B": r["B"], "d": r["d"], "t": r["t"]}
    cr = c.get("critical", {})
    if "hardcoded" not in cr and cr:
        out["critical"] = {"qD": cr["qD"], "xi0": cr["zeta0"], "Gamma": cr["GAMMA"], "R0": cr["R0"],
                           "gamma": cr["gamma"], "nu": cr.get("nu", 0.63)}
        if "T_ref" in cr:
            out["critical"]["referenceTemperature"] = cr["T_ref"]
    return out


def coefficients():
    os.makedirs(RES, exist_ok=True)
    for name in FLUIDS:
        j = cp_json(name)
        t = j["TRANSPORT"]
        st = j["ANCILLARIES"]["surface_tension"]
        data = {"format": 1, "fluid": name,
                "viscosity": viscosity_block(name, t["viscosity"]),
                "conductivity": conductivity_block(t["conductivity"]),
                "surfaceTension": {"source": source(st["BibTeX"]), "criticalTemperature": st["Tc"],
                                   "sigma": st["a"], "n": st["n"]}}
        with open(os.path.join(RES, stem(name) + ".json"), "w", encoding="utf-8") as f:
            json.dump(data, f, indent=1)
            f.write("\n")


def num(x):
    """A number as Java's Double.parseDouble reads it (NaN, not nan)."""
    return "NaN" if math.isnan(x) else repr(float(x))


def value(fn):
    try:
        v = fn()
        return v if math.isfinite(v) else float("nan")
    except ValueError:
        return float("nan")


def header(f, table, units, tol):
    f.write(f"# source: CoolProp {CoolProp.__version__} (Bell et al. 2014, Ind. Eng. Chem. Res. 53:2498), HEOS "
            f"backend, default transport models (R1234yf: Richter 2011 EOS registered as R1234yf_Richter2011)\n")
    f.write(f"# table: {table}\n# units: {units}\n# tolerance: {tol}\n")
    f.write("# generating script: scripts/fluid_transport_reference.py reference\n")
    f.write("# fluid index: " + ", ".join(f"{i}={n}" for i, n in enumerate(FLUIDS)) + "\n")


def reference():
    yf = register_r1234yf_2011()
    with open(os.path.join(OUT, "fluid-transport-saturation.csv"), "w", encoding="utf-8") as f:
        header(f, "saturated liquid and vapour at -50..+60 degC every 10 K (within the triple point and Tc - 1 K); "
               "NaN where CoolProp gives no value",
               "-, K, Pa s, Pa s, W/(m K), W/(m K), N/m", "per fluid and property, the accuracy Finstack states "
               "(see TransportReferenceDataTest)")
        f.write("fluid,T,etaL,etaV,lambdaL,lambdaV,sigma\n")
        for i, name in enumerate(FLUIDS):
            cpname = yf if name == "R1234yf" else name
            a = CP.AbstractState("HEOS", cpname)
            tc = a.T_critical()
            tmin = a.Ttriple()
            for k in range(12):
                t = 223.15 + 10 * k
                if t < tmin or t > tc - 1:
                    continue
                row = [i, t]
                for prop in ("viscosity", "conductivity"):
                    for q in (0, 1):
                        a.update(CP.QT_INPUTS, q, t)
                        row.append(value(getattr(a, prop)))
                a.update(CP.QT_INPUTS, 0, t)
                row.append(value(a.surface_tension))
                f.write(",".join(num(x) if j else str(x) for j, x in enumerate(row)) + "\n")
    with open(os.path.join(OUT, "fluid-transport-states.csv"), "w", encoding="utf-8") as f:
        header(f, "single-phase states: compressed liquid, superheated vapour at low and high pressure",
               "-, K, Pa, Pa s, W/(m K)", "per fluid and property, the accuracy Finstack states "
               "(see TransportReferenceDataTest)")
        f.write("fluid,T,p,eta,lambda\n")
        for i, name in enumerate(FLUIDS):
            cpname = yf if name == "R1234yf" else name
            a = CP.AbstractState("HEOS", cpname)
            states = []
            for t in (243.15, 283.15, 313.15):
                if t < a.T_critical() - 1:
                    a.update(CP.QT_INPUTS, 0, t)
                    states.append((t, a.p() * 1.5 + 1e6))   # compressed liquid
            states.append((323.15, 1e5))                     # vapour at 1 bar
            a.update(CP.QT_INPUTS, 1, 273.15)
            states.append((313.15, a.p()))                   # vapour superheated 40 K above 0 degC saturation
            for t, p in states:
                a.update(CP.PT_INPUTS, p, t)
                f.write(f"{i},{t!r},{p!r},{num(value(a.viscosity))},{num(value(a.conductivity))}\n")


if __name__ == "__main__":
    job = sys.argv[1] if len(sys.argv) > 1 else ""
    if job == "coefficients":
        coefficients()
    elif job == "reference":
        reference()
    else:
        sys.exit("usage: fluid_transport_reference.py coefficients|reference")
