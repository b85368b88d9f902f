"""NumPy reference for the Patchcast kernel benchmark (tests/bench/kernel.bench.ts).

The fastest vectorised form we know: per step, raw 32-bit draws straight from the bit generator
(PCG64 random_raw, two 32-bit halves per 64-bit word), a 2^10-bin lookup table per row indexed by
(state << 10) | (draw >> 22), an exact threshold fallback for the few bins that straddle a
threshold, and per-state counts and area totals with bincount. Buffers are preallocated and
reused with out= arguments. Usage: kernel_numpy.py N T; prints patch-steps per second of wall time
and of this process's CPU time (the machine may be shared).
"""
import json
import sys
import time

import numpy as np

K, BITS = 5, 10
P = np.array([[0.60, 0.15, 0.10, 0.10, 0.05], [0.20, 0.50, 0.15, 0.10, 0.05], [0.05, 0.05, 0.80, 0.05, 0.05],
              [0.10, 0.20, 0.30, 0.30, 0.10], [0.30, 0.10, 0.10, 0.10, 0.40]])


def tables():
    thr = np.ceil(np.cumsum(P, axis=1) * 2.0**32)
    thr[:, -1] = 2.0**32
    width = 2 ** (32 - BITS)
    first = np.arange(1 << BITS, dtype=np.float64) * width
    lo = (first[None, :, None] >= thr[:, None, :]).sum(axis=2)
    hi = ((first + width - 1)[None, :, None] >= thr[:, None, :]).sum(axis=2)
    table = np.where(lo == hi, lo, 0x80 + lo).astype(np.uint8).reshape(-1)
    return table, thr


def main():
    n = int(sys.argv[1]) if len(sys.argv) > 1 else 1_000_000
    steps = int(sys.argv[2]) if len(sys.argv) > 2 else 100
    table, thr = tables()
    bitgen = np.random.PCG64(12345)
    state = (np.arange(n) % K).astype(np.uint8)
    area = np.full(n, 900.0)
    idx = np.empty(n, dtype=np.uint16)
    top = np.empty(n, dtype=np.uint32)
    counts = np.zeros((steps + 1, K))
    sums = np.zeros((steps + 1, K))
    start = time.perf_counter()
    cpu_start = time.process_time()
    for s in range(1, steps + 1):
        r = bitgen.random_raw((n + 1) // 2).view(np.uint32)[:n]
        np.right_shift(r, 32 - BITS, out=top)
        np.left_shift(state, BITS, out=idx, dtype=np.uint16)
        np.bitwise_or(idx, top, out=idx, casting='unsafe')
        np.take(table, idx, out=state)
        straddle = np.flatnonzero(state >= 0x80)
        if straddle.size:
            rows = idx[straddle] >> BITS
            # exact fallback: the number of thresholds ≤ r is the drawn state
            state[straddle] = (r[straddle, None].astype(np.float64) >= thr[rows]).sum(axis=1)
        counts[s] = np.bincount(state, minlength=K)
        sums[s] = np.bincount(state, weights=area, minlength=K)
    cpu = time.process_time() - cpu_start
    seconds = time.perf_counter() - start
    print(json.dumps({"patchStepsPerSecond": round(n * steps / seconds), "cpuPatchStepsPerSecond": round(n * steps / cpu),
                      "check": int(counts[steps].sum())}))


main()
