"""Scale: ten million redshifts through relicore.Universe on a dask.distributed cluster of two
worker processes (loopback only, no dashboard), compared bit for bit with the direct call in
this process.

What this shows: a Universe and its bound methods pickle to worker processes (they are rebuilt
there from the parameters) and the rebuilt universes give exactly the same numbers; the
element loop handles chunked input of a realistic catalogue size. The redshifts are made on
the workers from a seeded generator, log-uniform over 1e-3..20 with a few exact zeros; the
values are not checked here (test_cosmology_vectors.py and test_cosmology_quad.py do that),
only their identity.

No timing is asserted. The test takes about 5-10 s on two cores, most of it starting the
cluster and moving 2 x 80 MB back to this process.
"""

from __future__ import annotations

import os

import numpy as np
import pytest

import relicore

dask = pytest.importorskip("dask")
da = pytest.importorskip("dask.array")
distributed = pytest.importorskip("distributed")

N = 10_000_000
CHUNK = 1_000_000


def _worker_view(u: relicore.Universe) -> tuple[int, relicore.Universe, float]:
    """Runs on a worker: its process id, the universe as it arrived, one value."""
    return os.getpid(), u, u.luminosity_distance_mpc(1.0)


def test_ten_million_redshifts_on_a_local_cluster_match_the_direct_call():
    # an invented flat model with radiation and one massive neutrino (every term of E(z))
    u = relicore.Universe(68.0, 0.31, omega_baryon=0.049, neutrino_masses_ev=(0.06, 0.0, 0.0))

    with (
        distributed.LocalCluster(
            n_workers=2,
            processes=True,
            threads_per_worker=1,
            host="127.0.0.1",
            dashboard_address=None,
        ) as cluster,
        distributed.Client(cluster) as client,
    ):
        # the universe really travels to another process and comes back equal
        pid, back, value = client.submit(_worker_view, u, pure=False).result()
        assert pid != os.getpid()
        assert back == u and type(back) is relicore.Universe
        assert value == u.luminosity_distance_mpc(1.0)

        # the catalogue is made on the workers (seeded, log-uniform 1e-3..20, some exact zeros)
        rng = da.random.default_rng(20260806)
        log_z = rng.uniform(np.log(1e-3), np.log(20.0), size=N, chunks=CHUNK)
        zero = da.arange(N, chunks=CHUNK) % 1_000_003 == 0
        zd = da.where(zero, 0.0, da.exp(log_z))
        assert zd.numblocks == (N // CHUNK,)
        dl = zd.map_blocks(u.luminosity_distance_mpc, dtype=np.float64)
        # one compute: the same redshift chunks feed both results
        z, got = dask.compute(zd, dl)
        assert len(client.scheduler_info()["workers"]) == 2
    assert cluster.status.name == "closed"

    assert z.shape == (N,) and np.count_nonzero(z == 0.0) == 10
    direct = u.luminosity_distance_mpc(z)
    assert got.shape == direct.shape and got.dtype == np.float64
    assert np.array_equal(got.view(np.uint64), direct.view(np.uint64)), "results differ in bits"
