#!/usr/bin/env bash
# The relicore demo (`make demo`): INVENTED scenarios computed by the same core from Rust, C,
# Fortran and Python, each language reading the same invented input file:
#   part 1: the fictional Glimmerfen Ridge Observatory's balloon radiometer and a fictional
#           handheld infrared thermometer (examples/data/invented_radiometer.txt), and its
#           workshop seen by a fictional thermal camera: an invented 640 x 480 thermal scene
#           turned into object-temperature and uncertainty images in all four languages,
#           compared byte for byte (examples/data/invented_thermal_scene.txt);
#   part 2: the fictional Quillmere Deep Field Survey: a table of its invented follow-up galaxies
#           (distance, magnitudes, angular size, lookback time, age) in all four languages, and a
#           catalogue of 100,000 invented galaxies turned into distances and ages in Python
#           (examples/data/invented_catalogue.txt);
#   part 3: the fictional toy simulation code Orvelstep (a coinage, like its group's name): its
#           starting time, the last-scattering summary, the growth factor and rate at its start,
#           sigma8, the leapfrog factors of its first steps, a power-spectrum file for its initial
#           conditions and the ionised fraction and gas temperature on its output redshifts, in
#           all four languages, and plots of the decoupling history and of structure growth in
#           Python (examples/data/invented_simulation.txt).
# Prints how far the four agree and writes plots to examples/out/. Run from anywhere; `make
# demo` first builds the Python package into .venv.
set -euo pipefail

cd "$(dirname "$0")/.."
PY=${PY:-.venv/bin/python}
CC=${CC:-cc}
FC=${FC:-gfortran}
INPUT=examples/data/invented_radiometer.txt
SCENE=examples/data/invented_thermal_scene.txt
CATALOGUE=examples/data/invented_catalogue.txt
SIMULATION=examples/data/invented_simulation.txt
BUILD=build/demo
# cargo's target directory (CARGO_TARGET_DIR when set, as for an engineer's own target dir)
TARGET=${CARGO_TARGET_DIR:-target}
OUT=examples/out
mkdir -p "$BUILD" "$OUT"

echo "relicore demo -- every number below comes from INVENTED data for a FICTIONAL observatory,"
echo "a FICTIONAL galaxy survey and a FICTIONAL simulation code (inputs: $INPUT, $SCENE,"
echo "$CATALOGUE, $SIMULATION). Their names -- Glimmerfen Ridge Observatory, Quillmere Deep Field"
echo "Survey, Hollinscarth Simulation Group, Orvelstep -- are coinages made for this demo, not real"
echo "places, projects or programs."
echo

echo "== building: Rust example, C static library, C and Fortran programs"
cargo build --quiet --release --example radiometer_demo --example thermal_scene \
  --example catalogue_table --example simulation_start
cargo build --quiet -p relicore-capi --profile release-c
"$CC" -std=c11 -O2 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/radiometer_demo.c \
  "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/radiometer_demo_c"
"$FC" -std=f2018 -O2 -c bindings/fortran/relicore.f90 -J"$BUILD" -o "$BUILD/relicore.o"
"$FC" -std=f2018 -O2 -Wall -Wextra -Werror -I"$BUILD" examples/fortran/radiometer_demo.f90 \
  "$BUILD/relicore.o" "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/radiometer_demo_f"
"$CC" -std=c11 -O2 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/thermal_scene.c \
  "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/thermal_scene_c"
"$FC" -std=f2018 -O2 -Wall -Wextra -Werror -I"$BUILD" examples/fortran/thermal_scene.f90 \
  "$BUILD/relicore.o" "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/thermal_scene_f"
"$CC" -std=c11 -O2 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/catalogue_table.c \
  "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/catalogue_table_c"
"$FC" -std=f2018 -O2 -Wall -Wextra -Werror -I"$BUILD" examples/fortran/catalogue_table.f90 \
  "$BUILD/relicore.o" "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/catalogue_table_f"
"$CC" -std=c11 -O2 -Wall -Wextra -Wpedantic -Werror -Iinclude examples/c/simulation_start.c \
  "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/simulation_start_c"
# -J: the program's own module (its state) goes to $BUILD too, not to the working directory
"$FC" -std=f2018 -O2 -Wall -Wextra -Werror -I"$BUILD" -J"$BUILD" examples/fortran/simulation_start.f90 \
  "$BUILD/relicore.o" "$TARGET/release-c/librelicore.a" -lm -o "$BUILD/simulation_start_f"

