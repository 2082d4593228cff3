#!/usr/bin/env bash
# Runs a reference script with a Python that has numpy, scipy and mpmath, preferring one with exactly the versions
# in test/reference/requirements.txt (those that generated the committed fixtures). Candidates, in order:
# $POLEWRIGHT_PYTHON, the environment .ci/run creates ($POLEWRIGHT_REFERENCE_VENV, default
# ~/.cache/polewright/reference-python), python3, /usr/bin/python3.
#   python.sh --which          print the chosen interpreter and exit (status 2 if none has the pinned versions)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
venv="${POLEWRIGHT_REFERENCE_VENV:-${XDG_CACHE_HOME:-$HOME/.cache}/polewright/reference-python}"
pinned="$(grep -E '^[a-z]+==' "$here/requirements.txt" | sort | tr '\n' ' ')"
probe='import mpmath, numpy, scipy; print(" ".join(sorted(f"{m.__name__}=={m.__version__}" for m in (mpmath, numpy, scipy))), end=" ")'

exact="" fallback="" fallback_versions=""
for py in "${POLEWRIGHT_PYTHON:-}" "$venv/bin/python" python3 /usr/bin/python3; do
  [ -n "$py" ] || continue
  command -v "$py" >/dev/null 2>&1 || continue
  versions="$("$py" -c "$probe" 2>/dev/null)" || continue
  if [ "$versions" = "$pinned" ]; then
    exact="$py"
    break
  fi
  if [ -z "$fallback" ]; then fallback="$py" fallback_versions="$versions"; fi
done

if [ "${1:-}" = "--which" ]; then
  if [ -n "$exact" ]; then echo "$exact"; exit 0; fi
  [ -n "$fallback" ] && echo "$fallback (has ${fallback_versions% }; the fixtures come from ${pinned% })"
  exit 2
fi
if [ -n "$exact" ]; then exec "$exact" "$@"; fi
if [ -n "$fallback" ]; then
  echo "note: no Python with ${pinned% }; using $fallback with ${fallback_versions% }." >&2
  echo "      Differences from the committed fixtures may come from those versions (.ci/run installs the pinned ones)." >&2
  exec "$fallback" "$@"
fi
echo "No python3 with numpy, scipy and mpmath found: .ci/run installs them (or: pip install -r $here/requirements.txt)." >&2
exit 1
