#!/usr/bin/env python3
"""Generates the fluid reference CSVs under src/test/resources/reference/ (fluid-*.csv).

Reference library: CoolProp 8.0.0 (pip install coolprop==8.0.0), an independent open-source
implementation of the same published equations of state (Bell, I.H., Wronski, J., Quoilin, S.,
Lemort, V.: Pure and Pseudo-pure Fluid Thermophysical Property Evaluation and the Open-Source
Thermophysical Property Library CoolProp. Ind. Eng. Chem. Res. 53 (2014) 2498-2508), with the IIR
reference state set for every fluid. For R1234yf CoolProp 8 ships the newer Lemmon & Akasaka (2022)
equation; this script registers the Richter, McLinden & Lemmon (2011) equation under the name
R1234yf_Richter2011 from Finstack's data file (the paper's coefficients) and evaluates that.

Per fluid two files:
  fluid-<name>-saturation.csv  T [K], p [Pa], rho' rho'' [kg/m3], h' h'' [J/kg], s' s'' [J/(kg K)],
                               cp' cp'' [J/(kg K)], w' w'' [m/s]; T = -50..+60 degC every 10 K
                               (limited to the triple point and Tc - 1 K)
  fluid-<name>-states.csv      T [K], p [Pa], rho [kg/m3], h [J/kg], s [J/(kg K)], cp cv [J/(kg K)],
                               w [m/s]; single-phase states (liquid, vapour, supercritical)
"""
import json
import os

import CoolProp.CoolProp as CP

HERE = os.path.dirname(os.path.abspath(__file__))
RES = os.path.join(HERE, "..", "src", "main", "resources", "org", "finstack", "fluid")
OUT = os.path.join(HERE, "..", "src", "test", "resources", "reference")

FLUIDS = ["R134a", "R32", "R125", "R290", "R600a", "R717", "R1234yf", "R1234ze(E)", "R22", "R143a",
          "R1270", "R744"]


def stem(name):
    return name.lower().replace("(", "").replace(")", "")


def register_r1234yf_2011():
    """Registers Richter et al. (2011) with CoolProp, from Finstack's own data file."""
    mine = json.load(open(os.path.join(RES, "r1234yf.json"), encoding="utf-8"))
    j = json.loads(CP.get_fluid_param_string("R1234yf", "JSON"))
    j = j[0] if isinstance(j, list) else j
    j.pop("SUPERANCILLARY", None)
    e = j["EOS"][0]
    e.pop("SUPERANCILLARY", None)
    e.pop("critical_region_splines", None)
    ide = mine["ideal"]
    e["alpha0"] = [
        {"type": "IdealGasHelmholtzLead", "a1": ide["a1"], "a2": ide["a2"]},
        {"type": "IdealGasHelmholtzLogTau", "a": ide["logTau"]},
        {"type": "IdealGasHelmholtzPlanckEinstein", "n": ide["planckEinstein"]["n"], "t": ide["planckEinstein"]["u"]},
    ]
    res = mine["residual"]
    e["alphar"] = [
        {"type": "ResidualHelmholtzPower", "n": res[0]["n"], "t": res[0]["t"], "d": res[0]["d"], "l": res[0]["l"]},
        {"type": "ResidualHelmholtzGaussian", "n": res[1]["n"], "t": res[1]["t"], "d": res[1]["d"],
         "eta": res[1]["eta"], "epsilon": res[1]["epsilon"], "beta": res[1]["beta"], "gamma": res[1]["gamma"]},
    ]
    e["gas_constant"] = mine["gasConstant"]
    e["molar_mass"] = mine["molarMass"]
    e["Ttriple"] = mine["tripleTemperature"]
    e["T_max"] = mine["range"]["maxTemperature"]
    e["p_max"] = mine["range"]["maxPressure"]
    for key in ("reducing",):
        e["STATES"][key]["T"] = mine["reducing"]["temperature"]
        e["STATES"][key]["rhomolar"] = mine["reducing"]["molarDensity"]
        e["STATES"][key]["p"] = mine["critical"]["pressure"]
    e["STATES"].pop("hs_anchor", None)
    j["STATES"]["critical"]["T"] = mine["critical"]["temperature"]
    j["STATES"]["critical"]["rhomolar"] = mine["critical"]["molarDensity"]
    j["STATES"]["critical"]["p"] = mine["critical"]["pressure"]
    j["INFO"]["NAME"] = "R1234yf_Richter2011"
    j["INFO"]["REFPROP_NAME"] = "R1234yf_Richter2011"
    j["INFO"]["ALIASES"] = []
    j["INFO"]["CAS"] = "R1234yf_Richter2011"
    CP.add_fluids_as_JSON("HEOS", json.dumps([j]))
    return "R1234yf_Richter2011"


