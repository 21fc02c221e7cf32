#!/usr/bin/env bash
# Re-creates fonts/ from the npm font packages (run by hand when upgrading them;
# the result is committed). fonts.css is maintained by hand beside them.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
cd "$work"
npm pack --silent @fontsource/ibm-plex-sans@5.3.0 @fontsource/ibm-plex-mono@5.3.0 >/dev/null
for f in *.tgz; do mkdir -p "${f%.tgz}"; tar xzf "$f" -C "${f%.tgz}"; done
sans="fontsource-ibm-plex-sans-5.3.0/package"
mono="fontsource-ibm-plex-mono-5.3.0/package"
mkdir -p "$ROOT/fonts/ibm-plex-sans" "$ROOT/fonts/ibm-plex-mono"
for sub in latin latin-ext greek; do
  for w in 400 500 600 700; do cp "$sans/files/ibm-plex-sans-$sub-$w-normal."woff* "$ROOT/fonts/ibm-plex-sans/"; done
  cp "$sans/files/ibm-plex-sans-$sub-400-italic."woff* "$ROOT/fonts/ibm-plex-sans/"
done
for sub in latin latin-ext; do
  for w in 400 500; do cp "$mono/files/ibm-plex-mono-$sub-$w-normal."woff* "$ROOT/fonts/ibm-plex-mono/"; done
done
cp "$sans/LICENSE" "$ROOT/fonts/ibm-plex-sans/LICENSE"
cp "$mono/LICENSE" "$ROOT/fonts/ibm-plex-mono/LICENSE"
echo "fonts copied into $ROOT/fonts"
