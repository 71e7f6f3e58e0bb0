#!/usr/bin/python3
"""Whole-process, cold timings of Ventcase commands as a user runs them.

    python3 tools/bench_whole_process.py [--runs 5] [--rows 10000,100000] [--jar target/ventcase.jar]

Builds registers of N rows from the rows of the demo register (demo-cases/register/, invented
data) with varied levels, sizes and temperatures (fixed seed, so the same N always gives the same
file), then runs each command as a separate process several times and prints min / median / max
wall time and the peak resident set size (from /usr/bin/time or, without it, getrusage of the
child). Every run is a fresh JVM: no warm-up is shared between runs. Development tool, not shipped.
"""
import argparse
import csv
import io
import os
import random
import resource
import statistics
import subprocess
import sys
import tempfile
import time

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
DEMO = os.path.join(ROOT, "demo-cases", "register", "kestrel-point-register.csv")


def demo_rows():
    with open(DEMO, encoding="utf-8") as f:
        lines = [l for l in f if not l.startswith("#")]
    rd = list(csv.reader(io.StringIO("".join(lines))))
    # the deliberately malformed rows (area 'Area 90 test rows') are left out: a benchmark register
    # should compute every row
    return rd[0], [r for r in rd[1:] if r and r[0] and not r[1].startswith("Area 90")]


def vary(value, rnd, lo, hi, nd=2):
    try:
        v = float(value)
    except ValueError:
        return value  # a cell with its own unit, or empty
    return f"{v * rnd.uniform(lo, hi):.{nd}f}"


def build_register(n, path):
    header, rows = demo_rows()
    idx = {h: i for i, h in enumerate(header)}
    rnd = random.Random(1000 + n)
    with open(path, "w", encoding="utf-8", newline="") as f:
        f.write("# Register for the whole-process benchmark, built by tools/bench_whole_process.py from the\n")
        f.write("# invented demo register with varied sizes, levels and temperatures. INVENTED DATA.\n")
        w = csv.writer(f, lineterminator="\n")
        w.writerow(header)
        for k in range(n):
            r = list(rows[k % len(rows)])
            r[idx["tag"]] = f"{r[idx['tag']]}-{k // len(rows):05d}"
            r[idx["diameter [m]"]] = vary(r[idx["diameter [m]"]], rnd, 0.9, 1.1)
            r[idx["length [m]"]] = vary(r[idx["length [m]"]], rnd, 0.9, 1.1, 1)
            lv = r[idx["level [%v]"]]
            try:
                r[idx["level [%v]"]] = f"{min(90.0, max(10.0, float(lv) + rnd.uniform(-8, 8))):.0f}"
            except ValueError:
                pass
            t = r[idx["temperature [C]"]]
            try:
                r[idx["temperature [C]"]] = f"{float(t) + rnd.uniform(-3, 3):.1f}"
            except ValueError:
                pass
            w.writerow(r)


def timed(cmd):
    t0 = time.perf_counter()
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    p = subprocess.run(cmd, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE, cwd=ROOT)
    wall = time.perf_counter() - t0
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    # ru_maxrss of children is the largest of any child so far (KiB on Linux): take it as an upper
    # bound; /usr/bin/time is used instead when present (per process).
    return wall, after.ru_maxrss, p.returncode, p.stderr.decode(errors="replace")


def timed_gnu(cmd):
    t0 = time.perf_counter()
    p = subprocess.run(["/usr/bin/time", "-f", "%M"] + cmd, stdout=subprocess.DEVNULL, stderr=subprocess.PIPE,
                       cwd=ROOT)
    wall = time.perf_counter() - t0
    err = p.stderr.decode(errors="replace").strip().splitlines()
    rss = int(err[-1]) if err and err[-1].isdigit() else -1
    return wall, rss, p.returncode, "\n".join(err[:-1])


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--runs", type=int, default=5)
    ap.add_argument("--rows", default="10000,100000")
    ap.add_argument("--jar", default="target/ventcase.jar")
    ap.add_argument("--java", default="java")
    ap.add_argument("--only", default="", help="comma-separated command names to run")
    ap.add_argument("--via", default="both", choices=["jar", "launcher", "both"],
                    help="start each command as 'java -jar JAR', through bin/ventcase (the launcher), or both")
    a = ap.parse_args()
    run = timed_gnu if os.path.exists("/usr/bin/time") else timed
    tmp = tempfile.mkdtemp(prefix="ventcase-bench-")
    starts = []
    if a.via in ("jar", "both"):
        starts.append(("", [a.java, "-jar", a.jar]))
    if a.via in ("launcher", "both"):
        starts.append(("bin/ventcase ", [os.path.join(ROOT, "bin", "ventcase")]))
    cmds = []
    for label, java in starts:
        cmds += commands(label, java, tmp, a.rows)
    only = [s.strip() for s in a.only.split(",") if s.strip()]
    print(f"{'command':34s} {'runs':>4s} {'min s':>8s} {'median s':>9s} {'max s':>8s} {'peak RSS MiB':>13s}")
    for name, cmd in cmds:
        if only and not any(o in name for o in only):
            continue
        walls, rss = [], []
        for _ in range(a.runs):
            wall, m, code, err = run(cmd)
            if code != 0:
                print(f"{name}: exit {code}: {err[-500:]}", file=sys.stderr)
                break
            walls.append(wall)
            rss.append(m)
        if walls:
            print(f"{name:34s} {len(walls):4d} {min(walls):8.2f} {statistics.median(walls):9.2f} {max(walls):8.2f} "
                  f"{max(rss) / 1024:13.0f}")
            sys.stdout.flush()


def commands(label, java, tmp, rows):
    """The benchmarked command lines, each started by `java` (a list)."""
    cmds = [(label + "props", java + ["props", "--fluid", "propane", "--temperature", "40 C", "--pressure", "20 bara"]),
            (label + "calc LPG sphere", java + ["calc", "demo-cases/lpg-sphere-mixture.json"]),
            (label + "sheet LPG sphere", java + ["sheet", "demo-cases/lpg-sphere-mixture.json", "-o",
                                                 os.path.join(tmp, "sheet.pdf")])]
    for n in [int(x) for x in rows.split(",") if x]:
        reg = os.path.join(tmp, f"register-{n}.csv")
        if not os.path.exists(reg):
            build_register(n, reg)
        cmds.append((label + f"audit {n} rows", java + ["audit", reg, "-o", os.path.join(tmp, f"audit-{n}.csv")]))
    return cmds


if __name__ == "__main__":
    main()
