#!/usr/bin/env python3
"""Writes Finstack's refrigerant data files (src/main/resources/org/finstack/fluid/*.json).

The equation-of-state coefficients are the published numbers of each fluid's original paper
(cited in the file's "source" field). They are read here from the machine-readable copy that the
open-source CoolProp package distributes (pip install coolprop==8.0.0), which reproduces the
papers' tables; only the published coefficients are taken over, into Finstack's own format:

  alpha0 = ln(delta) + a1 + a2*tau + c*ln(tau) + sum n_i tau^t_i + sum v_k ln(1 - exp(-u_k tau))
  alphar = sum of term groups (see org.finstack.fluid.eos.ResidualTerms)

Ideal-gas heat capacities given in a paper as cp0/R = c T^t are integrated here to the power
term -c Tc^t / (t (t + 1)) tau^-t; a constant cp0/R adds to the ln(tau) coefficient. Enthalpy and
entropy offsets are dropped: Finstack sets the reference state itself when a fluid is loaded.

R1234yf: CoolProp 8 carries the newer Lemmon & Akasaka (2022) equation; the file here keeps the
Richter, McLinden & Lemmon (2011) equation asked for, with its coefficients (Table 5 of that
paper) written out below.

The vapour-pressure and saturated-density ancillaries are only starting values for the
phase-equilibrium solver; they are the fits to each equation's saturation boundary distributed
with CoolProp (Bell et al., Ind. Eng. Chem. Res. 53 (2014) 2498-2508).
"""
import json
import os
import sys

import CoolProp.CoolProp as CP

OUT = os.path.join(os.path.dirname(__file__), "..", "src", "main", "resources", "org", "finstack", "fluid")

