#!/usr/bin/env python3
"""The numpy peer of Raincut's core, for `npm run bench` (test/bench/peer.bench.ts).

Where it comes from: a copy of the project's shared peer script
(`../shared/peers/numpy_peer.py`, named in issue 12), kept here so the bench
runs from a plain clone. The two timed blocks are the shared script's,
statement for statement; only the way bars arrive and figures leave differs.

What it measures: what a practitioner would write instead of Raincut's core.
- loss pass: numpy's vectorised constant-rate loss over every bar,
  loss = min(P, phi*dt), excess = P - loss, total excess summed.
- phi match: scipy's brentq finding the constant rate whose total excess
  sum(max(P - phi*dt, 0)) equals a target depth, to 1e-12 (x and relative).

Two ways to run it:
- `python3 numpy_peer.py`: the shared script's own table (gamma(1.2, 2.0)
  depths from numpy's generator, 5-minute bars, rate 3 mm/h; medians of 7).
- `python3 numpy_peer.py --serve`: one timed repetition per request, so the
  bench can interleave the peer with the JavaScript it is compared with.
  Requests, one a line on stdin; one reply line each on stdout:
    load PATH N      depths: N little-endian float64 values in PATH (mm);
                     every bar lasts 1/12 h       -> "ok SUM_OF_DEPTHS"
    pass RATE        one loss pass at RATE mm/h   -> "MS TOTAL_EXCESS"
    phi TARGET       one brentq match to TARGET   -> "MS PHI"
    quit
  The first line it writes is "ready numpy X scipy Y", or "missing WHAT"
  (exit status 3) when numpy or scipy cannot be imported.
"""
import resource
import sys
import time

try:
    import numpy as np
    from scipy.optimize import brentq
    import scipy
except ImportError as error:
    print(f"missing {error.name or error}", flush=True)
    sys.exit(3)


def phi_match(p, d, target):
    t0 = time.perf_counter()
    phi = brentq(lambda r: np.maximum(p - r * d, 0).sum() - target, 0.0, (p / d).max(), xtol=1e-12, rtol=1e-12)
    return time.perf_counter() - t0, phi


def bench(n, reps=7):
    rng = np.random.default_rng(1)
    d = np.full(n, 1 / 12)
    p = rng.gamma(1.2, 2.0, n)
    t_pass, t_cal = [], []
    for _ in range(reps):
        t0 = time.perf_counter(); loss = np.minimum(p, 3.0 * d); ex = p - loss; tot = ex.sum(); t_pass.append(time.perf_counter() - t0)
        target = 0.4 * p.sum()
        t, phi = phi_match(p, d, target)
        t_cal.append(t)
    return np.median(t_pass) * 1e3, np.median(t_cal) * 1e3, phi


def faults():
    return resource.getrusage(resource.RUSAGE_SELF).ru_minflt


def serve():
    print(f"ready numpy {np.__version__} scipy {scipy.__version__}", flush=True)
    p = d = None
    # The last pass's arrays stay alive until the next pass rebinds them, as
    # in the loop of bench(): what memory each pass gets back from the
    # allocator, and so how many page faults it takes, depends on it.
    loss = ex = None
    for line in sys.stdin:
        words = line.split()
        if not words:
            continue
        if words[0] == "quit":
            break
        if words[0] == "load":
            n = int(words[2])
            p = np.fromfile(words[1], dtype="<f8", count=n)
            if p.size != n:
                print(f"error {words[1]} holds {p.size} values, not {n}", flush=True)
                continue
            d = np.full(n, 1 / 12)
            print(f"ok {float(p.sum())!r}", flush=True)
        elif p is None:
            print("error no bars loaded", flush=True)
        elif words[0] == "pass":
            rate = float(words[1])
            f0, c0 = faults(), time.process_time()
            t0 = time.perf_counter(); loss = np.minimum(p, rate * d); ex = p - loss; tot = ex.sum(); t = time.perf_counter() - t0
            c = time.process_time() - c0
            print(f"{t * 1e3!r} {float(tot)!r} {faults() - f0} {c * 1e3!r}", flush=True)
        elif words[0] == "phi":
            f0, c0 = faults(), time.process_time()
            t, phi = phi_match(p, d, float(words[1]))
            c = time.process_time() - c0
            print(f"{t * 1e3!r} {float(phi)!r} {faults() - f0} {c * 1e3!r}", flush=True)
        else:
            print(f"error unknown request {words[0]}", flush=True)


if __name__ == "__main__":
    if sys.argv[1:] == ["--serve"]:
        serve()
    else:
        for n in (10**3, 10**5, 10**6):
            a, b, phi = bench(n)
            print(f"n={n:>8}  loss pass {a:8.3f} ms  phi match {b:8.3f} ms  phi={phi:.6f}")
