#!/usr/bin/python3
"""Generate independent check values for Ventcase's API 520 gas sizing and API 526 orifice selection.

Uses the Debian package python3-fluids (fluids.safety_valve), run with /usr/bin/python3.
Only the library's public functions are called; the values are written to
src/test/resources/org/ventcase/device/fluids_api520_refs.csv and compared by
org.ventcase.device.FluidsReferenceTest. Re-run after a library upgrade and review the diff.

    /usr/bin/python3 tools/gen_sizing_refs.py
"""
import datetime
import os

import fluids
from fluids.safety_valve import (API520_A_g, API520_C, API520_F2, API520_Kv,
                                 API520_round_size, API526_A, API526_letters,
                                 is_critical_flow)

OUT = os.path.join(os.path.dirname(__file__), '..', 'src', 'test', 'resources',
                   'org', 'ventcase', 'device', 'fluids_api520_refs.csv')

# Grid: mass flow kg/s, T K, Z, M kg/kmol, k, P1 Pa abs, P2 Pa abs, Kd, Kb, Kc
CASES = []
for k in (1.05, 1.11, 1.3, 1.4, 1.67):
    for p1, p2 in ((670e3, 101.325e3), (670e3, 532e3), (2.5e6, 2.0e6), (1.2e6, 101.325e3), (350e3, 250e3)):
        for m, T, Z, M in ((24270 / 3600, 348.0, 0.90, 51.0), (0.5, 300.0, 0.98, 18.0)):
            CASES.append((m, T, Z, M, k, p1, p2, 0.975, 1.0, 1.0))
# Rupture disk combination and reduced Kd
CASES.append((2.0, 420.0, 0.85, 44.1, 1.13, 1.9e6, 101.325e3, 0.975, 1.0, 0.9))
CASES.append((2.0, 420.0, 0.85, 44.1, 1.13, 1.9e6, 101.325e3, 0.62, 1.0, 1.0))

lines = [
    '# Independent check values for API Std 520 Part I gas sizing and API Std 526 selection.',
    '# Library: fluids %s (Debian python3-fluids), functions fluids.safety_valve.API520_A_g, API520_C,' % fluids.__version__,
    '# API520_F2, is_critical_flow, API520_round_size, API526_letters; generated %s by tools/gen_sizing_refs.py.'
    % datetime.date.today().isoformat(),
    '# Units: m kg/s, T K, M kg/kmol, P1 P2 Pa abs, area m2; C in the standard SI units; F2 empty when critical.',
    '# letter empty when the area exceeds the largest standard orifice (the library raises there).',
    'm_kg_s,T_K,Z,M,k,P1_Pa,P2_Pa,Kd,Kb,Kc,critical,C,F2,A_m2,letter',
]
for (m, T, Z, M, k, p1, p2, kd, kb, kc) in CASES:
    crit = is_critical_flow(p1, p2, k)
    C = API520_C(k)
    F2 = '' if crit else repr(API520_F2(k, p1, p2))
    A = API520_A_g(m, T, Z, M, k, p1, p2, Kd=kd, Kb=kb, Kc=kc)
    try:
        letter = API526_letters[API526_A.index(API520_round_size(A))]
    except Exception:
        letter = ''
    lines.append(','.join(str(x) for x in (repr(m), T, Z, M, k, repr(p1), repr(p2), kd, kb, kc,
                                           'true' if crit else 'false', repr(C), F2, repr(A), letter)))

lines.append('# Kv (7th-9th edition form) at Reynolds numbers: Re,Kv')
for re_ in (50.0, 100.0, 500.0, 1000.0, 4525.0, 1e4, 1e5):
    lines.append('#KV,%r,%r' % (re_, API520_Kv(re_)))

with open(OUT, 'w') as f:
    f.write('\n'.join(lines) + '\n')
print('wrote', os.path.normpath(OUT), len(CASES), 'cases')