def header(f, name, what, cols, tol):
    f.write(f"# source: CoolProp 8.0.0 (Bell et al. 2014, Ind. Eng. Chem. Res. 53:2498), HEOS backend, "
            f"{name}, IIR reference state\n")
    f.write(f"# table: {what}\n")
    f.write(f"# units: {cols}\n")
    f.write(f"# tolerance: {tol}\n")
    f.write("# generating script: scripts/fluid_reference_coolprop.py\n")


def main():
    for name in FLUIDS:
        cpname = register_r1234yf_2011() if name == "R1234yf" else name
        try:
            CP.set_reference_state(cpname, "IIR")
            dh, ds = 0.0, 0.0
        except ValueError:
            # the registered R1234yf_Richter2011 refuses set_reference_state: apply the IIR
            # offsets by hand (h' = 200 kJ/kg, s' = 1 kJ/(kg K) at 0 degC)
            dh = 200e3 - CP.PropsSI("Hmass", "T", 273.15, "Q", 0, cpname)
            ds = 1e3 - CP.PropsSI("Smass", "T", 273.15, "Q", 0, cpname)

        def prop(out, k1, v1, k2, v2):
            v = CP.PropsSI(out, k1, v1, k2, v2, cpname)
            return v + (dh if out == "Hmass" else ds if out == "Smass" else 0.0)
        ttrip = CP.PropsSI("Ttriple", cpname)
        tc = CP.PropsSI("Tcrit", cpname)
        pc = CP.PropsSI("pcrit", cpname)
        with open(os.path.join(OUT, f"fluid-{stem(name)}-saturation.csv"), "w") as f:
            header(f, name, "saturation states at -50..+60 degC every 10 K (within the triple point and Tc - 1 K)",
                   "K, Pa, kg/m3, kg/m3, J/kg, J/kg, J/(kg K), J/(kg K), J/(kg K), J/(kg K), m/s, m/s",
                   "relative 1e-6 (p, rho, h, s; plus the gas-constant difference for R1234ze(E) and R717, see FluidReferenceDataTest), 1e-5 (cp, w)")
            f.write("T,p,rhoL,rhoV,hL,hV,sL,sV,cpL,cpV,wL,wV\n")
            for tc_deg in range(-50, 61, 10):
                t = 273.15 + tc_deg
                if t < ttrip or t > tc - 1:
                    continue
                row = [t, CP.PropsSI("P", "T", t, "Q", 0, cpname)]
                for out in ("Dmass", "Hmass", "Smass", "Cpmass", "speed_of_sound"):
                    row += [prop(out, "T", t, "Q", 0), prop(out, "T", t, "Q", 1)]
                f.write(",".join(repr(float(v)) for v in row) + "\n")
        with open(os.path.join(OUT, f"fluid-{stem(name)}-states.csv"), "w") as f:
            header(f, name, "single-phase states: subcooled liquid, superheated vapour, supercritical",
                   "K, Pa, kg/m3, J/kg, J/(kg K), J/(kg K), J/(kg K), m/s",
                   "relative 1e-6 (rho, h, s; plus the gas-constant difference for R1234ze(E) and R717), 1e-5 (cp, cv, w)")
            f.write("T,p,rho,h,s,cp,cv,w\n")
            states = []
            for tc_deg in (-40, 0, 40):
                t = 273.15 + tc_deg
                if t < ttrip or t > tc - 2:
                    continue
                ps = CP.PropsSI("P", "T", t, "Q", 0, cpname)
                states += [(t, min(ps * 3 + 1e6, 0.9 * CP.PropsSI("pmax", cpname))), (t, ps * 0.5)]
            tmax = CP.PropsSI("Tmax", cpname)
            t1, t2 = min(tc + 20, tmax - 2), min(tc + 60, tmax - 1)
            states += [(t1, pc * 0.5), (t1, pc * 1.5), (t2, pc * 2)]
            for t, p in states:
                row = [t, p] + [prop(o, "T", t, "P", p)
                                for o in ("Dmass", "Hmass", "Smass", "Cpmass", "Cvmass", "speed_of_sound")]
                f.write(",".join(repr(float(v)) for v in row) + "\n")
        print("wrote", name)


if __name__ == "__main__":
    main()
