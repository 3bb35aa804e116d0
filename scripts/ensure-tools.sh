#!/usr/bin/env bash
# Command-line checkers the tests read the output with: poppler's pdftotext (word boxes of a PDF)
# and Info-ZIP's unzip (multi-page SVG downloads). Installed from Debian's packages as root.
set -euo pipefail
missing=()
command -v pdftotext >/dev/null || missing+=(poppler-utils)
command -v unzip >/dev/null || missing+=(unzip)
[ ${#missing[@]} -eq 0 ] && exit 0
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
  echo "Installing ${missing[*]} for the tests…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
  exit 0
fi
echo "The tests need ${missing[*]}. Install with: sudo apt-get install ${missing[*]}" >&2
exit 1
