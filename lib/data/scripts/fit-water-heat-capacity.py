#!/usr/bin/python3
"""Fit the isobaric heat capacity of liquid water at 0.1 MPa to the Haas-Fisher form
Cp = a + b*T + c/T**2 + d/T**0.5 (J/(mol K), T in K), the model of lib/data/schema.ts.

Source of Cp: IAPWS-95 (Wagner & Pruss 2002, J. Phys. Chem. Ref. Data 31, 387) as implemented by
Debian's python3-iapws. Range 273.16 K to 372.15 K: at 0.1 MPa water boils at 372.76 K, so 373.15 K
is outside the liquid field (the fit is used up to 100 degC as a slight extrapolation).
Molar mass 18.015268 g/mol (IAPWS R6-95). Run: /usr/bin/python3 lib/data/scripts/fit-water-heat-capacity.py
Prints JSON with the coefficients and the largest deviation of the fit.
"""
import json
import numpy as np
from iapws import IAPWS95

PRESSURE_MPA = 0.1
MOLAR_MASS_KG_PER_MOL = 18.015268e-3

temperatures_k = np.linspace(273.16, 372.15, 100)
cp_j_per_mol_k = np.array([IAPWS95(T=t, P=PRESSURE_MPA).cp * 1e3 * MOLAR_MASS_KG_PER_MOL for t in temperatures_k])

design = np.column_stack([np.ones_like(temperatures_k), temperatures_k, temperatures_k**-2, temperatures_k**-0.5])
coefficients, *_ = np.linalg.lstsq(design, cp_j_per_mol_k, rcond=None)
residual = design @ coefficients - cp_j_per_mol_k

a, b, c, d = (float(x) for x in coefficients)
extrapolated_373 = a + b * 373.15 + c / 373.15**2 + d / 373.15**0.5
print(json.dumps({
    "aJPerMolK": a, "bJPerMolK2": b, "cJKPerMol": c, "dJPerMolK05": d,
    "maxAbsDeviationJPerMolK": float(np.max(np.abs(residual))),
    "cpAt298JPerMolK_iapws": IAPWS95(T=298.15, P=PRESSURE_MPA).cp * 1e3 * MOLAR_MASS_KG_PER_MOL,
    "cpAt373FitJPerMolK": extrapolated_373,
    "rangeK": [273.16, 372.15],
}, indent=2))
