#!/usr/bin/env bash
# Install test of relicore: what a user does after `make install`, exactly as README.md says it.
# The README's blocks marked `<!-- install-test: NAME -->` are read from README.md (so this test
# fails when the README drifts), with the README's prefix /opt/relicore replaced by a fresh
# temporary folder, and run with no LD_LIBRARY_PATH, LIBRARY_PATH, CPATH, PKG_CONFIG_PATH or
# CMAKE_PREFIX_PATH from the caller:
#   1. `install`: make install into the prefix; the layout (librelicore.so.<version>, its SONAME
#      link, librelicore.so, the archive, the header, the Fortran source, the pkg-config and CMake
#      files); the SONAME follows the rule of bindings/c/build.rs and is the one the README names;
#      the comments of the pkg-config and CMake files are copied unchanged and no placeholder is
#      left; every version equals the header's;
#   2. `pkg-config`: `planck.c` and `planck.f90` (README, "Using it") built and run by the
#      README's commands: the shared builds load librelicore.so.<abi> from the prefix through
#      their run path, the static builds contain the archive (no librelicore in NEEDED);
#   3. `CMakeLists.txt` and `cmake`: the README's CMake project (find_package, the targets
#      relicore::relicore, relicore::relicore_static, relicore::fortran, relicore::fortran_static)
#      configured, built and run the same way;
#   4. the CMake version file: 0.1 and 0.1.0 accepted, 0.2, 0.0 and 1.0 refused, the fortran
#      component refused in a project without Fortran;
#   5. DESTDIR: make install DESTDIR=<stage> PREFIX=/opt/relicore, with no cargo on the PATH
#      (as under sudo: the library built before is installed), writes under the stage with
#      /opt/relicore in the pkg-config files;
#   6. every status-code row of README.md agrees with the #defines of include/relicore.h, and
#      every code of the header has a row.
# Each program prints the spectral radiance of a 300 K blackbody at 10 um; the numbers are
# compared with Planck's law evaluated here in Python from the exact SI values of h, c and k
# (SI Brochure, 9th edition, BIPM 2019), to 1e-13 relative, and the static and shared builds of
# one program must print the same digits.
# cmake and pkg-config must be installed (`make install-test` installs them from Debian's
# packages when missing). Run from anywhere; ends with "N passed, M failed". The temporary folder
# is removed when every step passed and kept (its path printed) otherwise.
set -euo pipefail

cd "$(dirname "${BASH_SOURCE[0]}")/../.."
ROOT=$(pwd)
README="$ROOT/README.md"
HEADER="$ROOT/include/relicore.h"
README_PREFIX=/opt/relicore
WORK=$(mktemp -d "${TMPDIR:-/tmp}/relicore-install-test.XXXXXX")
PREFIX="$WORK/prefix"
unset LD_LIBRARY_PATH LIBRARY_PATH CPATH C_INCLUDE_PATH PKG_CONFIG_PATH CMAKE_PREFIX_PATH

for tool in cmake pkg-config gfortran cc readelf python3; do
    command -v "$tool" >/dev/null 2>&1 || {
        echo "install test: $tool is missing (make install-test installs cmake and pkg-config)" >&2
        exit 1
    }
done

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

