#!/usr/bin/env bash
# Fortran face of relicore: builds the module and the vector tests against the static C library,
# runs test_blackbody on both blackbody data files, test_cosmology on the cosmology file and
# test_decoupling on the decoupling file, the error-stop checks, the dump modes (the cosmology and
# decoupling dumps are compared bit for bit with the C harnesses' when tests/c/run.sh has built
# them), the interface check against include/relicore.h (and its self-test), and the tests under
# valgrind.
# Run from the repository root:  bash tests/fortran/run.sh
# Leaves build/fortran/test_blackbody, build/fortran/test_cosmology and
# build/fortran/test_decoupling (their --dump modes are used by the Python tests).
set -euo pipefail

FC=${FC:-gfortran}
OUT=build/fortran
LIB=${CARGO_TARGET_DIR:-target}/release-c/librelicore.a
BIN=$OUT/test_blackbody
DATA=(tests/data/blackbody.txt tests/data/blackbody_response.txt)
COSMOLOGY_BIN=$OUT/test_cosmology
COSMOLOGY_DATA=tests/data/cosmology.txt
DECOUPLING_BIN=$OUT/test_decoupling
DECOUPLING_DATA=tests/data/decoupling.txt
THERMOMETRY_BIN=$OUT/test_thermometry
THERMOMETRY_DATA=(tests/data/thermometry.txt tests/data/thermometry_response.txt)

if [[ ! -f bindings/fortran/relicore.f90 ]]; then
  echo "run.sh: run from the repository root" >&2
  exit 2
fi

script_passed=0
script_failed=0
pass() { script_passed=$((script_passed + 1)); echo "ok   $*"; }
fail() { script_failed=$((script_failed + 1)); echo "FAIL $*"; }

# ------------------------------------------------------------------ build
cargo build -p relicore-capi --profile release-c --quiet
mkdir -p "$OUT"
# the module must stay clean under the strictest flags; the test under -Wall (gfortran's
# -Wextra objects to the exact real comparisons a bit-for-bit test makes); vector_files.f90, the
# reading and checking of the vector files the three tests share, makes none and takes the
# strictest flags too
"$FC" -std=f2018 -Wall -Wextra -Werror -pedantic -J "$OUT" \
  -c bindings/fortran/relicore.f90 -o "$OUT/relicore.o"
"$FC" -std=f2018 -Wall -Wextra -Werror -pedantic -J "$OUT" \
  -c tests/fortran/vector_files.f90 -o "$OUT/vector_files.o"
"$FC" -std=f2018 -Wall -Werror -J "$OUT" \
  -c tests/fortran/test_blackbody.f90 -o "$OUT/test_blackbody.o"
"$FC" -std=f2018 -Wall -Werror -J "$OUT" \
  -c tests/fortran/test_cosmology.f90 -o "$OUT/test_cosmology.o"
"$FC" -std=f2018 -Wall -Werror -J "$OUT" \
  -c tests/fortran/test_decoupling.f90 -o "$OUT/test_decoupling.o"
"$FC" -std=f2018 -Wall -Werror -J "$OUT" \
  -c tests/fortran/test_thermometry.f90 -o "$OUT/test_thermometry.o"
# the archive by path (gcc would take the shared library for -lrelicore when both exist); on
# this glibc -lm is the only system library it needs
"$FC" "$OUT/test_blackbody.o" "$OUT/vector_files.o" "$OUT/relicore.o" "$LIB" -lm -o "$BIN"
"$FC" "$OUT/test_cosmology.o" "$OUT/vector_files.o" "$OUT/relicore.o" "$LIB" -lm -o "$COSMOLOGY_BIN"
"$FC" "$OUT/test_decoupling.o" "$OUT/vector_files.o" "$OUT/relicore.o" "$LIB" -lm -o "$DECOUPLING_BIN"
"$FC" "$OUT/test_thermometry.o" "$OUT/vector_files.o" "$OUT/relicore.o" "$LIB" -lm -o "$THERMOMETRY_BIN"

# ------------------------------------------------------------------ vectors and tests in code
log=$OUT/test_blackbody.log
if "$BIN" "${DATA[@]}" >"$log" 2>&1; then
  status=0
else
  status=$?
fi
grep '^FAIL' "$log" || true
summary=$(tail -n 1 "$log")
echo "test_blackbody: $summary"
if [[ $status -ne 0 || ! $summary =~ ^([0-9]+)\ passed,\ 0\ failed$ ]]; then
  echo "run.sh: test_blackbody failed (exit status $status)" >&2
  tail -n 20 "$log" >&2
  exit 1
