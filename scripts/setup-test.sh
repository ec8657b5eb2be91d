#!/usr/bin/env bash
# Installs what the test suite needs on a fresh Debian machine, and says what it does:
#   - Debian packages chromium (browser tests) and poppler-utils (PDF checks), only when missing;
#   - the exact npm dependencies from package-lock.json (npm ci).
set -euo pipefail
export DEBIAN_FRONTEND=noninteractive
missing=()
command -v chromium >/dev/null 2>&1 || missing+=(chromium)
command -v pdftotext >/dev/null 2>&1 && command -v pdftoppm >/dev/null 2>&1 || missing+=(poppler-utils)
if [ ${#missing[@]} -gt 0 ]; then
  echo "setup:test: installing Debian packages: ${missing[*]}"
  SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update
  $SUDO apt-get install -y --no-install-recommends "${missing[@]}"
else
  echo "setup:test: chromium and poppler-utils already present; skipping apt"
fi
echo "setup:test: installing npm dependencies (npm ci)"
npm ci --no-audit --no-fund
