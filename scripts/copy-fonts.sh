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

# The complete character sets, one file per weight, for the PDF sheet.
npm pack --silent @ibm/plex@6.4.1 >/dev/null
complete_sans=package/IBM-Plex-Sans/fonts/complete/woff
complete_mono=package/IBM-Plex-Mono/fonts/complete/woff
tar xzf ibm-plex-6.4.1.tgz package/LICENSE.txt \
  "$complete_sans"/IBMPlexSans-{Regular,Medium,SemiBold,Bold}.woff \
  "$complete_mono"/IBMPlexMono-{Regular,Medium}.woff
mkdir -p "$ROOT/fonts/ibm-plex-sans-complete" "$ROOT/fonts/ibm-plex-mono-complete"
cp "$complete_sans"/*.woff "$ROOT/fonts/ibm-plex-sans-complete/"
cp "$complete_mono"/*.woff "$ROOT/fonts/ibm-plex-mono-complete/"
cp package/LICENSE.txt "$ROOT/fonts/ibm-plex-sans-complete/LICENSE.txt"
cp package/LICENSE.txt "$ROOT/fonts/ibm-plex-mono-complete/LICENSE.txt"
echo "fonts copied into $ROOT/fonts"