fi
binary_passed=${BASH_REMATCH[1]}
if [[ $binary_passed -gt 0 ]]; then pass "test_blackbody on ${DATA[*]}"; else fail "test_blackbody ran nothing"; fi

clog=$OUT/test_cosmology.log
if "$COSMOLOGY_BIN" "$COSMOLOGY_DATA" >"$clog" 2>&1; then
  cstatus=0
else
  cstatus=$?
fi
grep '^FAIL' "$clog" || true
csummary=$(grep -E '^[0-9]+ passed, [0-9]+ failed$' "$clog" | tail -n 1 || true)
echo "test_cosmology: ${csummary:-no summary (exit status $cstatus)}"
cosmology_passed=0
if [[ $cstatus -eq 0 && $csummary =~ ^([0-9]+)\ passed,\ 0\ failed$ && ${BASH_REMATCH[1]} -gt 0 ]]; then
  cosmology_passed=${BASH_REMATCH[1]}
  pass "test_cosmology on $COSMOLOGY_DATA"
else
  fail "test_cosmology on $COSMOLOGY_DATA (exit status $cstatus; see $clog)"
fi

dlog=$OUT/test_decoupling.log
if "$DECOUPLING_BIN" "$DECOUPLING_DATA" >"$dlog" 2>&1; then
  dstatus=0
else
  dstatus=$?
fi
grep '^FAIL' "$dlog" || true
sed -n '/^largest deviation/,/^universes:/p' "$dlog"
dsummary=$(grep -E '^[0-9]+ passed, [0-9]+ failed$' "$dlog" | tail -n 1 || true)
echo "test_decoupling: ${dsummary:-no summary (exit status $dstatus)}"
decoupling_passed=0
if [[ $dstatus -eq 0 && $dsummary =~ ^([0-9]+)\ passed,\ 0\ failed$ && ${BASH_REMATCH[1]} -gt 0 ]]; then
  decoupling_passed=${BASH_REMATCH[1]}
  pass "test_decoupling on $DECOUPLING_DATA"
else
  fail "test_decoupling on $DECOUPLING_DATA (exit status $dstatus; see $dlog)"
fi

# ------------------------------------------------------------------ error stop without stat
expect_out=$OUT/stop_check.out
expect_err=$OUT/stop_check.err
if "$BIN" --stop-check >"$expect_out" 2>"$expect_err"; then
  fail "--stop-check: a failing call without stat did not stop the program"
  cat "$expect_out"
else
  expected=$(sed -n 's/^EXPECT //p' "$expect_out")
  if [[ -n $expected ]] && grep -qF -- "$expected" "$expect_err"; then
    pass "a failing status form without stat stops with: $expected"
  else
    fail "--stop-check: stop message '$(cat "$expect_err")' lacks '$expected'"
  fi
fi

# ------------------------------------------------------------------ error stop of a failed init
if "$COSMOLOGY_BIN" --stop-check >"$expect_out.cosmology" 2>"$expect_err.cosmology"; then
  fail "--stop-check (cosmology): a failing init without stat did not stop the program"
  cat "$expect_out.cosmology"
else
  expected=$(sed -n 's/^EXPECT //p' "$expect_out.cosmology")
  if [[ -n $expected ]] && grep -qF -- "$expected" "$expect_err.cosmology"; then
    pass "a failing relicore_universe_init without stat stops with: $expected"
  else
    fail "--stop-check (cosmology): stop message '$(cat "$expect_err.cosmology")' lacks '$expected'"
  fi
fi

# ------------------------------------------------------------------ error stop of a failed compute
if "$DECOUPLING_BIN" --stop-check >"$expect_out.decoupling" 2>"$expect_err.decoupling"; then
  fail "--stop-check (decoupling): a failing compute without stat did not stop the program"
  cat "$expect_out.decoupling"
else
  expected=$(sed -n 's/^EXPECT //p' "$expect_out.decoupling")
  if [[ -n $expected ]] && grep -qF -- "$expected" "$expect_err.decoupling"; then
    pass "a failing relicore_thermal_history_compute without stat stops with: $expected"
  else
    fail "--stop-check (decoupling): stop message '$(cat "$expect_err.decoupling")' lacks '$expected'"
  fi
fi

# ------------------------------------------------------------------ dump mode
dump=$OUT/dump.txt
"$BIN" --dump tests/data/blackbody.txt >"$dump"
want_lines=$(awk '!/^#/ && NF > 0 && $(NF - 2) != "status"' tests/data/blackbody.txt | wc -l)
bad_lines=$(awk '{ want = ($1 ~ /_f32$/) ? 8 : 16
  if (NF != 2 || length($2) != want || $2 !~ /^[0-9A-F]+$/) bad++ } END { print bad + 0 }' "$dump")
