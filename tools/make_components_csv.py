#!/usr/bin/python3
"""Writes src/main/resources/org/ventcase/thermo/components.csv.

Provenance of every number is stated in the CSV itself (source columns and # comments).
This script only converts units (bar -> Pa, J/(mol K) -> Cp/R), computes the Yamada-Gunn
Z_RA where no tabulated value is used, and checks CAS check digits. Run from the repo root.
"""
R = 8.314462618  # J/(mol K), CODATA 2018

CRIT = "Poling2001-AppA-SecA (from memory; Tc/Pc/omega/M checked against Perry8-T2-141 in tests)"
CRIT_PERRY = "Perry8-T2-141 (DIPPR) for Tc/Pc/omega/M; Tb from memory"
CP = "Poling2001-AppA-SecC"
CP_MONO = "Cp/R=5/2 exact for a monatomic ideal gas (Poling2001-AppA-SecC lists a0=2.5)"
CP_RPP4 = "RPP1987-AppA CPVAP A-D (from memory) divided by R"
YG = "YamadaGunn1973 correlation 0.29056-0.08775*omega"
SD = "SpencerDanner1972 via RPP1987-AppA (from memory)"

# name, formula, cas, aliases, Tc K, Pc bar, omega, M, Tb K, critSrc, cp coeffs (Poling form,
# a1 in 1/K ...), cpTmin, cpTmax, cpSrc, zra (None -> Yamada-Gunn), zraSrc
rows = [
 ("methane","CH4","74-82-8","c1;r-50",190.56,45.99,0.011,16.043,111.66,CRIT,(4.568,-0.008975,3.631e-5,-3.407e-8,1.091e-11),50,1000,CP,None,YG),
 ("ethane","C2H6","74-84-0","c2;r-170",305.32,48.72,0.099,30.070,184.55,CRIT,(4.178,-0.004427,5.660e-5,-6.651e-8,2.487e-11),50,1000,CP,None,YG),
 ("propane","C3H8","74-98-6","c3;r-290",369.83,42.48,0.152,44.097,231.02,CRIT,(3.847,0.005131,6.011e-5,-7.893e-8,3.079e-11),50,1000,CP,None,YG),
 ("n-butane","C4H10","106-97-8","butane;nc4;normal butane;r-600",425.12,37.96,0.200,58.123,272.66,CRIT,(5.547,0.005536,8.057e-5,-1.0571e-7,4.134e-11),200,1000,CP,None,YG),
 ("n-pentane","C5H12","109-66-0","pentane;nc5",469.70,33.70,0.252,72.150,309.22,CRIT,(7.554,-0.000368,1.1846e-4,-1.4939e-7,5.753e-11),200,1000,CP,None,YG),
 ("n-hexane","C6H14","110-54-3","hexane;nc6",507.60,30.25,0.300,86.177,341.88,CRIT,(8.831,-0.000166,1.4302e-4,-1.8314e-7,7.124e-11),200,1000,CP,None,YG),
 ("n-heptane","C7H16","142-82-5","heptane;nc7",540.20,27.40,0.350,100.204,371.57,CRIT,(9.634,0.004156,1.5494e-4,-2.0066e-7,7.770e-11),200,1000,CP,None,YG),
 ("n-octane","C8H18","111-65-9","octane;nc8",568.70,24.90,0.399,114.231,398.82,CRIT,(10.824,0.004983,1.7751e-4,-2.3137e-7,8.980e-11),200,1000,CP,None,YG),
 ("n-nonane","C9H20","111-84-2","nonane;nc9",594.60,22.90,0.445,128.258,423.97,CRIT,(12.152,0.004575,2.0416e-4,-2.6777e-7,1.0465e-10),200,1000,CP,None,YG),
 ("n-decane","C10H22","124-18-5","decane;nc10",617.70,21.10,0.490,142.285,447.30,CRIT,(13.467,0.004139,2.3127e-4,-3.0477e-7,1.1970e-10),200,1000,CP,None,YG),
 ("isobutane","C4H10","75-28-5","i-butane;ic4;2-methylpropane;r-600a",407.85,36.40,0.186,58.123,261.34,CRIT,(3.351,0.017883,5.477e-5,-8.10e-8,3.243e-11),50,1000,CP,None,YG),
 ("isopentane","C5H12","78-78-4","i-pentane;ic5;2-methylbutane",460.39,33.81,0.229,72.150,300.99,CRIT,(1.959,0.038191,2.434e-5,-5.175e-8,2.165e-11),200,1000,CP,None,YG),
 ("neopentane","C5H12","463-82-1","2,2-dimethylpropane",433.80,31.99,0.196,72.150,282.65,CRIT.replace("; Tc/Pc/omega/M checked against Perry8-T2-141 in tests",""),(-11.428,0.156037,-3.3383e-4,4.0127e-7,-1.7806e-10),200,1000,CP,None,YG),
 ("ethylene","C2H4","74-85-1","ethene;r-1150",282.34,50.41,0.087,28.054,169.42,CRIT,(4.221,-0.008782,5.795e-5,-6.729e-8,2.511e-11),50,1000,CP,None,YG),
 ("propylene","C3H6","115-07-1","propene;r-1270",364.90,46.00,0.142,42.081,225.46,CRIT,(3.834,0.003893,4.688e-5,-6.013e-8,2.283e-11),50,1000,CP,None,YG),
 ("1-butene","C4H8","106-98-9","but-1-ene;butene-1;butylene",419.50,40.20,0.194,56.108,266.92,CRIT,(4.389,0.007984,6.143e-5,-8.20e-8,3.165e-11),50,1000,CP,None,YG),
 ("isobutylene","C4H8","115-11-7","isobutene;2-methylpropene;2-methylpropylene",417.90,40.00,0.195,56.108,266.25,CRIT,(3.231,0.020949,2.313e-5,-3.949e-8,1.566e-11),50,1000,CP,None,YG),
 ("1,3-butadiene","C4H6","106-99-0","butadiene;buta-1,3-diene",425.00,43.20,0.195,54.092,268.62,CRIT,(3.607,0.005085,8.253e-5,-1.2371e-7,5.321e-11),50,1000,CP,None,YG),
 ("benzene","C6H6","71-43-2","",562.05,48.95,0.210,78.114,353.24,CRIT,(3.551,-0.006184,1.4365e-4,-1.9807e-7,8.234e-11),50,1000,CP,None,YG),
 ("toluene","C7H8","108-88-3","methylbenzene",591.75,41.08,0.264,92.141,383.79,CRIT,(3.866,0.003558,1.3356e-4,-1.8659e-7,7.690e-11),50,1000,CP,None,YG),
 ("o-xylene","C8H10","95-47-6","ortho-xylene;1,2-dimethylbenzene",630.30,37.32,0.312,106.167,417.59,CRIT,(3.289,0.034144,4.989e-5,-8.335e-8,3.338e-11),50,1000,CP,None,YG),
 ("m-xylene","C8H10","108-38-3","meta-xylene;1,3-dimethylbenzene",617.00,35.41,0.327,106.167,412.34,CRIT,(4.002,0.017537,1.0590e-4,-1.5037e-7,6.008e-11),50,1000,CP,None,YG),
 ("p-xylene","C8H10","106-42-3","para-xylene;1,4-dimethylbenzene",616.20,35.11,0.322,106.167,411.53,CRIT,(4.113,0.014909,1.1810e-4,-1.6724e-7,6.736e-11),50,1000,CP,None,YG),
 ("ethylbenzene","C8H10","100-41-4","",617.15,36.09,0.304,106.167,409.36,CRIT,(4.544,0.010578,1.3644e-4,-1.9276e-7,7.885e-11),50,1000,CP,None,YG),
 ("cyclohexane","C6H12","110-82-7","",553.50,40.73,0.211,84.161,353.93,CRIT,(4.035,-0.004433,1.6834e-4,-2.0775e-7,7.746e-11),100,1000,CP,None,YG),
 ("methanol","CH4O","67-56-1","methyl alcohol;meoh",512.64,80.97,0.565,32.042,337.69,CRIT,(4.714,-0.006986,4.211e-5,-4.443e-8,1.535e-11),50,1000,CP,0.2334,SD),
 ("ethanol","C2H6O","64-17-5","ethyl alcohol;etoh",513.92,61.48,0.649,46.069,351.44,CRIT,(4.396,0.000628,5.546e-5,-7.024e-8,2.685e-11),50,1000,CP,0.2502,SD),
 ("acetone","C3H6O","67-64-1","propanone;2-propanone;dimethyl ketone",508.10,47.00,0.307,58.080,329.22,CRIT,(5.126,0.001511,5.731e-5,-7.177e-8,2.728e-11),200,1000,CP,0.2477,SD),
 ("hydrogen","H2","1333-74-0","r-702",33.25,12.97,-0.216,2.016,20.38,CRIT,(2.883,0.003681,-7.72e-6,6.92e-9,-2.13e-12),50,1000,CP,None,YG),
 ("helium","He","7440-59-7","helium-4;r-704",5.19,2.27,-0.390,4.003,4.22,CRIT,(2.5,0,0,0,0),1,1000,CP_MONO,None,YG),
 ("argon","Ar","7440-37-1","r-740",150.86,48.98,-0.002,39.948,87.27,CRIT,(2.5,0,0,0,0),1,1000,CP_MONO,None,YG),
 ("nitrogen","N2","7727-37-9","r-728",126.20,33.98,0.037,28.014,77.35,CRIT,(3.539,-0.000261,7.0e-8,1.57e-9,-9.9e-13),50,1000,CP,None,YG),
 ("oxygen","O2","7782-44-7","r-732",154.58,50.43,0.022,31.999,90.17,CRIT,(3.630,-0.001794,6.58e-6,-6.0e-9,1.79e-12),50,1000,CP,None,YG),
 ("carbon monoxide","CO","630-08-0","",132.85,34.94,0.045,28.010,81.66,CRIT,(3.912,-0.003913,1.182e-5,-1.30e-8,5.15e-12),50,1000,CP,None,YG),
 ("carbon dioxide","CO2","124-38-9","r-744",304.12,73.74,0.225,44.010,194.67,CRIT + "; Tb is the sublimation point at 101.325 kPa (from memory)",(3.259,0.001356,1.502e-5,-2.374e-8,1.056e-11),50,1000,CP,None,YG),
 ("hydrogen sulfide","H2S","7783-06-4","sulfuretted hydrogen",373.40,89.63,0.090,34.082,212.84,CRIT,(4.266,-0.003438,1.319e-5,-1.331e-8,4.88e-12),50,1000,CP,None,YG),
 ("sulfur dioxide","O2S","7446-09-5","so2;r-764",430.80,78.84,0.245,64.065,263.13,CRIT,tuple(x/R for x in (23.85,6.699e-2,-4.961e-5,1.328e-8,0.0)),273,1000,CP_RPP4 + "; Poling2001-AppA-SecC coefficients as read (4.417 -2.234e-3 2.344e-5 -3.271e-8 1.393e-11) give 42.2 J/(mol K) at 298.15 K against Poling's own 40.05 and JANAF 39.88 so they were not used",None,YG),
 ("ammonia","H3N","7664-41-7","nh3;r-717",405.40,113.53,0.257,17.031,239.82,CRIT,(4.238,-0.004215,2.041e-5,-2.126e-8,7.61e-12),50,1000,CP,0.2465,SD),
 ("water","H2O","7732-18-5","steam;r-718",647.14,220.64,0.344,18.015,373.15,CRIT,(4.395,-0.004186,1.405e-5,-1.564e-8,6.32e-12),50,1000,CP,0.2338,SD),
 ("chlorine","Cl2","7782-50-5","",417.00,77.00,0.069,70.906,239.12,CRIT,(3.056,0.0053708,-8.098e-6,5.693e-9,-1.5256e-12),50,1000,CP,None,YG),
 ("vinyl chloride","C2H3Cl","75-01-4","chloroethene;chloroethylene;vcm",432.00,56.70,0.1001,62.498,259.78,CRIT_PERRY,tuple(x/R for x in (5.949,2.019e-1,-1.536e-4,4.773e-8,0.0)),273,1000,CP_RPP4,None,YG),
 ("ethylene oxide","C2H4O","75-21-8","oxirane;epoxyethane;eo",469.15,71.90,0.1974,44.053,283.60,CRIT_PERRY,tuple(x/R for x in (-7.519,2.222e-1,-1.256e-4,2.592e-8,0.0)),273,1000,CP_RPP4,None,YG),
]

