#!/usr/bin/env bash
# local-containers.sh - podman and a Debian base image for the container test, from Debian's
# packages only (CI machines reach no container registry).
#
# Usage: local-containers.sh [install|base]
#   install   apt-get install podman runc debootstrap (no recommends)
#   base      build the base image localhost/fatefield-base:bookworm: a minimal Debian 12 with a
#             Java 17 runtime, made by debootstrap from deb.debian.org and imported into podman
#             (skipped when the image is already there)
#
# Podman reads .ci/containers.conf through CONTAINERS_CONF (set it before calling; .ci/run does).
# The test (ContainerClusterIT) builds scenarios/container/Dockerfile on this base
# (FATEFIELD_CONTAINER_BASE) and runs a sweep from the image on the local SLURM cluster.
set -euo pipefail

IMAGE=localhost/fatefield-base:bookworm
ROOTFS=${FATEFIELD_ROOTFS:-/var/tmp/fatefield-rootfs}
PKGS=(podman runc debootstrap)

log() { printf '[%s] %s\n' "$(date +%H:%M:%S)" "$*" >&2; }
die() { log "ERROR: $*"; exit 1; }

do_install() {
  local missing=()
  for p in "${PKGS[@]}"; do
    dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q 'install ok installed' || missing+=("$p")
  done
  if [ ${#missing[@]} -eq 0 ]; then log "packages already installed"; return 0; fi
  log "installing ${missing[*]}"
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

do_base() {
  [ -n "${CONTAINERS_CONF:-}" ] || die "set CONTAINERS_CONF to .ci/containers.conf first"
  if podman image exists "$IMAGE"; then log "$IMAGE already there"; return 0; fi
  local t0; t0=$(date +%s)
  rm -rf "$ROOTFS"
  debootstrap --variant=minbase --include=openjdk-17-jre-headless bookworm "$ROOTFS" http://deb.debian.org/debian \
    >/tmp/fatefield-debootstrap.log 2>&1 || { tail -20 /tmp/fatefield-debootstrap.log >&2; die "debootstrap failed"; }
  tar -C "$ROOTFS" -c . | podman import --change 'CMD ["/bin/sh"]' - "$IMAGE" >/dev/null 2>>/tmp/fatefield-debootstrap.log
  rm -rf "$ROOTFS"
  local version
  version=$(podman run --rm --network=none "$IMAGE" java -version 2>&1) || die "the base image does not run: $version"
  log "${version%%$'\n'*}"
  log "$IMAGE built in $(( $(date +%s) - t0 )) s"
}

[ "$(id -u)" -eq 0 ] || die "must run as root"
case "${1:-}" in
  install) do_install ;; base) do_base ;;
  *) die "usage: $0 [install|base]" ;;
esac
