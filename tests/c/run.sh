#!/usr/bin/env bash
# C tests of relicore: builds the release-c library, then, for each C test program
# (test_blackbody on the blackbody vector files, test_cosmology on tests/data/cosmology.txt,
# test_decoupling on tests/data/decoupling.txt, test_thermometry on the thermometry files):
#   1. the test against librelicore.a (by path, -lm, --gc-sections) on the reference vectors;
#   2. the same test built with AddressSanitizer + UndefinedBehaviorSanitizer (leak checking on;
#      falls back to valgrind if the sanitizer runtime is missing);
#   3. the plain test under valgrind (memcheck, full leak check);
#   4. a firmware-style program (tests/c/nomalloc.c) linked statically with --gc-sections:
#      its undefined symbols must include no allocation function;
#   5. the test linked against librelicore.so (with an rpath), and its --dump output compared
#      bit for bit with the static build's;
#   6. the hostile-input harness tests/c/hostile_abi.c: every exported function at
#      least 100000 times with random and edge-case arguments, NULL pointers, zero and
#      mismatched lengths, forged and unproduced structs, under AddressSanitizer +
#      UndefinedBehaviorSanitizer (HOSTILE_CALLS overrides the count), and 1000 times per
#      function under valgrind memcheck.
# Each test program is compiled with tests/c/vector_files.c, the reading and checking of the
# vector files they share. The lists of regular functions the programs dispatch to come from
# tests/c/gen_functions.h, generated from bindings/functions.toml by bindings/generate.py.
# The library is taken from $CARGO_TARGET_DIR/release-c (default target/release-c), where the
# cargo build below puts it.
# Run from anywhere; works in the repository root. Ends with "N passed, M failed" (steps).
set -euo pipefail

cd "$(dirname "${BASH_SOURCE[0]}")/../.."
ROOT=$(pwd)
BUILD="$ROOT/build/c-tests"
LIBDIR="${CARGO_TARGET_DIR:-$ROOT/target}/release-c"
DATA=("$ROOT/tests/data/blackbody.txt" "$ROOT/tests/data/blackbody_response.txt")
COSMOLOGY_DATA=("$ROOT/tests/data/cosmology.txt")
DECOUPLING_DATA=("$ROOT/tests/data/decoupling.txt")
GROWTH_DATA=("$ROOT/tests/data/growth.txt")
THERMOMETRY_DATA=("$ROOT/tests/data/thermometry.txt" "$ROOT/tests/data/thermometry_response.txt")
CC=${CC:-gcc}
CFLAGS=(-std=c11 -Wall -Wextra -Wpedantic -Werror -I "$ROOT/include")
SHARED=("$ROOT/tests/c/vector_files.c") # compiled into every test program
mkdir -p "$BUILD"

passed=0
failed=0
step() { # step NAME COMMAND...: runs a step, counts it, never stops the script
    local name=$1
    shift
    echo "=== $name"
    local start=$SECONDS
    if "$@"; then
        echo "--- ok: $name ($((SECONDS - start)) s)"
        passed=$((passed + 1))
    else
        echo "--- FAILED: $name ($((SECONDS - start)) s)"
        failed=$((failed + 1))
    fi
}

for f in "${DATA[@]}" "${COSMOLOGY_DATA[@]}" "${DECOUPLING_DATA[@]}" "${THERMOMETRY_DATA[@]}" "${GROWTH_DATA[@]}"; do
    [[ -f "$f" ]] || { echo "missing reference data $f" >&2; exit 1; }
done

echo "=== cargo build -p relicore-capi --profile release-c"
cargo build -p relicore-capi --profile release-c

# data_of TEST: the arguments of a test program (its data files)
data_of() {
    case $1 in
    test_blackbody) echo "${DATA[@]}" ;;
    test_cosmology) echo "${COSMOLOGY_DATA[@]}" ;;
    test_decoupling) echo "${DECOUPLING_DATA[@]}" ;;
    test_growth) echo "${GROWTH_DATA[@]}" ;;
    test_thermometry) echo "${THERMOMETRY_DATA[@]}" ;;
    esac
}
TESTS=(test_blackbody test_cosmology test_decoupling test_thermometry test_growth)