def cas_ok(cas):
    parts = cas.split("-")
    digits = (parts[0] + parts[1])[::-1]
    return sum((i + 1) * int(d) for i, d in enumerate(digits)) % 10 == int(parts[2])

def g(x):
    return repr(float(x)) if x != 0 else "0"

out = []
out.append("# Ventcase built-in pure-component data. One row per component; every group carries its source.")
out.append("# Written by tools/make_components_csv.py (unit conversion and Yamada-Gunn only; no fitting).")
out.append("# Units: Tc_K in K; Pc_Pa in Pa (= bar x 1e5); M_kg_kmol in kg/kmol; Tb_K in K at 101.325 kPa.")
out.append("# Cp: ideal-gas Cp/R = a0 + a1 T + a2 T^2 + a3 T^3 + a4 T^4 with T in K (a1 in 1/K ...).")
out.append("# Source keys:")
out.append("#  Poling2001-AppA-SecA: B.E. Poling, J.M. Prausnitz, J.P. O'Connell, The Properties of Gases and")
out.append("#    Liquids, 5th ed., McGraw-Hill 2001, Appendix A Section A. Values written from memory; a public")
out.append("#    transcription of part of the same table (an unnamed Peng-Robinson example script) agreed for")
out.append("#    the compounds it holds. Every row except neopentane is checked in ComponentLibraryTest against")
out.append("#    Perry8-T2-141 (tolerances there).")
out.append("#  Poling2001-AppA-SecC: same book, Appendix A Section C (ideal-gas Cp polynomial). Coefficients read")
out.append("#    from CalebBell/chemicals: chemicals/Heat Capacity/PolingDatabank.tsv (MIT licence), which stores")
out.append("#    the Section C values with a1..a4 already scaled to SI powers of T.")
out.append("#  Perry8-T2-141: D.W. Green, R.H. Perry (eds.), Perry's Chemical Engineers' Handbook, 8th ed.,")
out.append("#    McGraw-Hill 2008, Table 2-141 (DIPPR values). Read from sinagilassi/PyThermoDB: pyThermoDB/data/")
out.append("#    TABLE 2-141 Critical Constants and Acentric Factors of Inorganic and Organic Compounds.csv.")
out.append("#  RPP1987-AppA: R.C. Reid, J.M. Prausnitz, B.E. Poling, The Properties of Gases and Liquids, 4th ed.,")
out.append("#    McGraw-Hill 1987, Appendix A (CPVAP A..D in J/(mol K), cubic). From memory; divided here by")
out.append("#    R = 8.314462618 J/(mol K). Used only where Poling 5th ed. Section C was not found in a public copy.")
out.append("#  SpencerDanner1972: C.F. Spencer, R.P. Danner, J. Chem. Eng. Data 17 (1972) 236, Z_RA as tabulated in")
out.append("#    RPP1987 Appendix A. From memory; used for strongly polar rows where the correlation is poor.")
out.append("#  YamadaGunn1973: T. Yamada, R.D. Gunn, J. Chem. Eng. Data 18 (1973) 234: Z_RA = 0.29056 - 0.08775 omega,")
out.append("#    evaluated with this row's omega and rounded to 4 decimals.")
out.append("# Known weaknesses (see ComponentLibraryTest): Rackett with these Z_RA misses the liquid density of")
out.append("#  water (+7 % at 298 K), methanol (+3 %) and chlorine (-5 % at Tb); a published Z_RA should replace them.")
out.append("name,formula,cas,aliases,Tc_K,Pc_Pa,omega,M_kg_kmol,Tb_K,critical_source,cp_a0,cp_a1,cp_a2,cp_a3,cp_a4,cp_Tmin_K,cp_Tmax_K,cp_source,Z_RA,Z_RA_source")
for r in rows:
    (name, f, cas, al, tc, pc, w, m, tb, cs, a, tmin, tmax, cps, z, zs) = r
    assert cas_ok(cas), cas
    if z is None:
        z = round(0.29056 - 0.08775 * w, 4)
    fields = [name, f, cas, al, g(tc), g(round(pc * 1e5, 3)), g(w), g(m), g(tb), cs] + \
             ["%.6g" % c if c != 0 else "0" for c in a] + [g(tmin), g(tmax), cps, "%.4f" % z, zs]
    line = ",".join('"' + x + '"' if ("," in x) else x for x in fields)
    out.append(line)
open("src/main/resources/org/ventcase/thermo/components.csv", "w").write("\n".join(out) + "\n")
print(len(rows), "rows")
