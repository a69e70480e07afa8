#!/usr/bin/env bash
# Builds the Python extension (release, locked) and installs the package into the project
# venv in editable mode: the compiled relicore/_native*.so lands next to the Python sources
# (ignored by git) and the venv imports the package from bindings/python/python.
# Quick when nothing changed: cargo rebuilds nothing and maturin only reinstalls.
#
#   bash bindings/python/build.sh            (from the repository root or anywhere)
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
venv="${RELICORE_VENV:-$root/.venv}"
export VIRTUAL_ENV="$venv"
export PYO3_PYTHON="$venv/bin/python"
cd "$here"
"$venv/bin/maturin" develop --release --locked --quiet
"$venv/bin/python" -c 'import relicore; print("relicore", relicore.__version__, "installed in", "'"$venv"'")'