build_static() { # build_static TEST
    "$CC" "${CFLAGS[@]}" -O2 "tests/c/$1.c" "${SHARED[@]}" "$LIBDIR/librelicore.a" -lm \
        -Wl,--gc-sections -o "$BUILD/$1"
}
run_static() { # run_static TEST
    # shellcheck disable=SC2046
    "$BUILD/$1" $(data_of "$1")
}

sanitizer_available() {
    printf 'int main(void) { return 0; }\n' >"$BUILD/probe.c"
    "$CC" -fsanitize=address,undefined "$BUILD/probe.c" -o "$BUILD/probe" 2>/dev/null \
        && "$BUILD/probe"
}
run_sanitized() { # run_sanitized TEST
    "$CC" "${CFLAGS[@]}" -O1 -g -fsanitize=address,undefined -fno-omit-frame-pointer \
        -fno-sanitize-recover=undefined "tests/c/$1.c" "${SHARED[@]}" "$LIBDIR/librelicore.a" -lm \
        -o "$BUILD/$1_asan" || return 1
    # shellcheck disable=SC2046
    ASAN_OPTIONS=detect_leaks=1:abort_on_error=0 \
        UBSAN_OPTIONS=halt_on_error=1:print_stacktrace=1 \
        "$BUILD/$1_asan" $(data_of "$1")
}
run_valgrind() { # run_valgrind TEST
    # shellcheck disable=SC2046
    valgrind --quiet --error-exitcode=1 --leak-check=full "$BUILD/$1" $(data_of "$1")
}

check_nomalloc() {
    "$CC" "${CFLAGS[@]}" -O2 tests/c/nomalloc.c "$LIBDIR/librelicore.a" -lm -Wl,--gc-sections \
        -o "$BUILD/nomalloc" || return 1
    "$BUILD/nomalloc" || { echo "nomalloc: $? calls did not succeed"; return 1; }
    echo "undefined symbols of the linked nomalloc executable (nm -u):"
    nm -u "$BUILD/nomalloc" | sed 's/^/    /'
    local alloc
    alloc=$(nm -u "$BUILD/nomalloc" | awk '{print $NF}' | sed 's/@.*//' \
        | grep -E '^(malloc|calloc|realloc|free|posix_memalign|aligned_alloc|memalign)$' || true)
    if [[ -n "$alloc" ]]; then
        echo "allocation functions needed by the firmware-style program:" $alloc
        return 1
    fi
    echo "no allocation function is needed"
}

check_shared() { # check_shared TEST
    local t=$1
    "$CC" "${CFLAGS[@]}" -O2 "tests/c/$t.c" "${SHARED[@]}" -L "$LIBDIR" -lrelicore \
        -Wl,-rpath,"$LIBDIR" -lm -o "$BUILD/${t}_shared" || return 1
    # ldd's output is captured first: with pipefail, `ldd | grep -q` fails whenever grep exits at
    # its match before ldd has written its last line (ldd then dies of SIGPIPE)
    local deps
    deps=$(ldd "$BUILD/${t}_shared") || { echo "ldd ${t}_shared failed"; return 1; }
    grep -qF "$LIBDIR/librelicore.so" <<<"$deps" \
        || { echo "${t}_shared does not load $LIBDIR/librelicore.so"; return 1; }
    # shellcheck disable=SC2046
    "$BUILD/${t}_shared" $(data_of "$t") || return 1
    # shellcheck disable=SC2046
    "$BUILD/$t" --dump $(data_of "$t") >"$BUILD/${t}_dump_static.txt" || return 1
    # shellcheck disable=SC2046
    "$BUILD/${t}_shared" --dump $(data_of "$t") >"$BUILD/${t}_dump_shared.txt" || return 1
    [[ -s "$BUILD/${t}_dump_static.txt" ]] || { echo "empty dump"; return 1; }
    cmp "$BUILD/${t}_dump_static.txt" "$BUILD/${t}_dump_shared.txt" \
        && echo "static and shared builds agree bit for bit on $(wc -l <"$BUILD/${t}_dump_static.txt") results"
}

for t in "${TESTS[@]}"; do
    step "compile $t against librelicore.a" build_static "$t"
done
for t in "${TESTS[@]}"; do
    step "$t (static, reference vectors and interface checks)" run_static "$t"