echo "== part 1: running the four radiometer programs on the same invented inputs"
"$TARGET"/release/examples/radiometer_demo "$INPUT" >"$OUT/rust.txt"
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
echo

echo "== part 1b: the fictional workshop's INVENTED thermal scene, 640 x 480, in all four languages"
"$TARGET"/release/examples/thermal_scene "$SCENE" "$OUT/thermal_rust" >"$OUT/thermal_rust.txt"
"$BUILD/thermal_scene_c" "$SCENE" "$OUT/thermal_c" >"$OUT/thermal_c.txt"
"$BUILD/thermal_scene_f" "$SCENE" "$OUT/thermal_fortran" >"$OUT/thermal_fortran.txt"
"$PY" examples/python/thermal_scene.py "$SCENE" "$OUT/thermal_python" >"$OUT/thermal_python.txt"
for lang in rust c fortran python; do
  echo "   $lang: $(grep -c ' = ' "$OUT/thermal_$lang.txt") quantities -> $OUT/thermal_$lang.txt;" \
    "images $OUT/thermal_${lang}_{signal,temperature,uncertainty}.f64"
done
echo

cat <<'EOF'
== what the quantities are (an invented scene: a painted wall, a painted panel with a cold can,
   a bare aluminium plate, an oxidised steel bar, a water-like tray and a skin-like patch,
   reflecting a warm room at 303 K, seen at 10 um through an infrared window, tau = 0.85)
   region_K_pixels       how many pixels each surface covers (0 = the wall)
   frame_*               the frame of signals from the forward measurement equation, and the
                         object-temperature and u_c images the frame function made of it; the
                         largest |T_obj - T_scene| (the signals are noise-free)
   probe_N_*             at one pixel of each surface, the scalar call's full result: signal,
                         T_obj, u_c and the five sensitivity coefficients dT/d(signal, emissivity,
                         T_refl, tau, T_window) (checked to have the frame pixel's bits)
   u_c is JCGM 100:2008 eq. 10 of the stated (invented) input uncertainties of the scene file
   only; it does not cover the emissivity model or the camera

EOF
echo "== the four languages side by side"
"$PY" examples/python/compare_outputs.py \
  Rust="$OUT/thermal_rust.txt" C="$OUT/thermal_c.txt" Fortran="$OUT/thermal_fortran.txt" \
  Python="$OUT/thermal_python.txt"
echo
echo "== the three images, byte for byte (raw little-endian float64, row-major, 640 x 480)"
for kind in signal temperature uncertainty; do
  "$PY" examples/python/compare_outputs.py --raw-f64 "   $kind image" \
    Rust="$OUT/thermal_rust_$kind.f64" C="$OUT/thermal_c_$kind.f64" \
    Fortran="$OUT/thermal_fortran_$kind.f64" Python="$OUT/thermal_python_$kind.f64"
done
echo

echo "== plots of the thermal scene"
"$PY" examples/python/plot_thermal_scene.py "$SCENE" "$OUT" "$OUT/thermal_python"
echo

echo "== part 2: the fictional Quillmere Deep Field Survey"
echo "== running the four follow-up table programs on the same invented inputs"
"$TARGET"/release/examples/catalogue_table "$CATALOGUE" >"$OUT/cosmology_rust.txt"
"$BUILD/catalogue_table_c" "$CATALOGUE" >"$OUT/cosmology_c.txt"
"$BUILD/catalogue_table_f" "$CATALOGUE" >"$OUT/cosmology_fortran.txt"
"$PY" examples/python/catalogue_table.py "$CATALOGUE" >"$OUT/cosmology_python.txt"
for lang in rust c fortran python; do
  echo "   $lang: $(grep -c ' = ' "$OUT/cosmology_$lang.txt") quantities -> $OUT/cosmology_$lang.txt"
done
echo

cat <<'EOF'
== what the quantities are (the survey's invented universe: flat, H0 = 68.31, Omega_m = 0.3117,
   Omega_b = 0.04893, radiation, one 0.057 eV neutrino -- made-up parameters, not a published fit)
   universe_age_today_gyr   the age of that universe today
   object_N_*            for each of the survey's eight invented follow-up galaxies: its invented
                         redshift, absolute magnitude and half-light radius (kpc); the luminosity
                         distance (Mpc) and distance modulus; the apparent magnitude M + modulus
                         (no K-correction); the half-light radius as an angle (arcsec, from the
                         transverse scale); the lookback time to the galaxy and the age of the
                         universe when its light left (Gyr)

EOF
echo "== the four languages side by side"
"$PY" examples/python/compare_outputs.py \
  Rust="$OUT/cosmology_rust.txt" C="$OUT/cosmology_c.txt" Fortran="$OUT/cosmology_fortran.txt" \
  Python="$OUT/cosmology_python.txt"
echo

echo "== the INVENTED catalogue of 100,000 galaxies (Python), and its plot"
"$PY" examples/python/catalogue_demo.py "$CATALOGUE" "$OUT"
echo

echo "== part 3: the fictional toy simulation code Orvelstep"
echo "== running the four simulation_start programs on the same invented inputs"
"$TARGET"/release/examples/simulation_start "$SIMULATION" "$OUT/simulation_power_spectrum_rust.txt" \
  >"$OUT/simulation_rust.txt"
"$BUILD/simulation_start_c" "$SIMULATION" "$OUT/simulation_power_spectrum_c.txt" >"$OUT/simulation_c.txt"
"$BUILD/simulation_start_f" "$SIMULATION" "$OUT/simulation_power_spectrum_fortran.txt" \
  >"$OUT/simulation_fortran.txt"
"$PY" examples/python/simulation_start.py "$SIMULATION" "$OUT/simulation_power_spectrum_python.txt" \
  >"$OUT/simulation_python.txt"
for lang in rust c fortran python; do
  echo "   $lang: $(grep -c ' = ' "$OUT/simulation_$lang.txt") quantities -> $OUT/simulation_$lang.txt;" \
    "power spectrum -> $OUT/simulation_power_spectrum_$lang.txt"
done
echo
echo "   what the fictional Fortran code printed, in part:"
grep -E '^(start_(redshift|age_myr|ionized_fraction|matter_temperature_k)|history_(last_scattering|drag)_redshift|history_100_theta_star|history_reionization_optical_depth|growth_start_growth_(factor|rate)|spectrum_sigma8|step_1_(drift|kick)_factor_gyr) = ' \
  "$OUT/simulation_fortran.txt" | sed 's/^/     /'
echo

cat <<'EOF'
== what the quantities are (the simulation's universe -- flat, H0 = 70, Omega_m = 0.3,
   Omega_b = 0.05, radiation, one 0.06 eV neutrino: a round-number model, not a published
   fit -- with the invented reionisation redshift)
   start_*               the fictional run's start: its redshift, the age of the universe there
                         (Myr), the ionised fraction x_e = n_e/n_H, the gas temperature T_m, the
                         radiation temperature T_r and T_m/T_r
   reionization_redshift the invented redshift of the tanh reionisation of hydrogen
   history_*             the last-scattering summary of the thermal history: z*, z_drag, the
                         sound horizons at both (Mpc), 100 theta*, the age (years) and radiation
                         temperature at last scattering, the visibility peak, the thermal
                         decoupling redshift (T_m/T_r = 0.99), the reionisation optical depth
   growth_*              the linear growth factor D (1 today), growth rate f = dln D/dln a and
                         unnormalised D_u at the start redshift, and D_u today
   spectrum_*            the linear power spectrum of the initial conditions: the invented A_s,
                         n_s and running, sigma8 (derived from A_s), S8, sigma(8/h Mpc) at the
                         start, f sigma8 at the start and today; spectrum_file_* the first and last
                         rows of the two-column file (k in Mpc^-1, P(k, z_start) in Mpc^3)
   step_N_*              the invented first time steps: start and end scale factors and the
                         comoving-leapfrog drift and kick factors (Gyr) of each whole step
   output_N_*            at each invented output redshift: age (Myr), x_e, T_m, T_r, T_m/T_r
                         (the core does not model the heating of the gas by reionisation)

EOF
echo "== the four languages side by side"
"$PY" examples/python/compare_outputs.py \
  Rust="$OUT/simulation_rust.txt" C="$OUT/simulation_c.txt" Fortran="$OUT/simulation_fortran.txt" \
  Python="$OUT/simulation_python.txt"
echo

echo "== the power-spectrum files of the four languages (k in Mpc^-1, P in Mpc^3, at the start redshift)"
"$PY" examples/python/compare_outputs.py --table "   power spectrum file" \
  Rust="$OUT/simulation_power_spectrum_rust.txt" C="$OUT/simulation_power_spectrum_c.txt" \
  Fortran="$OUT/simulation_power_spectrum_fortran.txt" Python="$OUT/simulation_power_spectrum_python.txt"
echo

echo "== plots of the decoupling history"
"$PY" examples/python/plot_decoupling.py "$SIMULATION" "$OUT"
echo

echo "== plots of structure growth"
"$PY" examples/python/plot_growth.py "$SIMULATION" "$OUT"
