#!/usr/bin/env bash
# Browser tests drive Debian's Chromium; never a downloaded browser.
set -euo pipefail
CHROMIUM=${CHROMIUM_PATH:-/usr/bin/chromium}
if [ -x "$CHROMIUM" ]; then exit 0; fi
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null; then
  echo "Installing Debian's chromium for the browser tests…"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  exit 0
fi
echo "Browser tests need Debian's Chromium at $CHROMIUM. Install it with: sudo apt-get install chromium" >&2
echo "(or point CHROMIUM_PATH at a Chromium binary)." >&2
exit 1
