#!/usr/bin/env bash
# Runs the fuzz targets of fuzz/ (libFuzzer through cargo-fuzz, nightly) and prints, per target,
# the executions, libFuzzer's coverage (cov: code edges, ft: features) and whether it found
# anything. Called by the Makefile:
#
#   fuzz/run.sh full SECONDS [TARGET...]   `make fuzz`: each target SECONDS seconds; new inputs
#                                          kept in fuzz/target/corpus/<target> (the committed
#                                          seeds in fuzz/corpus/<target> are read, not written)
#   fuzz/run.sh quick BUDGET               the `make test` step: build and run every target in
#                                          BUDGET seconds in all (build included), from 64 of
#                                          its committed seeds, with a fixed seed
#
# Without a nightly toolchain it says it skipped and succeeds. With one, it installs cargo-fuzz
# (`cargo install cargo-fuzz --locked`) when absent; that one-time install is not counted in the
# budget. Findings: the input in fuzz/artifacts/<target>/, the log in fuzz/target/logs/, and a
# non-zero exit. Every run is appended to fuzz/target/logs/runs.tsv. One fuzz process at a time.
#
# Sanitizers: the core forbids unsafe code, so its targets run without one (-s none, release);
# `c_abi` drives the unsafe C face and runs under AddressSanitizer (cargo-fuzz's default, with
# debug assertions), built in its own target directory (fuzz/target/asan) so that the two
# builds do not invalidate each other.
set -uo pipefail

cd "$(dirname "$0")"
mode=${1:-}
shift || true
ALL_TARGETS=(blackbody universe thermal_history response_and_calibration c_abi)

if ! rustup toolchain list 2>/dev/null | grep -q '^nightly'; then
  echo "fuzz: skipped (no nightly toolchain installed; cargo-fuzz needs one)"
  exit 0
fi
if ! cargo fuzz --version >/dev/null 2>&1; then
  echo "fuzz: cargo-fuzz absent: cargo install cargo-fuzz --locked"
  cargo install cargo-fuzz --locked || { echo "fuzz: installing cargo-fuzz failed"; exit 1; }
fi
mkdir -p target/logs
[ -f target/logs/runs.tsv ] ||
  printf 'date\ttarget\tseconds\texecs\tcov\tft\tcorpus\tresult\tnote\n' > target/logs/runs.tsv

# cargo-fuzz options per target
opts() {
  if [ "$1" = c_abi ]; then
    echo "--features c-abi --target-dir target/asan"
  else
    echo "-O -s none"
  fi
}

# every C function that takes a universe or a thermal history must be called by c_abi
check_c_abi_list() {
  local want have missing
  want=$(grep -E 'struct relicore_(universe|thermal_history) \*' ../bindings/c/prototypes.txt |
    sed -E 's/^int32_t (relicore_[a-z0-9_]+)\(.*/\1/' | sort -u)
  have=$(grep -oE 'relicore_[a-z0-9_]+' fuzz_targets/c_abi.rs | sort -u)
  missing=$(comm -23 <(printf '%s\n' "$want") <(printf '%s\n' "$have"))
  if [ -n "$missing" ]; then
    echo "fuzz: c_abi does not call:" $missing
    return 1
  fi
  echo "fuzz: c_abi calls all $(printf '%s\n' "$want" | wc -l) C functions that take a universe or a thermal history"
}

# build TARGET...: builds each distinct configuration once
build() {
  local t none=0 c=0
  for t in "$@"; do if [ "$t" = c_abi ]; then c=1; else none=1; fi; done
  if [ $none = 1 ]; then
    cargo +nightly fuzz build -O -s none >target/logs/build.log 2>&1 || return 1
  fi
  if [ $c = 1 ]; then
    cargo +nightly fuzz build c_abi $(opts c_abi) >target/logs/build-c_abi.log 2>&1 || return 1
  fi
}

