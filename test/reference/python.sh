#!/usr/bin/env bash
# Runs a reference script with the first Python that has numpy, scipy and mpmath: the machine's python3, or
# Debian's /usr/bin/python3 (where .ci/run installs python3-numpy, python3-scipy and python3-mpmath if needed).
set -euo pipefail
for py in "${POLEWRIGHT_PYTHON:-}" python3 /usr/bin/python3; do
  [ -n "$py" ] || continue
  if command -v "$py" >/dev/null 2>&1 && "$py" -c 'import numpy, scipy, mpmath' >/dev/null 2>&1; then
    exec "$py" "$@"
  fi
done
echo "No python3 with numpy, scipy and mpmath found (install python3-numpy python3-scipy python3-mpmath)." >&2
exit 1
