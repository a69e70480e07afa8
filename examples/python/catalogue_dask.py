#!/usr/bin/env python3
"""A large INVENTED catalogue through relicore on a dask.distributed cluster.

What a user does with millions of objects: put the redshifts in a dask array and map a
Universe method over its blocks. A relicore.Universe pickles as its parameters, so each
worker process rebuilds it (about a millisecond) and computes exactly the numbers this process
would; the check at the end compares bits on the whole catalogue.

The catalogue is invented (seeded log-uniform redshifts, made on the workers); the universe is
the demo's (examples/data/invented_catalogue.txt), not a published fit. The cluster listens on
the loopback interface only, without a dashboard, and is closed at the end.

Usage (from the repository root):
    .venv/bin/python examples/python/catalogue_dask.py [--n 10000000] [--chunk 1000000] [--workers 2]
"""

from __future__ import annotations

import argparse
import sys
import time
from pathlib import Path

import dask
import dask.array as da
import numpy as np
from distributed import Client, LocalCluster

sys.path.insert(0, str(Path(__file__).resolve().parent))
from catalogue_table import DEFAULT_INPUT, read_inputs, universe_of  # noqa: E402


def main() -> int:
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--n", type=int, default=10_000_000)
    ap.add_argument("--chunk", type=int, default=1_000_000)
    ap.add_argument("--workers", type=int, default=2)
    ap.add_argument("--input", default=DEFAULT_INPUT)
    args = ap.parse_args()

    u = universe_of(read_inputs(args.input))
    print(f"universe: {u!r}")
    with (
        LocalCluster(
            n_workers=args.workers,
            processes=True,
            threads_per_worker=1,
            host="127.0.0.1",
            dashboard_address=None,
        ) as cluster,
        Client(cluster) as client,
    ):
        print(f"cluster: {len(client.scheduler_info()['workers'])} worker processes on 127.0.0.1")
        # INVENTED redshifts, log-uniform in [1e-3, 10], generated on the workers (seeded)
        rng = da.random.default_rng(20261202)
        z = da.exp(rng.uniform(np.log(1e-3), np.log(10.0), size=args.n, chunks=args.chunk))
        # one map_blocks per quantity: the bound method travels to the workers with its universe
        d_l = z.map_blocks(u.luminosity_distance_mpc, dtype=np.float64)
        mu = z.map_blocks(u.distance_modulus, dtype=np.float64)
        t0 = time.perf_counter()
        z_np, d_l_np, mu_np = dask.compute(z, d_l, mu)
        elapsed = time.perf_counter() - t0
    print(f"{args.n:,} redshifts in {z.numblocks[0]} chunks: D_L and distance modulus in {elapsed:.2f} s "
          "(cluster, including moving the results back)")
    print(f"median D_L {np.median(d_l_np):.1f} Mpc; distance modulus from {mu_np.min():.3f} to {mu_np.max():.3f}")
    same = np.array_equal(d_l_np.view(np.uint64), u.luminosity_distance_mpc(z_np).view(np.uint64))
    print(f"the workers' D_L equal this process's bit for bit: {'yes' if same else 'NO'}")
    return 0 if same else 1


if __name__ == "__main__":
    sys.exit(main())
