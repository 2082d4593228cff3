#!/usr/bin/env bash
# The reference step of `npm test`: the fixture checker's own tests, then every committed fixture against its
# regeneration under each stated tolerance, once per OpenBLAS kernel choice (OPENBLAS_CORETYPE unset, Haswell,
# SkylakeX), since the kernels round differently. The three runs go in parallel; SkylakeX needs AVX-512 and is
# reported as not run on a CPU without it.
set -uo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
py() { bash "$here/python.sh" "$@"; }

export OPENBLAS_NUM_THREADS=1  # one thread: no spinning workers on a shared machine, one summation order
py "$here/selftest.py" || exit 1

out="$(mktemp -d)"
trap 'rm -rf "$out"' EXIT
for core in unset Haswell SkylakeX; do
  if [ "$core" = SkylakeX ] && ! grep -qw avx512f /proc/cpuinfo 2>/dev/null; then
    echo "not run on this CPU (no AVX-512)" >"$out/$core"
    echo 0 >"$out/$core.rc"
    continue
  fi
  quiet=--quiet
  [ "$core" = unset ] && quiet=
  (
    if [ "$core" = unset ]; then unset OPENBLAS_CORETYPE; else export OPENBLAS_CORETYPE="$core"; fi
    py "$here/generate.py" --check $quiet >"$out/$core" 2>&1
    echo $? >"$out/$core.rc"
  ) &
done
wait
status=0
for core in unset Haswell SkylakeX; do
  echo "== OPENBLAS_CORETYPE=$core"
  cat "$out/$core"
  [ "$(cat "$out/$core.rc")" = 0 ] || status=1
done
exit $status
