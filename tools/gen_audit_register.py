#!/usr/bin/python3
"""Generate the invented demo vessel register for `ventcase audit`.

    python3 tools/gen_audit_register.py > demo-cases/register/kestrel-point-register.csv

Deterministic (fixed seed): the same script always writes the same file. Every tag, area and
number is invented for the demo site "Harrowgate Chemicals, Kestrel Point terminal"; no real plant
is described. A few rows are malformed on purpose (listed in the file's header comment and in
demo-cases/register/README.md) to show how the audit reports them.
"""
import random

SEED = 20260214
rnd = random.Random(SEED)

HEADER = ("tag,area,fluid,eos,shape,heads,diameter [m],length [m],elevation [m],level [%v],"
          "temperature [C],pressure,mode,vapour,set pressure [barg],mawp [barg],orifice,orifice count")

ORIFICES = ["G", "H", "J", "K", "L", "M", "N", "P", "Q", "R", "T"]


def f(x, nd=2):
    return f"{x:.{nd}f}"


def maybe_orifice():
    if rnd.random() < 0.55:
        letter = rnd.choice(ORIFICES)
        count = "2" if rnd.random() < 0.12 else ""
        return letter, count
    return "", ""


def row(tag, area, fluid, shape, heads, d, length, elev, level, temp, pressure, mode, vapour, setp, mawp):
    o, n = maybe_orifice()
    return [tag, area, fluid, "", shape, heads, d, length, elev, level, temp, pressure, mode, vapour, setp, mawp, o,
            n]


def quoted(s):
    return '"' + s + '"' if "," in s else s


rows = []

# Area 10: propane and LPG bullets, saturated
for i in range(60):
    tag = f"V-1{i + 1:03d}"
    fluid = "propane" if i % 3 else rnd.choice(["propane:0.95,n-butane:0.05", "propane:0.9,isobutane:0.1"])
    d = rnd.uniform(2.4, 4.0)
    length = rnd.uniform(10, 30)
    setp = rnd.choice([17.2, 17.5, 18.0])
    rows.append(row(tag, "Area 10 LPG bullets", fluid, "horizontal", rnd.choice(["2:1", "hemispherical"]),
                    f(d), f(length, 1), f(rnd.uniform(0.8, 1.6)), f(rnd.uniform(40, 85), 0), f(rnd.uniform(12, 40), 0),
                    "", "saturated", "", f(setp, 1), ""))

# Area 12: LPG spheres
for i in range(10):
    tag = f"TK-12{i + 1:02d}"
    d = rnd.uniform(10, 16)
    rows.append(row(tag, "Area 12 LPG spheres", "propane:0.6,n-butane:0.3,isobutane:0.1", "sphere", "",
                    f(d), "", f(rnd.uniform(1.5, 3.0)), f(rnd.uniform(40, 80), 0), f(rnd.uniform(10, 35), 0), "",
                    "saturated", "", f(rnd.choice([14.0, 15.5]), 1), f(16.0, 1)))

# Area 20: butane mixtures
for i in range(35):
    tag = f"V-2{i + 1:03d}"
    fluid = rnd.choice(["n-butane:0.8,isobutane:0.2", "n-butane", "propane:0.3,n-butane:0.7",
                        "isobutane:0.6,n-butane:0.4"])
    d = rnd.uniform(2.0, 3.6)
    rows.append(row(tag, "Area 20 butane storage", fluid, "horizontal", "2:1", f(d), f(rnd.uniform(8, 24), 1),
                    f(rnd.uniform(0.8, 1.5)), f(rnd.uniform(35, 85), 0), f(rnd.uniform(10, 38), 0), "", "saturated",
                    "", f(rnd.choice([8.0, 9.5, 10.0]), 1), ""))

# Area 30: anhydrous ammonia
for i in range(30):
    tag = f"V-3{i + 1:03d}"
    shape = "horizontal" if i % 4 else "vertical"
    d = rnd.uniform(2.0, 3.4)
    length = rnd.uniform(8, 20) if shape == "horizontal" else rnd.uniform(4, 9)
    rows.append(row(tag, "Area 30 ammonia", "ammonia", shape, "2:1", f(d), f(length, 1), f(rnd.uniform(0.6, 1.4)),
                    f(rnd.uniform(40, 82), 0), f(rnd.uniform(8, 30), 0), "", "saturated", "",
                    f(rnd.choice([17.0, 18.5, 20.0]), 1), ""))

