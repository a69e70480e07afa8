#!/usr/bin/env bash
# Side-by-side speed and accuracy of relicore against what a user would otherwise write
# (a plain C loop with exp, a numpy expression; for distances a cumulative-trapezoid grid with
# numpy.interp and a scipy quad loop; for growth a scipy solve_ivp, a numpy Eisenstein & Hu
# expression and scipy quad; for thermometry a numpy frame), in one run on the same inputs.
# Run from the repository root after the Python package is built into .venv (`make bench`
# does both). A benchmark, not a test: nothing asserts on speed.
set -euo pipefail

cd "$(dirname "$0")/../.."
PY=${PY:-.venv/bin/python}
CC=${CC:-cc}
OUT=build/bench
mkdir -p "$OUT"

echo "== benches/compare: building the C static library (release-c profile)"
cargo build --quiet -p relicore-capi --profile release-c

echo "== benches/compare: compiling the C driver (-O3)"
"$CC" -std=c11 -O3 -Wall -Wextra -Wpedantic -Werror -Iinclude \
  benches/compare/planck_c.c target/release-c/librelicore.a -lm -o "$OUT/planck_c"

echo "== benches/compare: timing and accuracy"
"$PY" benches/compare/compare.py --c-driver "$OUT/planck_c" --work-dir "$OUT" "$@"

echo
echo "== benches/compare: luminosity distances of a catalogue (cosmology)"
"$PY" benches/compare/cosmology_compare.py

echo
echo "== benches/compare: one thermal history and its summary (decoupling)"
"$PY" benches/compare/decoupling_compare.py

echo
echo "== benches/compare: object temperature with u_c of a 1000 x 1000 frame (thermometry)"
"$PY" benches/compare/thermometry_compare.py --lib "${CARGO_TARGET_DIR:-target}/release-c/librelicore.so"

echo
echo "== benches/compare: growth factor and rate, P(k), sigma(8/h Mpc), leapfrog factors (growth)"
"$PY" benches/compare/growth_compare.py
