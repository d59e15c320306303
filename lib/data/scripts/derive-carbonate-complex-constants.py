#!/usr/bin/python3
"""log10 K, reaction enthalpy and reaction heat capacity at 298.15 K of the calcium carbonate complexes,
from the temperature functions of Plummer & Busenberg (1982, Geochim. Cosmochim. Acta 46, 1011, Table 2),
for the constant-ΔrH°/ΔrCp° van 't Hoff form of lib/data/schema.ts (reaction definitions).

  log K(T) = A + B*T + C/T + D*log10(T) + E/T**2     (formation of the complex, T in K)
  ΔrH° = R ln10 T² dlogK/dT,  ΔrCp° = dΔrH°/dT

The data file defines each complex by its dissociation (complex = Ca+2 + ligand), so the signs are reversed.
Coefficients typed from memory of the paper. Run with /usr/bin/python3; prints JSON.
"""
import json, math

R_J_PER_MOL_K = 8.314462618  # CODATA 2018 molar gas constant
T_REF_K = 298.15
COEFFICIENTS = {
    # formation reaction: (A, B, C, D, E)
    "CaHCO3+": (1209.120, 0.31294, -34765.05, -478.782, 0.0),  # Ca+2 + HCO3- = CaHCO3+
    "CaCO3(aq)": (-1228.732, -0.299444, 35512.75, 485.818, 0.0),  # Ca+2 + CO3-2 = CaCO3(aq)
}

def log_k(c, t):
    a, b, cc, d, e = c
    return a + b * t + cc / t + d * math.log10(t) + e / t**2

def dlogk_dt(c, t):
    a, b, cc, d, e = c
    return b - cc / t**2 + d / (t * math.log(10)) - 2 * e / t**3

def d2logk_dt2(c, t):
    a, b, cc, d, e = c
    return 2 * cc / t**3 - d / (t**2 * math.log(10)) + 6 * e / t**4

out = {}
for name, c in COEFFICIENTS.items():
    k = R_J_PER_MOL_K * math.log(10)
    dh = k * T_REF_K**2 * dlogk_dt(c, T_REF_K)
    dcp = k * (2 * T_REF_K * dlogk_dt(c, T_REF_K) + T_REF_K**2 * d2logk_dt2(c, T_REF_K))
    out[name] = {
        "formationLog10K25": log_k(c, T_REF_K),
        "dissociationLog10K25": -log_k(c, T_REF_K),
        "dissociationDeltaHJPerMol": -dh,
        "dissociationDeltaCpJPerMolK": -dcp,
    }
print(json.dumps(out, indent=2))