# run TARGET SECONDS NOTE CORPUS...: one run, its summary line and its row in runs.tsv
failed=0
run() {
  local t=$1 secs=$2 note=$3
  shift 3
  local log=target/logs/$t.log result=ok began
  mkdir -p "artifacts/$t"
  began=$(date +%s)
  # shellcheck disable=SC2046
  if ! cargo +nightly fuzz run $(opts "$t") "$t" "$@" -- \
      -max_total_time="$secs" -timeout=30 -rss_limit_mb=4096 -print_final_stats=1 \
      ${FUZZ_SEED:+-seed=$FUZZ_SEED} >"$log" 2>&1; then
    result=FAILED
    failed=1
  fi
  local execs cov ft corp took
  took=$(($(date +%s) - began))
  execs=$(grep -h 'stat::number_of_executed_units' "$log" | tail -1 | awk '{print $2}')
  cov=$(grep -hoE '(DONE|INITED|pulse|NEW|REDUCE) +cov: [0-9]+' "$log" | tail -1 | awk '{print $NF}')
  ft=$(grep -hoE 'cov: [0-9]+ ft: [0-9]+' "$log" | tail -1 | awk '{print $4}')
  corp=$(grep -hoE 'ft: [0-9]+ corp: [0-9]+' "$log" | tail -1 | awk '{print $4}')
  printf '%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\n' "$(date -u +%Y-%m-%dT%H:%M)" "$t" "$took" \
    "${execs:-?}" "${cov:-?}" "${ft:-?}" "${corp:-?}" "$result" "$note" >>target/logs/runs.tsv
  echo "fuzz: $t: ${execs:-?} executions in ${took} s (limit $secs s, cargo build check included), cov ${cov:-?}, ft ${ft:-?}, corpus ${corp:-?}: $result"
  if [ $result != ok ]; then
    grep -h -A2 -E 'panicked at|ERROR: (libFuzzer|AddressSanitizer)|SUMMARY' "$log" | head -12
    grep -h 'Test unit written' "$log" | head -2
    echo "fuzz: $t: full log fuzz/$log"
  fi
}

case "$mode" in
  full)
    secs=${1:?seconds per target}
    shift
    targets=("$@")
    [ ${#targets[@]} -gt 0 ] || targets=("${ALL_TARGETS[@]}")
    check_c_abi_list || exit 1
    echo "fuzz: building ${targets[*]}"
    build "${targets[@]}" || { echo "fuzz: build failed (fuzz/target/logs/build*.log)"; exit 1; }
    for t in "${targets[@]}"; do
      mkdir -p "target/corpus/$t" "corpus/$t"
      run "$t" "$secs" "make fuzz" "target/corpus/$t" "corpus/$t"
    done
    ;;
  quick)
    budget=${1:?budget in seconds}
    start=$(date +%s)
    check_c_abi_list || exit 1
    # the build is bounded by the budget: a cold fuzz/target (several minutes on two cores)
    # is not built here; `make fuzz` builds it once and later builds are incremental
    if ! timeout $((budget - 30)) bash -c "$(declare -f build opts); build ${ALL_TARGETS[*]}"; then
      echo "fuzz: skipped (the fuzz build did not finish within $((budget - 30)) s, or failed: a cold fuzz/target; run \`make fuzz\` once; log fuzz/target/logs/build*.log)"
      exit 0
    fi
    built=$(($(date +%s) - start))
    # 5 s a target for cargo's build check, libFuzzer's start and the seeds' first pass (64 of
    # the committed seeds, not all: loading is not bounded by -max_total_time)
    per=$(((budget - built - 10) / ${#ALL_TARGETS[@]} - 5))
    [ $per -gt 20 ] && per=20
    if [ $per -lt 3 ]; then
      echo "fuzz: skipped (the build took $built s of the $budget s budget)"
      exit 0
    fi
    echo "fuzz: built in $built s; each target $per s from 64 of its committed seeds (seed 1)"
    for t in "${ALL_TARGETS[@]}"; do
      scratch=target/quick/$t
      rm -rf "$scratch"
      mkdir -p "$scratch"
      find "corpus/$t" -type f | sort | head -n 64 | xargs -r cp -t "$scratch"
      FUZZ_SEED=1 run "$t" "$per" "make test" "$scratch"
    done
    echo "fuzz: $(( $(date +%s) - start )) s in all"
    ;;
  *)
    echo "usage: fuzz/run.sh full SECONDS [TARGET...] | fuzz/run.sh quick BUDGET" >&2
    exit 2
    ;;
esac

if [ $failed = 0 ]; then echo "fuzz: no finding"; else echo "fuzz: findings above"; exit 1; fi