names_match=$(diff <(awk '{print $1}' "$dump") \
  <(awk '!/^#/ && NF > 0 && $(NF - 2) != "status" {print $1}' tests/data/blackbody.txt) >/dev/null && echo yes || echo no)
if [[ $(wc -l <"$dump") -eq $want_lines && $bad_lines -eq 0 && $names_match == yes ]]; then
  pass "--dump: $want_lines lines 'name bits' in file order"
else
  fail "--dump: $(wc -l <"$dump") lines for $want_lines vectors, $bad_lines malformed, names in order: $names_match"
fi

cdump=$OUT/dump_cosmology.txt
if "$COSMOLOGY_BIN" --dump "$COSMOLOGY_DATA" >"$cdump"; then
  want_lines=$(awk '!/^#/ && NF > 0 && $1 != "universe" && $(NF - 2) != "status"' "$COSMOLOGY_DATA" | wc -l)
  bad_lines=$(awk '{ if (NF != 3 || length($3) != 16 || $3 !~ /^[0-9A-F]+$/) bad++ } END { print bad + 0 }' "$cdump")
  names_match=$(diff <(awk '{print $1, $2}' "$cdump") \
    <(awk '!/^#/ && NF > 0 && $1 != "universe" && $(NF - 2) != "status" {print $2, $1}' "$COSMOLOGY_DATA") \
    >/dev/null && echo yes || echo no)
  if [[ $(wc -l <"$cdump") -eq $want_lines && $bad_lines -eq 0 && $names_match == yes ]]; then
    pass "--dump (cosmology): $want_lines lines 'universe function bits' in file order"
  else
    fail "--dump (cosmology): $(wc -l <"$cdump") lines for $want_lines vectors, $bad_lines malformed, names in order: $names_match"
  fi
  # the same bits as the C harness (tests/c/run.sh builds it; skipped when it is absent)
  cbin=build/c-tests/test_cosmology
  if [[ -x $cbin ]]; then
    if "$cbin" --dump "$COSMOLOGY_DATA" | awk '{print $1, $2, toupper($3)}' | cmp -s - "$cdump"; then
      pass "--dump (cosmology): Fortran and C agree bit for bit on $want_lines results"
    else
      fail "--dump (cosmology): Fortran and C results differ (compare $cdump with $cbin --dump)"
    fi
  else
    echo "skip: $cbin not built (run tests/c/run.sh first) - no Fortran/C bit comparison"
  fi
else
  fail "--dump (cosmology) failed"
fi

ddump=$OUT/dump_decoupling.txt
if "$DECOUPLING_BIN" --dump "$DECOUPLING_DATA" >"$ddump"; then
  want_lines=$(awk '!/^#/ && NF > 0 && $1 != "universe" && $1 != "history" && $1 != "history_reionized" && $(NF - 2) != "status"' "$DECOUPLING_DATA" | wc -l)
  bad_lines=$(awk '{ if (NF != 3 || length($3) != 16 || $3 !~ /^[0-9A-F]+$/) bad++ } END { print bad + 0 }' "$ddump")
  names_match=$(diff <(awk '{print $1, $2}' "$ddump") \
    <(awk '!/^#/ && NF > 0 && $1 != "universe" && $1 != "history" && $1 != "history_reionized" && $(NF - 2) != "status" {print $2, $1}' "$DECOUPLING_DATA") \
    >/dev/null && echo yes || echo no)
  if [[ $(wc -l <"$ddump") -eq $want_lines && $bad_lines -eq 0 && $names_match == yes ]]; then
    pass "--dump (decoupling): $want_lines lines 'target function bits' in file order"
  else
    fail "--dump (decoupling): $(wc -l <"$ddump") lines for $want_lines vectors, $bad_lines malformed, names in order: $names_match"
  fi
  # the same bits as the C harness (tests/c/run.sh builds it; skipped when it is absent)
  cbin=build/c-tests/test_decoupling
  if [[ -x $cbin ]]; then
    if "$cbin" --dump "$DECOUPLING_DATA" | awk '{print $1, $2, toupper($3)}' | cmp -s - "$ddump"; then
      pass "--dump (decoupling): Fortran and C agree bit for bit on $want_lines results"
    else
      fail "--dump (decoupling): Fortran and C results differ (compare $ddump with $cbin --dump)"
    fi
  else
    echo "skip: $cbin not built (run tests/c/run.sh first) - no Fortran/C bit comparison"
  fi
