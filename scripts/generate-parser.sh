#!/usr/bin/env bash
# Regenerates the C# parser from grammar/LogicProof.g4 with the pinned antlr-ng version.
# Usage: scripts/generate-parser.sh [OUTPUT_DIR]   (default: src/LogicProof.Language/Generated)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
out="${1:-$root/src/LogicProof.Language/Generated}"
antlr_ng_version="1.0.10"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
cp "$root/grammar/LogicProof.g4" "$work/"
(cd "$work" && npx --yes "antlr-ng@$antlr_ng_version" -Dlanguage=CSharp -v true -p LogicProof.Language.Generated -o gen LogicProof.g4 >/dev/null)
rm -rf "$out"
mkdir -p "$out"
for f in "$work"/gen/*.cs; do
  # Generated files carry no timestamps or absolute paths, so a regeneration is byte-identical when the grammar is unchanged.
  sed -e 's#^// Generated from .*LogicProof.g4.*#// Generated from grammar/LogicProof.g4 by antlr-ng '"$antlr_ng_version"'. Do not edit.#' "$f" > "$out/$(basename "$f")"
done
cp "$work"/gen/*.interp "$work"/gen/*.tokens "$out/" 2>/dev/null || true
