#!/usr/bin/env bash
# Installs the Debian packages the test suite needs (Chromium for the browser tests,
# poppler-utils for PDF rendering) when they are missing. Needs root or sudo.
set -euo pipefail
need=()
[ -x /usr/bin/chromium ] || need+=(chromium)
command -v pdftoppm >/dev/null 2>&1 || need+=(poppler-utils)
[ ${#need[@]} -eq 0 ] && exit 0
echo "Installing Debian packages for the tests: ${need[*]}"
if [ "$(id -u)" -eq 0 ]; then SUDO=""; elif command -v sudo >/dev/null 2>&1; then SUDO="sudo"; else
  echo "Missing ${need[*]}: install them with apt-get (as root) and run the tests again." >&2; exit 1
fi
$SUDO apt-get update -qq
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq "${need[@]}"
