#!/usr/bin/env bash
# Fails when a project, props or test file references a file outside the repository (the build must need
# nothing beside the clone). Checks relative paths in MSBuild files and absolute machine paths in code.
set -uo pipefail
cd "$(dirname "$0")/.."
root=$(pwd -P)
bad=0
while IFS= read -r file; do
  dir=$(dirname "$file")
  # Include="…", Link-less paths and Import Project="…" in MSBuild files.
  while IFS= read -r ref; do
    case "$ref" in ''|\$*|http*|*'*'*) continue ;; esac
    target=$(realpath -m "$dir/$ref")
    case "$target" in "$root"|"$root"/*) ;; *) echo "$file references $ref, outside the repository"; bad=1 ;; esac
  done < <(grep -Eo '(Include|Project|Update)="[^"]+"' "$file" | sed -E 's/^[A-Za-z]+="([^"]+)"$/\1/' | tr '\\' '/')
done < <(git ls-files '*.csproj' '*.props' '*.targets')
# Absolute paths of this kind of machine in code and scripts.
if git grep -nE '"/(work|home|root|tmp)/' -- '*.cs' '*.sh' '*.js' | grep -v '^tools/check-repo-paths.sh'; then
  echo "absolute machine paths found above"; bad=1
fi
[ "$bad" -eq 0 ] && echo "repository paths: every referenced file is inside the clone"
exit "$bad"