else
  fail "--dump (decoupling) failed"
fi

# ------------------------------------------------------------------ thermometry
# the vectors of both thermometry files, the frames and the combined uncertainty; the dump (one
# 'name bits' line per double value line) must be the C harness's bit for bit
tlog=$OUT/test_thermometry.log
if "$THERMOMETRY_BIN" "${THERMOMETRY_DATA[@]}" >"$tlog" 2>&1 && grep -qE '^[0-9]+ passed, 0 failed$' "$tlog"; then
  pass "test_thermometry on ${THERMOMETRY_DATA[*]}: $(grep -E '^[0-9]+ passed' "$tlog")"
else
  grep '^FAIL' "$tlog" | head -n 20 || true
  fail "test_thermometry (see $tlog)"
fi
tdump=$OUT/dump_thermometry.txt
if "$THERMOMETRY_BIN" --dump "${THERMOMETRY_DATA[@]}" >"$tdump" 2>/dev/null; then
  want_lines=$(cat "${THERMOMETRY_DATA[@]}" | awk '/^[a-z]/ && $(NF - 2) != "status" && $1 !~ /_f32/' | wc -l)
  if [[ $(wc -l <"$tdump") -eq $want_lines ]]; then
    pass "--dump (thermometry): $want_lines lines 'name bits'"
  else
    fail "--dump (thermometry): $(wc -l <"$tdump") lines for $want_lines vectors"
  fi
  cbin=build/c-tests/test_thermometry
  if [[ -x $cbin ]]; then
    if "$cbin" --dump "${THERMOMETRY_DATA[@]}" | awk '{print $1, toupper($2)}' | cmp -s - "$tdump"; then
      pass "--dump (thermometry): Fortran and C agree bit for bit on $want_lines results"
    else
      fail "--dump (thermometry): Fortran and C results differ (compare $tdump with $cbin --dump)"
    fi
  else
    echo "skip: $cbin not built (run tests/c/run.sh first) - no Fortran/C bit comparison"
  fi
else
  fail "--dump (thermometry) failed"
fi
if command -v valgrind >/dev/null 2>&1; then
  tvlog=$OUT/valgrind_thermometry.log
  valgrind --quiet --leak-check=full --errors-for-leak-kinds=definite,indirect \
    --log-file="$tvlog" "$THERMOMETRY_BIN" "${THERMOMETRY_DATA[@]}" >"$OUT/valgrind_thermometry.out" 2>&1 || true
  if [[ ! -s $tvlog ]] && grep -qE '^[0-9]+ passed, 0 failed$' "$OUT/valgrind_thermometry.out"; then
    pass "valgrind (thermometry): no memory errors or leaks"
  else
    fail "valgrind (thermometry) reported errors (see $tvlog)"
    head -n 40 "$tvlog"
  fi
fi

# ------------------------------------------------------------------ growth
# test_growth on tests/data/growth.txt (vectors, array forms, construction errors), its --dump
# compared bit for bit with the C harness's (tests/c/run.sh builds it), and valgrind
GROWTH_BIN=$OUT/test_growth
GROWTH_DATA=tests/data/growth.txt
"$FC" -std=f2018 -Wall -Werror -J "$OUT" -c tests/fortran/test_growth.f90 -o "$OUT/test_growth.o"
"$FC" "$OUT/test_growth.o" "$OUT/vector_files.o" "$OUT/relicore.o" "$LIB" -lm -o "$GROWTH_BIN"
glog=$OUT/test_growth.log
gstatus=0
"$GROWTH_BIN" "$GROWTH_DATA" >"$glog" 2>&1 || gstatus=$?
grep '^FAIL' "$glog" | head -n 20 || true
gsummary=$(tail -n 1 "$glog")
echo "test_growth: ${gsummary:-no summary (exit status $gstatus)}"
if [[ $gstatus -eq 0 && $gsummary =~ ^([0-9]+)\ passed,\ 0\ failed$ && ${BASH_REMATCH[1]} -gt 0 ]]; then
  pass "test_growth on $GROWTH_DATA ($(tail -n 2 "$glog" | head -n 1))"
else
  fail "test_growth on $GROWTH_DATA (exit status $gstatus; see $glog)"