done
if sanitizer_available; then
    for t in "${TESTS[@]}"; do
        step "$t under AddressSanitizer + UndefinedBehaviorSanitizer" run_sanitized "$t"
    done
else
    echo "sanitizer runtime missing: running the sanitizer step under valgrind instead"
    for t in "${TESTS[@]}"; do
        step "$t under valgrind (in place of the sanitizers)" run_valgrind "$t"
    done
fi
for t in "${TESTS[@]}"; do
    step "$t under valgrind memcheck" run_valgrind "$t"
done
step "firmware-style program needs no malloc/calloc/realloc/free" check_nomalloc

HOSTILE_CALLS=${HOSTILE_CALLS:-100000}
# the hostile harnesses: hostile_abi (every export) and hostile_thermometry (the thermometry
# exports of more arguments, struct results, frames, response tables) and hostile_growth (the
# growth lists of gen_functions.h, the growth and spectrum structs and their compute functions)
HOSTILES=(hostile_abi hostile_thermometry hostile_growth)
run_hostile_sanitized() { # run_hostile_sanitized HARNESS
    local h=${1:-hostile_abi}
    "$CC" "${CFLAGS[@]}" -O1 -g -fsanitize=address,undefined -fno-omit-frame-pointer \
        -fno-sanitize-recover=undefined "tests/c/$h.c" "$LIBDIR/librelicore.a" -lm \
        -o "$BUILD/${h}_asan" || return 1
    ASAN_OPTIONS=detect_leaks=1:abort_on_error=0 \
        UBSAN_OPTIONS=halt_on_error=1:print_stacktrace=1 \
        "$BUILD/${h}_asan" --calls "$HOSTILE_CALLS" >"$BUILD/${h}_asan.log" 2>&1
    local status=$?
    grep -E '^(FAIL|statuses over all calls|hostile:)' "$BUILD/${h}_asan.log" | head -n 60
    [[ $status -eq 0 ]] || { tail -n 40 "$BUILD/${h}_asan.log"; return 1; }
    echo "per-function status counts: $BUILD/${h}_asan.log"
}
run_hostile_plain() { # without a sanitizer runtime: the plain build, all calls
    local h=${1:-hostile_abi}
    "$CC" "${CFLAGS[@]}" -O2 -g "tests/c/$h.c" "$LIBDIR/librelicore.a" -lm \
        -Wl,--gc-sections -o "$BUILD/$h" || return 1
    "$BUILD/$h" --calls "$HOSTILE_CALLS" >"$BUILD/$h.log" 2>&1 \
        || { grep -E '^FAIL' "$BUILD/$h.log" | head -n 40; return 1; }
    grep -E '^(statuses over all calls|hostile:)' "$BUILD/$h.log"
}
run_hostile_valgrind() { # memcheck reports reads of uninitialised memory: no such struct here
    local h=${1:-hostile_abi}
    "$CC" "${CFLAGS[@]}" -O2 -g "tests/c/$h.c" "$LIBDIR/librelicore.a" -lm \
        -Wl,--gc-sections -o "$BUILD/$h" || return 1
    valgrind --quiet --error-exitcode=1 --leak-check=full "$BUILD/$h" --calls 1000 \
        --no-uninit >"$BUILD/${h}_valgrind.log" 2>&1 \
        || { grep -vE '^relicore_' "$BUILD/${h}_valgrind.log" | head -n 60; return 1; }
    grep -E '^hostile:' "$BUILD/${h}_valgrind.log"
}
for h in "${HOSTILES[@]}"; do
    if sanitizer_available; then
        step "$h: hostile inputs under ASan + UBSan ($HOSTILE_CALLS calls each)" run_hostile_sanitized "$h"
    else
        echo "sanitizer runtime missing: the hostile harness runs without it"
        step "$h: hostile inputs ($HOSTILE_CALLS calls each, no sanitizer runtime)" run_hostile_plain "$h"
    fi
    step "$h: hostile inputs under valgrind memcheck (1000 calls each)" run_hostile_valgrind "$h"
done
for t in "${TESTS[@]}"; do
    step "$t against librelicore.so, same bits as the static build" check_shared "$t"
done

echo "C test steps:"
echo "$passed passed, $failed failed"
[[ $failed -eq 0 ]]
