#!/usr/bin/env bash
# Installs from Debian only the system packages that are missing.
# Usage: ensure-system-packages.sh [postgres] [chromium] [imagemagick] [fontconfig] [all]   (no argument = all)
set -euo pipefail

declare -A package_of=([postgres]=postgresql-15 [chromium]=chromium [imagemagick]=imagemagick [fontconfig]=fontconfig)

is_present() {
  case "$1" in
    postgres) compgen -G '/usr/lib/postgresql/*/bin/initdb' >/dev/null ;;
    chromium) [[ -x /usr/bin/chromium ]] ;;
    # /usr/bin on purpose: a different `convert` may come first on PATH
    imagemagick) [[ -x /usr/bin/convert ]] && /usr/bin/convert -version 2>/dev/null | grep -q ImageMagick ;;
    # its fc-list reads back the font setup that SVG text is drawn with (tests only)
    fontconfig) [[ -x /usr/bin/fc-list ]] ;;
  esac
}

wanted=()
for arg in "${@:-all}"; do
  case "$arg" in
    all) wanted+=(postgres chromium imagemagick fontconfig) ;;
    postgres | chromium | imagemagick | fontconfig) wanted+=("$arg") ;;
    *) echo "ensure-system-packages: unknown '$arg' (use postgres, chromium, imagemagick, fontconfig or all)" >&2; exit 2 ;;
  esac
done

missing=()
for tool in "${wanted[@]}"; do
  is_present "$tool" || missing+=("${package_of[$tool]}")
done
[[ ${#missing[@]} -eq 0 ]] && exit 0
mapfile -t missing < <(printf '%s\n' "${missing[@]}" | sort -u)

if [[ $(id -u) -ne 0 ]]; then
  echo "Missing system packages: ${missing[*]}" >&2
  echo "Install them with:  sudo apt-get install -y ${missing[*]}" >&2
  exit 1
fi

log=$(mktemp -t motifold-apt.XXXXXX.log)
echo "Installing system packages: ${missing[*]} (log: $log)"
export DEBIAN_FRONTEND=noninteractive
apt_options=(-y -qq -o Dpkg::Use-Pty=0 -o Dpkg::Options::=--force-confdef -o Dpkg::Options::=--force-confold)
if ! { apt-get update -qq && apt-get install "${apt_options[@]}" "${missing[@]}"; } </dev/null >"$log" 2>&1; then
  tail -n 30 "$log" >&2
  echo "Installing ${missing[*]} failed; full log in $log" >&2
  exit 1
fi

for tool in "${wanted[@]}"; do
  if ! is_present "$tool"; then
    echo "${package_of[$tool]} was installed but $tool is still not usable" >&2
    exit 1
  fi
done
rm -f "$log"
