#!/usr/bin/env python3
"""Saturation check values for the built-in fluids that the 15-fluid reference set leaves out.

Evaluates the reference equations of state of CoolProp (a general-purpose open-source property
library; `pip install coolprop`, this file was written with 8.0.0) at Tr = 0.475 to 0.925 (Tr of
the reference equation's own Tc), above the triple point. The reference equation is named by the
bibliography key CoolProp itself gives (get_fluid_param_string(name, "BibTeX-EOS")), not from memory.
Writes src/test/resources/org/ventcase/thermo/saturation-reference-more.csv. Not run by CI.
"""
import sys
import CoolProp
import CoolProp.CoolProp as CP

FLUIDS = [  # Ventcase name, CoolProp name
    ("n-pentane", "n-Pentane"), ("n-heptane", "n-Heptane"), ("n-octane", "n-Octane"),
    ("n-nonane", "n-Nonane"), ("n-decane", "n-Decane"), ("isopentane", "Isopentane"),
    ("neopentane", "Neopentane"), ("1-butene", "1-Butene"), ("isobutylene", "Isobutene"),
    ("o-xylene", "o-Xylene"), ("m-xylene", "m-Xylene"), ("p-xylene", "p-Xylene"),
    ("ethylbenzene", "EthylBenzene"), ("cyclohexane", "Cyclohexane"), ("ethanol", "Ethanol"),
    ("acetone", "Acetone"), ("argon", "Argon"), ("oxygen", "Oxygen"),
    ("carbon monoxide", "CarbonMonoxide"), ("hydrogen sulfide", "HydrogenSulfide"),
    ("sulfur dioxide", "SulfurDioxide"), ("ethylene oxide", "EthyleneOxide"),
    ("chlorine", "Chlorine"), ("vinyl chloride", "VinylChloride"),
]
TRS = [0.475 + 0.05 * i for i in range(10)]

out = sys.argv[1] if len(sys.argv) > 1 else "src/test/resources/org/ventcase/thermo/saturation-reference-more.csv"
with open(out, "w") as f:
    f.write("# Saturated liquid and vapour of pure fluids from published reference equations of state (multiparameter,\n")
    f.write("# Helmholtz energy), evaluated with CoolProp %s, a general-purpose open-source property library, by\n"
            % CoolProp.__version__)
    f.write("# tools/gen_saturation_reference_more.py. Cite as: calculated from the reference equation whose bibliography key\n")
    f.write("# CoolProp gives (column reference_eos, CoolProp's BibTeX-EOS key) with CoolProp %s. Tr = T / Tc of the\n"
            % CoolProp.__version__)
    f.write("# reference equation; points below the triple point are left out. Units SI; latent heat in kJ/kg.\n")
    f.write("# The built-in fluids the 15-fluid set (saturation-reference-eos.csv) leaves out; 1,3-butadiene, hydrogen and\n")
    f.write("# helium are not here (no reference equation in CoolProp, or no liquid range at these Tr).\n")
    f.write("fluid,T_K,Tr,psat_Pa,rho_liquid_kg_m3,rho_vapour_kg_m3,latent_heat_kJ_kg,reference_eos\n")
    for name, cp in FLUIDS:
        tc = CP.PropsSI("Tcrit", cp)
        tt = CP.PropsSI("Ttriple", cp)
        key = CP.get_fluid_param_string(cp, "BibTeX-EOS")
        for tr in TRS:
            t = round(tr * tc, 2)
            if t <= tt + 0.5:
                continue
            p = CP.PropsSI("P", "T", t, "Q", 0, cp)
            dl = CP.PropsSI("D", "T", t, "Q", 0, cp)
            dv = CP.PropsSI("D", "T", t, "Q", 1, cp)
            h = (CP.PropsSI("H", "T", t, "Q", 1, cp) - CP.PropsSI("H", "T", t, "Q", 0, cp)) / 1e3
            ref = ("%s (CoolProp %s)" % (key, CoolProp.__version__)).replace('"', "'")
            f.write('"%s",%.2f,%.3f,%.6g,%.6g,%.6g,%.6g,"%s"\n' % (name, t, t / tc, p, dl, dv, h, ref))
