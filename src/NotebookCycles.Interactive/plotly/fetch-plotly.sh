#!/usr/bin/env bash
# Puts plotly.min.js from the npm package plotly.js-dist-min (pinned below) into the folder given, for the build to
# embed as a resource. The tarball's sha512 must equal the pinned integrity (the registry's dist.integrity for this
# version) or the build fails. Skips the download when the folder already holds this exact version.
# Needs node and npm (the npm registry, or npm's local cache when offline).
set -euo pipefail
version="2.35.3"
integrity="sha512-sz2HLP8gkysLx/BanM2PtJTtZ1PLPwdHwMWNri2YxLBy3IOeuDsVQtlmWa4hoK3j/fi4naaD3uZJqH5ozM3zGg=="
out="${1:?usage: fetch-plotly.sh OUTPUT_FOLDER}"
stamp="plotly.js-dist-min@${version} ${integrity}"
if [ -f "$out/plotly.min.js" ] && [ "$(cat "$out/plotly.stamp" 2>/dev/null)" = "$stamp" ]; then
  exit 0
fi
for tool in node npm tar; do
  command -v "$tool" >/dev/null 2>&1 || { echo "fetch-plotly.sh: $tool is needed to fetch plotly.js-dist-min@${version} (install nodejs and npm)" >&2; exit 1; }
done
mkdir -p "$out"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
(cd "$work" && npm pack "plotly.js-dist-min@${version}" --silent --ignore-scripts >/dev/null)
tarball="$work/plotly.js-dist-min-${version}.tgz"
actual="$(node -e 'const c=require("crypto"),f=require("fs");process.stdout.write("sha512-"+c.createHash("sha512").update(f.readFileSync(process.argv[1])).digest("base64"))' "$tarball")"
if [ "$actual" != "$integrity" ]; then
  echo "fetch-plotly.sh: plotly.js-dist-min@${version} has integrity $actual, expected $integrity; not embedding it" >&2
  exit 1
fi
tar -xzf "$tarball" -C "$work" package/plotly.min.js
mv "$work/package/plotly.min.js" "$out/plotly.min.js.tmp"
mv "$out/plotly.min.js.tmp" "$out/plotly.min.js"
printf '%s' "$stamp" > "$out/plotly.stamp"