fi
gdump=$OUT/dump_growth.txt
if "$GROWTH_BIN" --dump "$GROWTH_DATA" >"$gdump"; then
  want_lines=$(awk '!/^#/ && NF > 0 && $1 != "universe" && $1 != "growth" && $1 != "spectrum" && $(NF - 2) != "status"' "$GROWTH_DATA" | wc -l)
  if [[ $(wc -l <"$gdump") -eq $want_lines ]]; then
    pass "--dump (growth): $want_lines lines 'target function bits'"
  else
    fail "--dump (growth): $(wc -l <"$gdump") lines for $want_lines vectors"
  fi
  cbin=build/c-tests/test_growth
  if [[ -x $cbin ]]; then
    if "$cbin" --dump "$GROWTH_DATA" | awk '{print $1, $2, toupper($3)}' | cmp -s - "$gdump"; then
      pass "--dump (growth): Fortran and C agree bit for bit on $want_lines results"
    else
      fail "--dump (growth): Fortran and C results differ (compare $gdump with $cbin --dump)"
    fi
  else
    echo "skip: $cbin not built (run tests/c/run.sh first) - no Fortran/C bit comparison"
  fi
else
  fail "--dump (growth) failed"
fi
if command -v valgrind >/dev/null 2>&1; then
  if valgrind --quiet --error-exitcode=1 --leak-check=full --log-file="$OUT/valgrind_growth.log" \
    "$GROWTH_BIN" "$GROWTH_DATA" >"$OUT/valgrind_growth.out" 2>&1; then
    pass "valgrind (growth): no memory errors or leaks ($(tail -n 1 "$OUT/valgrind_growth.out"))"
  else
    fail "valgrind (growth) reported errors (see $OUT/valgrind_growth.log)"
  fi
fi

# ------------------------------------------------------------------ interfaces against the header
if python3 tests/fortran/check_interfaces.py; then
  pass "interfaces match include/relicore.h"
else
  fail "interfaces differ from include/relicore.h"
fi
if python3 tests/fortran/check_interfaces.py --self-test; then
  pass "the interface check detects every seeded mismatch"
else
  fail "the interface check missed a seeded mismatch"
fi

# ------------------------------------------------------------------ valgrind
if command -v valgrind >/dev/null 2>&1; then
  vlog=$OUT/valgrind.log
  if valgrind --quiet --error-exitcode=1 --leak-check=full --log-file="$vlog" \
    "$BIN" "${DATA[@]}" >"$OUT/valgrind.out" 2>&1; then
    pass "valgrind: no memory errors or leaks ($(tail -n 1 "$OUT/valgrind.out"))"
  else
    fail "valgrind reported errors (see $vlog)"
    head -n 40 "$vlog"
  fi
  # the cosmology test: memory errors and leaks only (its vector failures are counted above)
  cvlog=$OUT/valgrind_cosmology.log
  valgrind --quiet --leak-check=full --errors-for-leak-kinds=definite,indirect \
    --log-file="$cvlog" "$COSMOLOGY_BIN" "$COSMOLOGY_DATA" >"$OUT/valgrind_cosmology.out" 2>&1 || true
  if [[ ! -s $cvlog ]] && grep -qE '^[0-9]+ passed, [0-9]+ failed$' "$OUT/valgrind_cosmology.out"; then
    pass "valgrind (cosmology): no memory errors or leaks ($(grep -E '^[0-9]+ passed' "$OUT/valgrind_cosmology.out" | tail -n 1))"
  else
    fail "valgrind (cosmology) reported errors (see $cvlog)"
    head -n 40 "$cvlog"
  fi
  # the decoupling test: memory errors and leaks only (its vector failures are counted above)
  dvlog=$OUT/valgrind_decoupling.log
  valgrind --quiet --leak-check=full --errors-for-leak-kinds=definite,indirect \
    --log-file="$dvlog" "$DECOUPLING_BIN" "$DECOUPLING_DATA" >"$OUT/valgrind_decoupling.out" 2>&1 || true
  if [[ ! -s $dvlog ]] && grep -qE '^[0-9]+ passed, [0-9]+ failed$' "$OUT/valgrind_decoupling.out"; then
    pass "valgrind (decoupling): no memory errors or leaks ($(grep -E '^[0-9]+ passed' "$OUT/valgrind_decoupling.out" | tail -n 1))"
  else
    fail "valgrind (decoupling) reported errors (see $dvlog)"
    head -n 40 "$dvlog"
  fi
else
  fail "valgrind is not installed"
fi

echo "fortran: test_blackbody $binary_passed passed; test_cosmology $cosmology_passed passed; test_decoupling $decoupling_passed passed; run.sh checks $script_passed passed, $script_failed failed"
echo "$((binary_passed + cosmology_passed + decoupling_passed + script_passed)) passed, $script_failed failed"
[[ $script_failed -eq 0 ]]
