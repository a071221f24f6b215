#!/usr/bin/env python3
"""Writes Finstack's blend data files (src/main/resources/org/finstack/fluid/r410a.json, r404a.json,
r407c.json, r507a.json) for the pseudo-pure equations of state of

  Lemmon, E.W.: Pseudo-Pure Fluid Equations of State for the Refrigerant Blends R-410A, R-404A,
  R-507A, and R-407C. Int. J. Thermophys. 24(4), 991-1006 (2003).

The file format is the pure-fluid format 1 (see scripts/fluid_eos_extract.py, whose conversion
functions are reused here) plus a "blend" section:

  blend{composition[{component, massFraction}], compositionSource,
        bubblePressure, dewPressure: {form: exp, tauFactor: true, reducingTemperature [K],
                                      reducingValue [Pa], n[], t[]}, pressureSource}

with ln(p / pc) = (Tc / T) sum_i N_i theta^k_i, theta = 1 - T / Tc (the paper's bubble-point and
dew-point pressure equations). The equation-of-state coefficients and the bubble/dew
coefficients are the paper's published numbers, read from the machine-readable copy distributed
with the open-source CoolProp package (pip install coolprop==8.0.0), which reproduces the paper's
tables. The "ancillaries" section (starting values for the solver only) is CoolProp's fit to the
equation's saturated densities (Bell et al., Ind. Eng. Chem. Res. 53 (2014) 2498-2508).

GWP: mass-weighted mean of the components' IPCC AR4 100-year values (the method of Regulation
(EU) No 517/2014, Annex IV), computed from the component values in Finstack's pure-fluid files.
"""
import json
import os
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import fluid_eos_extract as base  # noqa: E402

OUT = base.OUT
REFERENCE = ("Lemmon, E.W.: Pseudo-Pure Fluid Equations of State for the Refrigerant Blends R-410A, "
             "R-404A, R-507A, and R-407C. Int. J. Thermophys. 24(4), 991-1006 (2003)")

# name, aliases, description, composition (component, mass fraction); compositions are the
# ANSI/ASHRAE Standard 34 designations (from memory), all safety class A1 (from memory)
BLENDS = [
    ("R410A", ["R-410A"], "R-32/R-125 (50/50 mass %) zeotropic blend, near-azeotropic",
     [("R32", 0.50), ("R125", 0.50)]),
    ("R404A", ["R-404A"], "R-125/R-143a/R-134a (44/52/4 mass %) zeotropic blend",
     [("R125", 0.44), ("R143a", 0.52), ("R134a", 0.04)]),
    ("R407C", ["R-407C"], "R-32/R-125/R-134a (23/25/52 mass %) zeotropic blend",
     [("R32", 0.23), ("R125", 0.25), ("R134a", 0.52)]),
    ("R507A", ["R-507A", "R507"], "R-125/R-143a (50/50 mass %) azeotropic blend",
     [("R125", 0.50), ("R143a", 0.50)]),
]


def pressure_equation(a):
    assert a["type"] in ("pL", "pV") and a["using_tau_r"]
    return {"form": "exp", "tauFactor": True, "reducingTemperature": a["T_r"],
            "reducingValue": a["reducing_value"], "n": a["n"], "t": a["t"]}


def component_gwp(name):
    with open(os.path.join(OUT, base.file_name(name)), encoding="utf-8") as f:
        return json.load(f)["gwp100"]


def build(name, aliases, chem, comp):
    j = base.cp_json(name)
    e = j["EOS"][0]
    assert e["pseudo_pure"] and e["BibTeX_EOS"] == "Lemmon-IJT-2003"
    red = e["STATES"]["reducing"]
    crit = j["STATES"]["critical"]
    anc = j["ANCILLARIES"]
    gwp = round(sum(x * component_gwp(c) for c, x in comp))
    return {
        "format": 1,
        "name": name,
        "aliases": aliases,
        "chemicalName": chem,
        "safetyClass": "A1",
        "safetyClassSource": "ANSI/ASHRAE Standard 34 / ISO 817 designation (from memory)",
        "gwp100": gwp,
        "gwpBasis": "IPCC AR4, 100-year horizon: mass-weighted mean of the components' values, as in "
                    "Regulation (EU) No 517/2014 Annex IV (component values from memory)",
        "source": {"key": "Lemmon 2003", "reference": REFERENCE},
        "referenceState": "IIR",
        "molarMass": e["molar_mass"],
        "gasConstant": e["gas_constant"],
        "reducing": {"temperature": red["T"], "molarDensity": red["rhomolar"]},
        "critical": {"temperature": crit["T"], "pressure": crit["p"], "molarDensity": crit["rhomolar"]},
        "tripleTemperature": e["Ttriple"],
        "range": {"minTemperature": e["Ttriple"], "maxTemperature": e["T_max"], "maxPressure": e["p_max"]},
        "ideal": base.ideal(e["alpha0"], red["T"]),
        "residual": base.residual(e["alphar"]),
        "ancillaries": {
            "source": "starting values only: fits to the equation's saturated densities distributed with "
                      "CoolProp (Bell et al., Ind. Eng. Chem. Res. 53 (2014) 2498-2508); the vapour-pressure "
                      "entry repeats the paper's bubble-point equation",
            "vapourPressure": pressure_equation(anc["pL"]),
            "liquidDensity": base.ancillary(anc["rhoL"]),
            "vapourDensity": base.ancillary(anc["rhoV"]),
        },
        "blend": {
            "composition": [{"component": c, "massFraction": x} for c, x in comp],
            "compositionSource": "ANSI/ASHRAE Standard 34 designation (from memory)",
            "bubblePressure": pressure_equation(anc["pL"]),
            "dewPressure": pressure_equation(anc["pV"]),
            "pressureSource": "Lemmon 2003, bubble-point and dew-point pressure equations "
                              "ln(p/pc) = (Tc/T) sum N_i theta^k_i (coefficient table of the paper)",
        },
    }


def main():
    for name, aliases, chem, comp in BLENDS:
        doc = build(name, aliases, chem, comp)
        path = os.path.join(OUT, base.file_name(name))
        with open(path, "w", encoding="utf-8") as f:
            json.dump(doc, f, indent=1, ensure_ascii=False)
            f.write("\n")
        print("wrote", path, file=sys.stderr)


if __name__ == "__main__":
    main()
