#!/usr/bin/env bash
# The tests need Debian's chromium (browser tests) and postgresql (the API suite's second run).
# As root, install whatever is missing; otherwise say what to install.
set -euo pipefail

missing=()
[ -x /usr/bin/chromium ] || missing+=(chromium)
ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1 || missing+=(postgresql)
[ ${#missing[@]} -eq 0 ] && exit 0

if [ "$(id -u)" != "0" ]; then
  echo "Missing Debian packages: ${missing[*]}. Install them with: sudo apt-get install -y ${missing[*]}" >&2
  exit 1
fi
echo "Installing Debian packages: ${missing[*]}"
apt-get update -qq
DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null