# readme_block NAME: the fenced block right after the line `<!-- install-test: NAME -->`
readme_block() {
    awk -v marker="<!-- install-test: $1 -->" '
        $0 == marker { if (seen) { twice = 1 }; seen = 1; state = 1; next }
        state == 1 { if ($0 ~ /^```/) { state = 2; next } else { bad = 1; exit } }
        state == 2 && /^```/ { state = 3; exit }
        state == 2 { print }
        END { if (!seen || bad || twice || state != 3) exit 1 }
    ' "$README" || { echo "README.md: no single fenced block after <!-- install-test: $1 -->" >&2; return 1; }
}

# with_prefix NAME: that block with the README's prefix replaced by the test's
with_prefix() {
    local block
    block=$(readme_block "$1") || return 1
    grep -qF "$README_PREFIX" <<<"$block" || { echo "README block $1 does not name $README_PREFIX" >&2; return 1; }
    sed "s|$README_PREFIX|$PREFIX|g" <<<"$block"
}

version_of_header() {
    local major minor patch
    major=$(sed -n 's/^#define RELICORE_VERSION_MAJOR \([0-9]*\)$/\1/p' "$HEADER")
    minor=$(sed -n 's/^#define RELICORE_VERSION_MINOR \([0-9]*\)$/\1/p' "$HEADER")
    patch=$(sed -n 's/^#define RELICORE_VERSION_PATCH \([0-9]*\)$/\1/p' "$HEADER")
    echo "$major.$minor.$patch"
}
VERSION=$(version_of_header)
MAJOR=${VERSION%%.*}
MINOR=${VERSION#*.}
MINOR=${MINOR%%.*}
# the rule of bindings/c/build.rs: the major version, or 0.<minor> while the major version is 0
if [[ $MAJOR == 0 ]]; then ABI="0.$MINOR"; else ABI=$MAJOR; fi
SONAME="librelicore.so.$ABI"
echo "install test in $WORK (relicore $VERSION, expected SONAME $SONAME)"

# ------------------------------------------------------------------ 1. make install
run_install() {
    local cmd
    cmd=$(with_prefix install) || return 1
    echo "$cmd"
    (cd "$ROOT" && bash -euo pipefail -c "$cmd") >"$WORK/install.log" 2>&1 \
        || { tail -n 30 "$WORK/install.log"; return 1; }
}

check_layout() {
    local lib="$PREFIX/lib" ok=0 f
    for f in include/relicore.h include/relicore/relicore.f90 "lib/librelicore.so.$VERSION" \
        lib/librelicore.a lib/pkgconfig/relicore.pc lib/pkgconfig/relicore-static.pc \
        lib/cmake/relicore/relicoreConfig.cmake lib/cmake/relicore/relicoreConfigVersion.cmake; do
        [[ -f "$PREFIX/$f" && ! -L "$PREFIX/$f" ]] || { echo "missing or not a file: $f"; ok=1; }
    done
    cmp -s "$ROOT/include/relicore.h" "$PREFIX/include/relicore.h" || { echo "header differs"; ok=1; }
    cmp -s "$ROOT/bindings/fortran/relicore.f90" "$PREFIX/include/relicore/relicore.f90" \
        || { echo "Fortran source differs"; ok=1; }
    local soname
    soname=$(readelf -d "$lib/librelicore.so.$VERSION" | sed -n 's/.*Library soname: \[\(.*\)\]$/\1/p')
    echo "SONAME of librelicore.so.$VERSION: ${soname:-none}"
    [[ $soname == "$SONAME" ]] || { echo "expected SONAME $SONAME"; ok=1; }
    [[ $(readlink "$lib/$SONAME") == "librelicore.so.$VERSION" ]] \
        || { echo "$SONAME is not a link to librelicore.so.$VERSION"; ok=1; }
    [[ $(readlink "$lib/librelicore.so") == "$SONAME" ]] \
        || { echo "librelicore.so is not a link to $SONAME"; ok=1; }
    grep -qF "Its SONAME is \`$SONAME\`" "$README" \
        || { echo "README.md does not say 'Its SONAME is \`$SONAME\`'"; ok=1; }
    grep -qF "lib/librelicore.so.$VERSION" "$README" \
        || { echo "README.md does not name lib/librelicore.so.$VERSION"; ok=1; }
    return $ok
}

# comment_lines FILE: the lines that are comments in a pkg-config or CMake file
comment_lines() { grep -E '^[[:space:]]*#' "$1" || true; }

check_installed_files() {
    local ok=0 pair template installed
    for pair in relicore.pc.in:pkgconfig/relicore.pc relicore-static.pc.in:pkgconfig/relicore-static.pc \
        cmake/relicoreConfig.cmake.in:cmake/relicore/relicoreConfig.cmake \
        cmake/relicoreConfigVersion.cmake.in:cmake/relicore/relicoreConfigVersion.cmake; do
        template="$ROOT/bindings/c/${pair%%:*}"
        installed="$PREFIX/lib/${pair#*:}"
        if diff <(comment_lines "$template") <(comment_lines "$installed") >"$WORK/comments.diff"; then
            echo "comments copied unchanged: ${pair#*:} ($(comment_lines "$template" | wc -l) lines)"
        else
            echo "make install changed comments of ${pair#*:}:"
            cat "$WORK/comments.diff"
            ok=1
        fi
        if grep -vE '^[[:space:]]*#' "$installed" | grep -E '@[A-Z_]+@'; then
            echo "placeholder left outside the comments of ${pair#*:}"
            ok=1
        fi
    done
    local pc
    for pc in relicore relicore-static; do
        local v
        v=$(PKG_CONFIG_PATH="$PREFIX/lib/pkgconfig" pkg-config --modversion "$pc")
        echo "pkg-config --modversion $pc: $v"
        [[ $v == "$VERSION" ]] || { echo "expected $VERSION (the header's)"; ok=1; }
    done
    local libs
    libs=$(PKG_CONFIG_PATH="$PREFIX/lib/pkgconfig" pkg-config --libs relicore)
    echo "pkg-config --libs relicore: $libs"
    [[ " $libs " == *" -Wl,-rpath,$PREFIX/lib "* ]] || { echo "no run path to $PREFIX/lib"; ok=1; }
    libs=$(PKG_CONFIG_PATH="$PREFIX/lib/pkgconfig" pkg-config --libs relicore-static)
    echo "pkg-config --libs relicore-static: $libs"
    [[ " $libs " == *" $PREFIX/lib/librelicore.a "* ]] || { echo "the archive is not named"; ok=1; }
    grep -qF "set(PACKAGE_VERSION \"$VERSION\")" "$PREFIX/lib/cmake/relicore/relicoreConfigVersion.cmake" \
        || { echo "relicoreConfigVersion.cmake does not say version $VERSION"; ok=1; }
    return $ok
}

step "make install as README.md says ($README_PREFIX -> $PREFIX)" run_install
step "installed layout, SONAME $SONAME and its links" check_layout
step "pkg-config and CMake files: comments unchanged, no placeholder, versions" check_installed_files

# ------------------------------------------------------------------ the programs
# write_sources DIR: planck.c and planck.f90 of README.md into DIR
write_sources() {
    mkdir -p "$1"
    readme_block planck.c >"$1/planck.c" && readme_block planck.f90 >"$1/planck.f90"
}

# check_values FILE: lines "<program> <output>"; C programs evaluate B at 10e-6 m, the Fortran
# programs at 1e-6 * 10 m (the same arithmetic in Python), both at 300 K
check_values() {
    python3 - "$1" <<'EOF'
import math, sys
# exact SI values (SI Brochure, 9th edition, BIPM 2019)
h, c, k = 6.62607015e-34, 299792458.0, 1.380649e-23
def planck(lam, t):
    return 2.0 * h * c * c / lam**5 / math.expm1(h * c / (lam * k * t))
expected = {"c": planck(10e-6, 300.0), "fortran": planck(1e-6 * 10, 300.0)}
bad = 0
seen = {}
for line in open(sys.argv[1]):
    name, text = line.split(None, 1)
    value = float(text)
    lang = "fortran" if "_f" in name else "c"
    rel = abs(value / expected[lang] - 1.0)
    ok = rel <= 1e-13
    bad += not ok
    print(f"{name}: {text.strip()} W m-2 sr-1 m-1, Planck's law {expected[lang]!r}, "
          f"relative difference {rel:.1e}{'' if ok else ' > 1e-13: FAIL'}")
    seen.setdefault(lang, set()).add(text.strip())
for lang, texts in seen.items():
    if len(texts) != 1:
        print(f"the {lang} programs print different digits: {sorted(texts)}")
        bad += 1
if len(seen) != 2:
    print("missing programs")
    bad += 1
sys.exit(1 if bad else 0)
EOF
}

# check_linkage DIR: the shared builds load librelicore.so.<abi> from the prefix by their run
# path, the static builds need no librelicore; then each program's value
check_linkage() {
    local dir=$1 ok=0 p dyn needed
    : >"$dir/values.txt"
    for p in planck planck_f planck_static planck_f_static; do
        [[ -x "$dir/$p" ]] || { echo "$p was not built"; ok=1; continue; }
        dyn=$(readelf -d "$dir/$p")
        needed=$(sed -n 's/.*(NEEDED).*\[\(librelicore[^]]*\)\]$/\1/p' <<<"$dyn")
        if [[ $p == *_static ]]; then
            [[ -z $needed ]] || { echo "$p: static build needs $needed"; ok=1; }
            echo "$p: no librelicore in NEEDED"
        else
            local runpath deps
            runpath=$(sed -n 's/.*(RUNPATH).*\[\(.*\)\]$/\1/p; s/.*(RPATH).*\[\(.*\)\]$/\1/p' <<<"$dyn")
            deps=$(ldd "$dir/$p")
            echo "$p: NEEDED $needed, run path $runpath"
            [[ $needed == "$SONAME" ]] || { echo "$p: expected NEEDED $SONAME"; ok=1; }
            [[ ":$runpath:" == *":$PREFIX/lib:"* ]] || { echo "$p: no run path $PREFIX/lib"; ok=1; }
            grep -qF "$SONAME => $PREFIX/lib/$SONAME" <<<"$deps" \
                || { echo "$p: ldd does not resolve $SONAME in the prefix:"; echo "$deps"; ok=1; }
        fi
        local out
        if out=$("$dir/$p"); then
            echo "$p $out" >>"$dir/values.txt"
        else
            echo "$p failed"
            ok=1
        fi
    done
    check_values "$dir/values.txt" || ok=1
    return $ok
}

run_pkg_config_block() {
    local dir="$WORK/pkg-config" cmd
    write_sources "$dir" || return 1
    cmd=$(with_prefix pkg-config) || return 1
    echo "$cmd"
    (cd "$dir" && bash -euo pipefail -c "$cmd") >"$dir/log" 2>&1 || { cat "$dir/log"; return 1; }
    [[ $(wc -l <"$dir/log") -eq 4 ]] || { echo "expected 4 lines of output:"; cat "$dir/log"; return 1; }
    echo "the README's commands ran; their output:"
    cat "$dir/log"
}
step "README: planck.c and planck.f90 built with pkg-config and run" run_pkg_config_block
step "pkg-config builds: linkage and values" check_linkage "$WORK/pkg-config"

run_cmake_block() {
    local dir="$WORK/cmake" cmd
    write_sources "$dir" || return 1
    readme_block CMakeLists.txt >"$dir/CMakeLists.txt" || return 1
    cmd=$(with_prefix cmake) || return 1
    echo "$cmd"
    (cd "$dir" && bash -euo pipefail -c "$cmd") >"$dir/log" 2>&1 || { tail -n 40 "$dir/log"; return 1; }
    grep -E '^ *(-- The (C|Fortran) compiler identification|\[[ 0-9]+%\] (Built|Linking))' "$dir/log" || true
}
step "README: the CMake project configured, built and run" run_cmake_block
step "CMake builds: linkage and values" check_linkage "$WORK/cmake/build"

# ------------------------------------------------------------------ 4. CMake version file
check_cmake_versions() {
    local dir="$WORK/cmake-versions"
    mkdir -p "$dir"
    cat >"$dir/CMakeLists.txt" <<'EOF'
cmake_minimum_required(VERSION 3.16)
project(versions LANGUAGES NONE)
foreach(request IN ITEMS 0.2 0.0 1.0 0.1 0.1.0)
  find_package(relicore ${request} CONFIG QUIET)
  message(STATUS "request ${request}: ${relicore_FOUND}")
  unset(relicore_DIR CACHE)
endforeach()
find_package(relicore CONFIG QUIET COMPONENTS fortran)
message(STATUS "request fortran without Fortran: ${relicore_FOUND}")
EOF
    cmake -S "$dir" -B "$dir/build" -DCMAKE_PREFIX_PATH="$PREFIX" >"$dir/log" 2>&1 \
        || { cat "$dir/log"; return 1; }
    local got want
    got=$(sed -n 's/^-- request //p' "$dir/log")
    want=$(printf '%s\n' "0.2: 0" "0.0: 0" "1.0: 0" "0.1: 1" "0.1.0: 1" "fortran without Fortran: 0")
    echo "$got"
    # CMake spells the results 0/1 or FALSE/TRUE
    got=$(sed -e 's/: FALSE$/: 0/; s/: TRUE$/: 1/' <<<"$got")
    [[ $got == "$want" ]] || { echo "expected:"; echo "$want"; return 1; }
}
if [[ $VERSION == 0.1.* ]]; then
    step "CMake version file: 0.1, 0.1.0 accepted; 0.2, 0.0, 1.0 and fortran without Fortran refused" \
        check_cmake_versions
else
    echo "skip: the version requests of check_cmake_versions are written for 0.1.x (now $VERSION)"
    failed=$((failed + 1))
fi

# ------------------------------------------------------------------ 5. DESTDIR
check_destdir() {
    local stage="$WORK/stage" cargo_dir path_without_cargo
    # with no cargo on the PATH, as under sudo: the library built before is installed
    cargo_dir=$(dirname "$(command -v cargo)")
    path_without_cargo=$(tr ':' '\n' <<<"$PATH" | grep -vxF "$cargo_dir" | paste -sd: -)
    (cd "$ROOT" && PATH=$path_without_cargo make --no-print-directory install DESTDIR="$stage" \
        PREFIX="$README_PREFIX") >"$WORK/destdir.log" 2>&1 || { tail -n 20 "$WORK/destdir.log"; return 1; }
    grep -F "no cargo on this PATH" "$WORK/destdir.log" || { echo "cargo was found on $path_without_cargo"; return 1; }
    [[ -f "$stage$README_PREFIX/lib/librelicore.so.$VERSION" ]] || { echo "nothing under the stage"; return 1; }
    grep -qx "prefix=$README_PREFIX" "$stage$README_PREFIX/lib/pkgconfig/relicore.pc" \
        || { echo "relicore.pc does not say prefix=$README_PREFIX"; return 1; }
    [[ ! -e $README_PREFIX ]] || echo "note: $README_PREFIX exists on this machine (not written by this test)"
    echo "staged in $stage$README_PREFIX with prefix=$README_PREFIX in the pkg-config files"
}
step "make install DESTDIR=... PREFIX=$README_PREFIX without cargo on the PATH" check_destdir

# ------------------------------------------------------------------ 6. status codes
check_status_rows() {
    python3 - "$HEADER" "$README" <<'EOF'
import re, sys
header = dict((m.group(1), int(m.group(2))) for m in re.finditer(
    r"^#define (RELICORE_(?:OK|ERROR_[A-Z_]+)) (-?\d+)$", open(sys.argv[1]).read(), re.M))
rows = re.findall(r"^\| *([−-]?\d+) *\| *`(RELICORE_[A-Z_]+)` *\|", open(sys.argv[2]).read(), re.M)
bad = 0
for code, name in rows:
    value = int(code.replace("−", "-"))
    if header.get(name) != value:
        print(f"README row {code} {name}: the header says {header.get(name)}")
        bad += 1
missing = sorted(set(header) - {name for _, name in rows}, key=header.get, reverse=True)
for name in missing:
    print(f"README has no row for {name} ({header[name]})")
    bad += 1
print(f"{len(rows)} README rows checked against {len(header)} codes of the header: {bad} problems")
sys.exit(1 if bad or not header else 0)
EOF
}
step "README status-code rows agree with include/relicore.h" check_status_rows

echo "install test steps:"
echo "$passed passed, $failed failed"
if [[ $failed -eq 0 ]]; then
    rm -rf "$WORK"
else
    echo "files kept in $WORK"
fi
[[ $failed -eq 0 ]]
