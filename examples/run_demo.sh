#!/usr/bin/env bash
# The relicore demo (`make demo`): one INVENTED scenario -- the fictional Glimmerfen Ridge
# Observatory's balloon radiometer and a fictional handheld infrared thermometer -- computed
# by the same core from Rust, C, Fortran and Python, reading the same invented input file
# (examples/data/invented_radiometer.txt). Prints how far the four agree and writes plots to
# examples/out/. Run from anywhere; `make demo` first builds the Python package into .venv.
set -euo pipefail

cd "$(dirname "$0")/.."
PY=${PY:-.venv/bin/python}
CC=${CC:-cc}
FC=${FC:-gfortran}
INPUT=examples/data/invented_radiometer.txt
BUILD=build/demo
OUT=examples/out
mkdir -p "$BUILD" "$OUT"

echo "relicore demo -- every number below comes from INVENTED data for a FICTIONAL observatory"
echo "(input: $INPUT)"
echo

echo "== building: Rust example, C static library, C and Fortran programs"
cargo build --quiet --release --example radiometer_demo
cargo build --quiet -p relicore-capi --profile release-c
"$CC" -std=c11 -O2 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/radiometer_demo.c \
  target/release-c/librelicore.a -lm -o "$BUILD/radiometer_demo_c"
"$FC" -std=f2018 -O2 -c bindings/fortran/relicore.f90 -J"$BUILD" -o "$BUILD/relicore.o"
"$FC" -std=f2018 -O2 -Wall -Wextra -Werror -I"$BUILD" examples/fortran/radiometer_demo.f90 \
  "$BUILD/relicore.o" target/release-c/librelicore.a -lm -o "$BUILD/radiometer_demo_f"

echo "== running the four programs on the same invented inputs"
target/release/examples/radiometer_demo "$INPUT" >"$OUT/rust.txt"
"$BUILD/radiometer_demo_c" "$INPUT" >"$OUT/c.txt"
"$BUILD/radiometer_demo_f" "$INPUT" >"$OUT/fortran.txt"
"$PY" examples/python/radiometer_demo.py "$INPUT" >"$OUT/python.txt"
for lang in rust c fortran python; do
  echo "   $lang: $(grep -c ' = ' "$OUT/$lang.txt") quantities -> $OUT/$lang.txt"
done
echo

cat <<'EOF'
== what the quantities are (all from invented readings)
   calibration_*         gain and offset of the fictional 150 GHz balloon radiometer from its hot
                         (~300 K) and cold (liquid-nitrogen, ~77 K) blackbody loads
   hot_load_*            the hot load's B_nu and its round trip back to temperature; the loads'
                         Rayleigh-Jeans brightness temperatures J from the calibration
   sky_N_*               invented sky readings turned into J (Rayleigh-Jeans) and T (Planck)
   cmb_*                 dT_RJ/dT_CMB at the channel frequency (for a 2.7255 K background)
   thermometer_*/target_N_*   the fictional 8-14 um handheld thermometer: response-weighted
                         radiance at 300 K, then invented readings -> temperature -> band radiance
   curve_N_*             peak wavelength and peak B_lambda of the plotted Planck curves

EOF
echo "== the four languages side by side"
"$PY" examples/python/compare_outputs.py \
  Rust="$OUT/rust.txt" C="$OUT/c.txt" Fortran="$OUT/fortran.txt" Python="$OUT/python.txt"
echo

echo "== plots"
"$PY" examples/python/plot_demo.py "$INPUT" "$OUT"
