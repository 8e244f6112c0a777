#!/usr/bin/env bash
# The browser tests drive Debian's chromium. Install it where we can (root with apt-get);
# otherwise stop at once with the command that installs it. Never skip the browser tests.
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
  echo "Installing Debian's chromium for the browser tests (about 20 s)..."
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium fonts-liberation >/dev/null
  exit 0
fi
echo "The browser tests need Debian's chromium at /usr/bin/chromium. Install it with:" >&2
echo "  sudo apt-get update && sudo apt-get install -y --no-install-recommends chromium fonts-liberation" >&2
exit 1