# name, CoolProp name, aliases, chemical name, ASHRAE 34 safety class, GWP (IPCC AR4 100-yr,
# as listed in Regulation (EU) No 517/2014 Annexes I and IV; from memory), citation key, reference
FLUIDS = [
    ("R134a", "R134a", ["HFC-134a"], "1,1,1,2-tetrafluoroethane", "A1", 1430,
     "Tillner-Roth & Baehr 1994",
     "Tillner-Roth, R., Baehr, H.D.: An International Standard Formulation for the Thermodynamic "
     "Properties of 1,1,1,2-Tetrafluoroethane (HFC-134a) for Temperatures from 170 K to 455 K and "
     "Pressures up to 70 MPa. J. Phys. Chem. Ref. Data 23(5), 657-729 (1994)"),
    ("R32", "R32", ["HFC-32"], "difluoromethane", "A2L", 675,
     "Tillner-Roth & Yokozeki 1997",
     "Tillner-Roth, R., Yokozeki, A.: An International Standard Equation of State for "
     "Difluoromethane (R-32) for Temperatures from the Triple Point at 136.34 K to 435 K and "
     "Pressures up to 70 MPa. J. Phys. Chem. Ref. Data 26(6), 1273-1328 (1997)"),
    ("R125", "R125", ["HFC-125"], "pentafluoroethane", "A1", 3500,
     "Lemmon & Jacobsen 2005",
     "Lemmon, E.W., Jacobsen, R.T: A New Functional Form and New Fitting Techniques for Equations "
     "of State with Application to Pentafluoroethane (HFC-125). J. Phys. Chem. Ref. Data 34(1), "
     "69-108 (2005)"),
    ("R290", "R290", ["propane", "HC-290"], "propane", "A3", 3,
     "Lemmon, McLinden & Wagner 2009",
     "Lemmon, E.W., McLinden, M.O., Wagner, W.: Thermodynamic Properties of Propane. III. A "
     "Reference Equation of State for Temperatures from the Melting Line to 650 K and Pressures up "
     "to 1000 MPa. J. Chem. Eng. Data 54(12), 3141-3180 (2009)"),
    ("R600a", "R600a", ["isobutane", "HC-600a"], "2-methylpropane (isobutane)", "A3", 3,
     "Bücker & Wagner 2006",
     "Bücker, D., Wagner, W.: Reference Equations of State for the Thermodynamic Properties of "
     "Fluid Phase n-Butane and Isobutane. J. Phys. Chem. Ref. Data 35(2), 929-1019 (2006)"),
    ("R717", "R717", ["ammonia", "NH3"], "ammonia", "B2L", 0,
     "Gao et al. 2020",
     "Gao, K., Wu, J., Bell, I.H., Lemmon, E.W.: Thermodynamic Properties of Ammonia for "
     "Temperatures from the Melting Line to 725 K and Pressures to 1000 MPa. "
     "J. Phys. Chem. Ref. Data (2020); published as: Gao, K., Wu, J., Bell, I.H., Harvey, A.H., "
     "Lemmon, E.W.: A Reference Equation of State with an Associating Term for the Thermodynamic "
     "Properties of Ammonia. J. Phys. Chem. Ref. Data 52, 013102 (2023)"),
    ("R1234yf", None, ["HFO-1234yf"], "2,3,3,3-tetrafluoroprop-1-ene", "A2L", 4,
     "Richter, McLinden & Lemmon 2011",
     "Richter, M., McLinden, M.O., Lemmon, E.W.: Thermodynamic Properties of "
     "2,3,3,3-Tetrafluoroprop-1-ene (R1234yf): Vapor Pressure and p-rho-T Measurements and an "
     "Equation of State. J. Chem. Eng. Data 56(7), 3254-3264 (2011)"),
    ("R1234ze(E)", "R1234ze(E)", ["HFO-1234ze(E)"], "trans-1,3,3,3-tetrafluoroprop-1-ene", "A2L", 7,
     "Thol & Lemmon 2016",
     "Thol, M., Lemmon, E.W.: Equation of State for the Thermodynamic Properties of "
     "trans-1,3,3,3-Tetrafluoropropene [R-1234ze(E)]. Int. J. Thermophys. 37, 28 (2016)"),
    ("R22", "R22", ["HCFC-22"], "chlorodifluoromethane", "A1", 1810,
     "Kamei, Beyerlein & Jacobsen 1995",
     "Kamei, A., Beyerlein, S.W., Jacobsen, R.T: Application of Nonlinear Regression in the "
     "Development of a Wide Range Formulation for HCFC-22. Int. J. Thermophys. 16(5), 1155-1164 "
     "(1995)"),
    ("R143a", "R143a", ["HFC-143a"], "1,1,1-trifluoroethane", "A2L", 4470,
     "Lemmon & Jacobsen 2000",
     "Lemmon, E.W., Jacobsen, R.T: An International Standard Formulation for the Thermodynamic "
     "Properties of 1,1,1-Trifluoroethane (HFC-143a) for Temperatures from 161 to 450 K and "
     "Pressures to 50 MPa. J. Phys. Chem. Ref. Data 29(4), 521-552 (2000)"),
    ("R1270", "R1270", ["propylene", "propene", "HC-1270"], "propene (propylene)", "A3", 2,
     "Lemmon, Overhoff, McLinden & Wagner (propene)",
     "Lemmon, E.W., Overhoff, U., McLinden, M.O., Wagner, W.: Equation of state for propylene "
     "(unpublished; coefficients as distributed with NIST REFPROP 9 and CoolProp)"),
    ("R744", "R744", ["carbon dioxide", "CO2"], "carbon dioxide", "A1", 1,
     "Span & Wagner 1996",
     "Span, R., Wagner, W.: A New Equation of State for Carbon Dioxide Covering the Fluid Region "
     "from the Triple-Point Temperature to 1100 K at Pressures up to 800 MPa. "
     "J. Phys. Chem. Ref. Data 25(6), 1509-1596 (1996)"),
]

