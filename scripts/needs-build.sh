#!/usr/bin/env bash
# Exits 0 when the production build is missing or older than any source.
cd "$(dirname "$0")/.."
[ -f .next/BUILD_ID ] || exit 0
changed="$(find app components engine lib models public types next.config.mjs postcss.config.mjs \
  tailwind.config.ts tsconfig.json package-lock.json -newer .next/BUILD_ID -type f 2>/dev/null | head -1)"
[ -n "$changed" ]
