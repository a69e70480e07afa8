#!/usr/bin/env bash
# C tests of relicore: builds the release-c library, then
#   1. the C test against librelicore.a (by path, -lm, --gc-sections) on the reference vectors;
#   2. the same test built with AddressSanitizer + UndefinedBehaviorSanitizer (leak checking on;
#      falls back to valgrind if the sanitizer runtime is missing);
#   3. the plain test under valgrind (memcheck, full leak check);
#   4. a firmware-style program (tests/c/nomalloc.c) linked statically with --gc-sections:
#      its undefined symbols must include no allocation function;
#   5. the C test linked against librelicore.so (with an rpath), and its --dump output compared
#      bit for bit with the static build's.
# Run from anywhere; works in the repository root. Ends with "N passed, M failed" (steps).
set -euo pipefail

cd "$(dirname "${BASH_SOURCE[0]}")/../.."
ROOT=$(pwd)
BUILD="$ROOT/build/c-tests"
LIBDIR="$ROOT/target/release-c"
DATA=("$ROOT/tests/data/blackbody.txt" "$ROOT/tests/data/blackbody_response.txt")
CC=${CC:-gcc}
CFLAGS=(-std=c11 -Wall -Wextra -Wpedantic -Werror -I "$ROOT/include")
mkdir -p "$BUILD"

passed=0
failed=0
step() { # step NAME COMMAND...: runs a step, counts it, never stops the script
    local name=$1
    shift
    echo "=== $name"
    if "$@"; then
        echo "--- ok: $name"
        passed=$((passed + 1))
    else
        echo "--- FAILED: $name"
        failed=$((failed + 1))
    fi
}

for f in "${DATA[@]}"; do
    [[ -f "$f" ]] || { echo "missing reference data $f" >&2; exit 1; }
done

echo "=== cargo build -p relicore-capi --profile release-c"
cargo build -p relicore-capi --profile release-c

build_static() {
    "$CC" "${CFLAGS[@]}" -O2 tests/c/test_blackbody.c "$LIBDIR/librelicore.a" -lm \
        -Wl,--gc-sections -o "$BUILD/test_blackbody"
}
run_static() { "$BUILD/test_blackbody" "${DATA[@]}"; }

sanitizer_available() {
    printf 'int main(void) { return 0; }\n' >"$BUILD/probe.c"
    "$CC" -fsanitize=address,undefined "$BUILD/probe.c" -o "$BUILD/probe" 2>/dev/null \
        && "$BUILD/probe"
}
run_sanitized() {
    "$CC" "${CFLAGS[@]}" -O1 -g -fsanitize=address,undefined -fno-omit-frame-pointer \
        -fno-sanitize-recover=undefined tests/c/test_blackbody.c "$LIBDIR/librelicore.a" -lm \
        -o "$BUILD/test_blackbody_asan" || return 1
    ASAN_OPTIONS=detect_leaks=1:abort_on_error=0 \
        UBSAN_OPTIONS=halt_on_error=1:print_stacktrace=1 \
        "$BUILD/test_blackbody_asan" "${DATA[@]}"
}
run_valgrind() {
    valgrind --quiet --error-exitcode=1 --leak-check=full "$BUILD/test_blackbody" "${DATA[@]}"
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

check_shared() {
    "$CC" "${CFLAGS[@]}" -O2 tests/c/test_blackbody.c -L "$LIBDIR" -lrelicore \
        -Wl,-rpath,"$LIBDIR" -lm -o "$BUILD/test_blackbody_shared" || return 1
    ldd "$BUILD/test_blackbody_shared" | grep -q "$LIBDIR/librelicore.so" \
        || { echo "test_blackbody_shared does not load $LIBDIR/librelicore.so"; return 1; }
    "$BUILD/test_blackbody_shared" "${DATA[@]}" || return 1
    "$BUILD/test_blackbody" --dump "${DATA[@]}" >"$BUILD/dump_static.txt" || return 1
    "$BUILD/test_blackbody_shared" --dump "${DATA[@]}" >"$BUILD/dump_shared.txt" || return 1
    [[ -s "$BUILD/dump_static.txt" ]] || { echo "empty dump"; return 1; }
    cmp "$BUILD/dump_static.txt" "$BUILD/dump_shared.txt" \
        && echo "static and shared builds agree bit for bit on $(wc -l <"$BUILD/dump_static.txt") results"
}

step "compile the C test against librelicore.a" build_static
step "C test (static, reference vectors and interface checks)" run_static
if sanitizer_available; then
    step "C test under AddressSanitizer + UndefinedBehaviorSanitizer" run_sanitized
else
    echo "sanitizer runtime missing: running the sanitizer step under valgrind instead"
    step "C test under valgrind (in place of the sanitizers)" run_valgrind
fi
step "C test under valgrind memcheck" run_valgrind
step "firmware-style program needs no malloc/calloc/realloc/free" check_nomalloc
step "C test against librelicore.so, same bits as the static build" check_shared

echo "C test steps:"
echo "$passed passed, $failed failed"
[[ $failed -eq 0 ]]