# Richter, McLinden & Lemmon 2011, Tables 4 and 5 (ideal-gas and residual coefficients), with
# Tc = 367.85 K, rhoc = 4.17 mol/dm3, M = 114.0415928 g/mol, R = 8.314472 J/(mol K).
R1234YF_2011 = {
    "molarMass": 0.1140415928, "gasConstant": 8.314472, "Tc": 367.85, "rhoc": 4170.0,
    "pc": 3382200.0, "Ttriple": 220.0, "Tmax": 410.0, "pmax": 30.0e6,
    "a1": -12.837928, "a2": 8.042605, "logTau": 4.944,
    "pe_v": [7.549, 1.537, 2.03, 7.455], "pe_u_K": [718.0, 877.0, 4465.0, 1755.0],
    "power": {"n": [0.04592563, 1.546958, -2.355237, -0.4827835, 0.1758022, -1.210006,
                    -0.6177084, 0.6805262, -0.6968555, -0.02695779],
              "t": [1.0, 0.32, 0.929, 0.94, 0.38, 2.28, 1.76, 0.97, 2.44, 1.05],
              "d": [4, 1, 1, 2, 3, 1, 3, 2, 2, 7],
              "l": [0, 0, 0, 0, 0, 2, 2, 1, 2, 1]},
    "gauss": {"n": [1.389966, -0.4777136, -0.1975184, -1.147646, 0.0003428541],
              "t": [1.4, 3.0, 3.5, 1.0, 3.5], "d": [1, 1, 3, 3, 2],
              "eta": [1.02, 1.336, 1.055, 5.84, 16.2], "beta": [1.42, 2.31, 0.89, 80.0, 108.0],
              "gamma": [1.13, 0.67, 0.46, 1.28, 1.2], "epsilon": [0.712, 0.91, 0.677, 0.718, 1.64]},
}


# Molar gas constant used by the paper where the CoolProp copy carries another value; confirmed by
# reproducing the papers' check tables (Thol & Lemmon 2016 Table 3, Gao et al. 2020 Table 7) to
# all printed digits with these values and not with CoolProp's.
GAS_CONSTANT = {"R1234ze(E)": 8.3144598, "R717": 8.314462618}

# Validity range stated by the paper where the CoolProp copy extends it.
MAX_TEMPERATURE = {"R744": 1100.0}


def cp_json(name):
    j = json.loads(CP.get_fluid_param_string(name, "JSON"))
    return j[0] if isinstance(j, list) else j


def ancillary(a):
    t = a["type"]
    if t in ("pV", "pL"):
        form = "exp"
    elif t == "rhoLnoexp":
        form = "linear"
    elif t in ("rhoV", "rhoL"):
        form = "exp"
    else:
        raise ValueError(t)
    return {"form": form, "tauFactor": bool(a["using_tau_r"]), "reducingTemperature": a["T_r"],
            "reducingValue": a["reducing_value"], "n": a["n"], "t": a["t"]}


def ideal(alpha0, Tc):
    out = {"a1": 0.0, "a2": 0.0, "logTau": 0.0, "power": {"n": [], "t": []},
           "planckEinstein": {"n": [], "u": []}}
    for term in alpha0:
        ty = term["type"]
        if ty == "IdealGasHelmholtzLead":
            out["a1"], out["a2"] = term["a1"], term["a2"]
        elif ty == "IdealGasHelmholtzLogTau":
            out["logTau"] += term["a"]
        elif ty == "IdealGasHelmholtzPower":
            out["power"]["n"] += term["n"]
            out["power"]["t"] += term["t"]
        elif ty == "IdealGasHelmholtzPlanckEinstein":
            out["planckEinstein"]["n"] += term["n"]
            out["planckEinstein"]["u"] += term["t"]
        elif ty == "IdealGasHelmholtzCP0Constant":
            out["logTau"] += term["cp_over_R"]
        elif ty == "IdealGasHelmholtzCP0PolyT":
            assert abs(term["Tc"] - Tc) < 1e-9
            for c, t in zip(term["c"], term["t"]):
                assert t not in (0, -1)
                out["power"]["n"].append(-c * Tc ** t / (t * (t + 1)))
                out["power"]["t"].append(-t)
        elif ty == "IdealGasHelmholtzEnthalpyEntropyOffset":
            pass
        else:
            raise ValueError(ty)
    return out


