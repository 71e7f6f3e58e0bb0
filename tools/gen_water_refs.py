#!/usr/bin/python3
"""Saturated water from IAPWS-95 with Debian's python3-iapws, as independent check values for
ReferenceSaturationTest. Dev tool, not shipped; no code of the library is ported.
Run: /usr/bin/python3 tools/gen_water_refs.py > src/test/resources/org/ventcase/thermo/water-iapws95.csv"""
import iapws
from iapws import IAPWS95

print("# Saturated liquid and vapour of water from IAPWS-95 (W. Wagner, A. Pruss, J. Phys. Chem. Ref. Data 31 (2002) 387),")
print("# evaluated with python3-iapws %s (Debian package; J.J. Gomez Romera) by tools/gen_water_refs.py." % iapws.__version__)
print("# Units: T in K, psat in Pa, densities in kg/m3, latent heat in kJ/kg. Tr = T / 647.096 K.")
print("T_K,Tr,psat_Pa,rho_liquid_kg_m3,rho_vapour_kg_m3,latent_heat_kJ_kg")
for t in range(300, 621, 20):
    liq = IAPWS95(T=float(t), x=0.0)
    vap = IAPWS95(T=float(t), x=1.0)
    print("%.2f,%.4f,%.6g,%.6g,%.6g,%.6g" % (t, t / 647.096, liq.P * 1e6, liq.rho, vap.rho, vap.h - liq.h))