# Area 40: solvents under a nitrogen blanket (specified storage)
for i in range(40):
    tag = f"D-4{i + 1:03d}"
    fluid, vap = rnd.choice([("n-hexane", "nitrogen:0.85,n-hexane:0.15"), ("toluene", "nitrogen:0.97,toluene:0.03"),
                             ("n-heptane", "nitrogen:0.95,n-heptane:0.05"),
                             ("n-hexane:0.6,n-heptane:0.4", "nitrogen:0.9,n-hexane:0.08,n-heptane:0.02")])
    d = rnd.uniform(1.5, 3.5)
    p = rnd.uniform(0.3, 1.5)
    rows.append(row(tag, "Area 40 solvents", fluid, "vertical", rnd.choice(["2:1", "flanged-dished"]), f(d),
                    f(rnd.uniform(3, 9), 1), f(rnd.uniform(0.5, 1.5)), f(rnd.uniform(30, 80), 0),
                    f(rnd.uniform(15, 40), 0), f"{p:.2f} barg", "specified", vap, f(rnd.choice([3.5, 5.0]), 1),
                    ""))

# Area 50: chlorine tonners and storage
for i in range(15):
    tag = f"V-5{i + 1:03d}"
    d = rnd.uniform(0.8, 2.6)
    rows.append(row(tag, "Area 50 chlorine", "chlorine", "horizontal", "2:1", f(d), f(rnd.uniform(2, 10), 1),
                    f(rnd.uniform(0.5, 1.2)), f(rnd.uniform(40, 80), 0), f(rnd.uniform(10, 25), 0), "", "saturated",
                    "", f(rnd.choice([12.0, 15.0]), 1), ""))

# Area 60: nitrogen and instrument-gas receivers (gas-filled)
for i in range(20):
    tag = f"R-6{i + 1:03d}"
    d = rnd.uniform(0.8, 2.0)
    p = rnd.uniform(6, 10)
    rows.append(row(tag, "Area 60 gas receivers", "nitrogen", "vertical", "2:1", f(d), f(rnd.uniform(2, 6), 1),
                    f(rnd.uniform(0.3, 1.0)), "", f(rnd.uniform(10, 30), 0), f"{p:.1f} barg", "gas-filled", "",
                    f(p * 1.15 + 0.5, 1), ""))

# a few cells with their own units, overriding the header unit (columns: 6 diameter, 10 temperature, 14 set)
rows[5][6] = "3150 mm"
rows[62][10] = "77 F"
rows[75][14] = "1050 kPag"
rows[120][6] = "7.5 ft"

body = [",".join(quoted(c) for c in r) for r in rows]

# deliberately malformed rows, each documented in the header comment
bad = [
    # missing fields: the row stops after the temperature
    "V-9001,Area 90 test rows,propane,,horizontal,2:1,3.0,12.0,1.0,70,25",
    # bad unit: a pressure that does not say gauge or absolute
    "V-9002,Area 90 test rows,propane,,horizontal,2:1,3.0,12.0,1.0,70,25,,saturated,,17.2 bar,,,",
    # unknown fluid
    "V-9003,Area 90 test rows,propain,,horizontal,2:1,3.0,12.0,1.0,70,25,,saturated,,17.2,,,",
    # level above the top of the vessel (a height in the cell overrides the header's %v)
    "V-9004,Area 90 test rows,propane,,horizontal,2:1,3.0,12.0,1.0,4.5 m,25,,saturated,,17.2,,,",
    # bare number in a column with no header unit
    "V-9005,Area 90 test rows,n-hexane,,vertical,2:1,2.0,5.0,1.0,60,25,1.2,specified,nitrogen,3.5,,,",
    # text that a spreadsheet would run as a formula: the audit computes it and writes the tag neutralised
    "=V-9006,Area 90 test rows,propane,,horizontal,2:1,3.0,12.0,1.0,70,25,,saturated,,17.2,,J,",
]

print("# Kestrel Point terminal (Harrowgate Chemicals): vessel register for the inventory audit demo.")
print("# INVENTED DATA: no real site, vessel or company is described. Generated by")
print("# tools/gen_audit_register.py (seed %d); do not edit by hand, rerun the script." % SEED)
print("# Columns and units: docs/audit.md. Lines starting with # are comments.")
print("# Deliberately malformed rows at the end (area 'Area 90 test rows'):")
print("#   V-9001 missing fields (the row ends after the temperature)")
print("#   V-9002 set pressure '17.2 bar' does not say gauge or absolute")
print("#   V-9003 unknown fluid 'propain'")
print("#   V-9004 level '4.5 m' above the top of a 3.0 m vessel")
print("#   V-9005 pressure '1.2' is a bare number and the pressure column has no header unit")
print("#   =V-9006 a tag a spreadsheet would evaluate: computed, and written neutralised ('=V-9006) in the CSV")
print(HEADER)
for r in body:
    print(r)
for r in bad:
    print(r)