def residual(alphar):
    groups = []
    for term in alphar:
        ty = term["type"]
        if ty == "ResidualHelmholtzPower":
            groups.append({"type": "power", "n": term["n"], "t": term["t"], "d": term["d"], "l": term["l"]})
        elif ty == "ResidualHelmholtzLemmon2005":
            groups.append({"type": "powerExpTau", "n": term["n"], "t": term["t"], "d": term["d"],
                           "l": term["l"], "m": term["m"]})
        elif ty == "ResidualHelmholtzGaussian":
            groups.append({"type": "gaussian", "n": term["n"], "t": term["t"], "d": term["d"],
                           "eta": term["eta"], "epsilon": term["epsilon"], "beta": term["beta"],
                           "gamma": term["gamma"]})
        elif ty == "ResidualHelmholtzGaoB":
            groups.append({"type": "gaoB", "n": term["n"], "t": term["t"], "d": term["d"],
                           "eta": term["eta"], "epsilon": term["epsilon"], "beta": term["beta"],
                           "gamma": term["gamma"], "b": term["b"]})
        elif ty == "ResidualHelmholtzNonAnalytic":
            groups.append({"type": "nonAnalytic", "n": term["n"], "a": term["a"], "b": term["b"],
                           "beta": term["beta"], "A": term["A"], "B": term["B"], "C": term["C"],
                           "D": term["D"]})
        else:
            raise ValueError(ty)
    return groups


def build(entry):
    name, cpname, aliases, chem, safety, gwp, key, ref = entry
    doc = {
        "format": 1,
        "name": name,
        "aliases": aliases,
        "chemicalName": chem,
        "safetyClass": safety,
        "safetyClassSource": "ANSI/ASHRAE Standard 34 / ISO 817 designation (common practice)",
        "gwp100": gwp,
        "gwpBasis": "IPCC AR4, 100-year horizon, as listed in Regulation (EU) No 517/2014 (from memory)",
        "source": {"key": key, "reference": ref},
        "referenceState": "IIR",
    }
    if cpname is None:
        d = R1234YF_2011
        anc = cp_json("R1234yf")["ANCILLARIES"]
        doc.update({
            "molarMass": d["molarMass"], "gasConstant": d["gasConstant"],
            "reducing": {"temperature": d["Tc"], "molarDensity": d["rhoc"]},
            "critical": {"temperature": d["Tc"], "pressure": d["pc"], "molarDensity": d["rhoc"]},
            "tripleTemperature": d["Ttriple"],
            "range": {"minTemperature": d["Ttriple"], "maxTemperature": d["Tmax"], "maxPressure": d["pmax"]},
            "ideal": {"a1": d["a1"], "a2": d["a2"], "logTau": d["logTau"], "power": {"n": [], "t": []},
                      "planckEinstein": {"n": d["pe_v"], "u": [u / d["Tc"] for u in d["pe_u_K"]]}},
            "residual": [dict(type="power", **d["power"]), dict(type="gaussian", **d["gauss"])],
        })
    else:
        j = cp_json(cpname)
        e = j["EOS"][0]
        red = e["STATES"]["reducing"]
        crit = j["STATES"]["critical"]
        doc.update({
            "molarMass": e["molar_mass"], "gasConstant": GAS_CONSTANT.get(name, e["gas_constant"]),
            "reducing": {"temperature": red["T"], "molarDensity": red["rhomolar"]},
            "critical": {"temperature": crit["T"], "pressure": crit["p"], "molarDensity": crit["rhomolar"]},
            "tripleTemperature": e["Ttriple"],
            "range": {"minTemperature": e["Ttriple"], "maxTemperature": MAX_TEMPERATURE.get(name, e["T_max"]),
                      "maxPressure": e["p_max"]},
            "ideal": ideal(e["alpha0"], red["T"]),
            "residual": residual(e["alphar"]),
        })
        anc = j["ANCILLARIES"]
    doc["ancillaries"] = {
        "source": "starting values only: fits to the equation's saturation boundary distributed with "
                  "CoolProp (Bell et al., Ind. Eng. Chem. Res. 53 (2014) 2498-2508)",
        "vapourPressure": ancillary(anc["pS"]),
        "liquidDensity": ancillary(anc["rhoL"]),
        "vapourDensity": ancillary(anc["rhoV"]),
    }
    return doc


def file_name(name):
    return name.lower().replace("(", "").replace(")", "") + ".json"


def main():
    for entry in FLUIDS:
        doc = build(entry)
        path = os.path.join(OUT, file_name(entry[0]))
        with open(path, "w", encoding="utf-8") as f:
            json.dump(doc, f, indent=1, ensure_ascii=False)
            f.write("\n")
        print("wrote", path, file=sys.stderr)


if __name__ == "__main__":
    main()
