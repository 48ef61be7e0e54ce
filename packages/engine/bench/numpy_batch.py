"""The batch benchmark in vectorised numpy, for comparison with the engine's kernels.

Reads six little-endian float64 columns (sx, sy, sz, txy, tyz, tzx; Pa) from a binary file
written by bench/run.ts, computes the three principal stresses by the same trigonometric
closed form (vectorised) and the von Mises factor Sy / sigma_vm, and prints one JSON line:
points per second (best of several runs), the factors' sum as a checksum, and the rate of
numpy.linalg.eigvalsh on stacked 3x3 matrices for reference. With --plane it times plane states.
"""
import json
import sys
import time

try:
    import numpy as np
except ImportError:  # numpy missing: the caller prints a note and skips
    print(json.dumps({"error": "numpy is not installed"}))
    sys.exit(0)


def principal_and_vm(sx, sy, sz, txy, tyz, tzx, Sy):
    q = (sx + sy + sz) / 3.0
    b00, b11, b22 = sx - q, sy - q, sz - q
    p2 = (b00 * b00 + b11 * b11 + b22 * b22 + 2.0 * (txy * txy + tyz * tyz + tzx * tzx)) / 6.0
    p = np.sqrt(p2)
    det = b00 * (b11 * b22 - tyz * tyz) - txy * (txy * b22 - tyz * tzx) + tzx * (txy * tyz - b11 * tzx)
    with np.errstate(divide="ignore", invalid="ignore"):
        r = np.clip(det / (2.0 * p2 * p), -1.0, 1.0)
    r = np.where(p2 > 0, r, 0.0)
    phi = np.arccos(r) / 3.0
    s1 = q + 2.0 * p * np.cos(phi)
    s3 = q + 2.0 * p * np.cos(phi + 2.0 * np.pi / 3.0)
    s2 = 3.0 * q - s1 - s3
    vm = np.sqrt(0.5 * ((sx - sy) ** 2 + (sy - sz) ** 2 + (sz - sx) ** 2) + 3.0 * (txy * txy + tyz * tyz + tzx * tzx))
    with np.errstate(divide="ignore"):
        factor = np.where(vm > 0, Sy / vm, np.inf)
    return s1, s2, s3, factor


def plane_vm(sx, sy, txy, Sy):
    c = 0.5 * (sx + sy)
    h = 0.5 * (sx - sy)
    r = np.sqrt(h * h + txy * txy)
    p1, p2 = c + r, c - r
    s1 = np.maximum(p1, 0.0)
    s3 = np.minimum(p2, 0.0)
    s2 = np.where(p1 > 0, np.maximum(p2, 0.0), p1)
    vm = np.sqrt(0.5 * ((s1 - s2) ** 2 + (s2 - s3) ** 2 + (s3 - s1) ** 2))
    with np.errstate(divide="ignore"):
        return np.where(vm > 0, Sy / vm, np.inf)


def best_rate(fn, n, runs=5):
    best = 0.0
    for _ in range(runs):
        t = time.perf_counter()
        fn()
        dt = time.perf_counter() - t
        best = max(best, n / dt)
    return best


def main():
    path, n, Sy = sys.argv[1], int(sys.argv[2]), float(sys.argv[3])
    plane = "--plane" in sys.argv
    data = np.fromfile(path, dtype="<f8").reshape(6, n)
    sx, sy, sz, txy, tyz, tzx = (np.ascontiguousarray(data[i]) for i in range(6))
    if plane:
        factor = plane_vm(sx, sy, txy, Sy)
        rate = best_rate(lambda: plane_vm(sx, sy, txy, Sy), n)
        print(json.dumps({"points_per_s": rate, "checksum": float(np.sum(factor[np.isfinite(factor)]))}))
        return
    factor = principal_and_vm(sx, sy, sz, txy, tyz, tzx, Sy)[3]
    rate = best_rate(lambda: principal_and_vm(sx, sy, sz, txy, tyz, tzx, Sy), n)
    m = np.empty((n, 3, 3))
    m[:, 0, 0], m[:, 1, 1], m[:, 2, 2] = sx, sy, sz
    m[:, 0, 1] = m[:, 1, 0] = txy
    m[:, 1, 2] = m[:, 2, 1] = tyz
    m[:, 0, 2] = m[:, 2, 0] = tzx
    eig_rate = best_rate(lambda: np.linalg.eigvalsh(m), n, runs=2)
    print(json.dumps({
        "points_per_s": rate,
        "eigvalsh_points_per_s": eig_rate,
        "checksum": float(np.sum(factor[np.isfinite(factor)])),
        "numpy": np.__version__,
    }))


if __name__ == "__main__":
    main()
