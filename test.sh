#!/usr/bin/env bash
# Runs every test of the project. Installs what the tests need when it is missing (Debian's Chromium for the
# browser tests), then prints one closing line "N passed, N failed".
set -uo pipefail
cd "$(dirname "$0")"

if [ ! -x /usr/bin/chromium ]; then
  echo "Installing Chromium for the browser tests (Debian packages chromium, chromium-driver)..."
  SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update -qq && DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq chromium chromium-driver >/dev/null \
    || { echo "Could not install Chromium; the browser tests will fail." >&2; }
fi

if ! ls /usr/share/fonts/truetype/dejavu/DejaVuSans.ttf /usr/share/fonts/truetype/liberation/LiberationSans-Regular.ttf >/dev/null 2>&1; then
  echo "Installing a TrueType font for the PDF reports (Debian package fonts-dejavu-core)..."
  SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update -qq && DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq fonts-dejavu-core >/dev/null \
    || { echo "Could not install fonts-dejavu-core; the PDF report tests will fail." >&2; }
fi

# The clone must build on its own: no project may reference a file outside the repository.
./tools/check-repo-paths.sh || { echo "0 passed, 1 failed"; exit 1; }

# A throw-away PostgreSQL cluster for the PostgreSQL store tests (installed from Debian's packages when missing),
# stopped on every exit; the tests fail rather than skip when it is missing here.
pgdir=$(mktemp -d /tmp/seepage-pg.XXXXXX)
trap './tools/pg-cluster.sh stop "$pgdir"' EXIT
SEEPAGE_TEST_POSTGRES=$(./tools/pg-cluster.sh start "$pgdir") || { echo "Could not start PostgreSQL." >&2; echo "0 passed, 1 failed"; exit 1; }
export SEEPAGE_TEST_POSTGRES SEEPAGE_REQUIRE_POSTGRES=1

log=$(mktemp)
dotnet test Seepage.sln -c Release 2>&1 | tee "$log"
status=${PIPESTATUS[0]}

passed=$(grep -Eo 'Passed: +[0-9]+' "$log" | awk '{s+=$2} END {print s+0}')
failed=$(grep -Eo 'Failed: +[0-9]+' "$log" | awk '{s+=$2} END {print s+0}')
rm -f "$log"
echo "$passed passed, $failed failed"
if [ "$status" -ne 0 ] && [ "$failed" -eq 0 ]; then echo "dotnet test exited with $status (build or run error)." >&2; fi
exit "$status"
