# Sourced by start.sh and test.sh: what a fresh machine lacks. Each function is one numbered step.
# Needs scripts/steps.sh and scripts/env.sh sourced first.

# npm packages from the lock, only when node_modules is missing or older than the lock.
install_packages() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    step "installing npm packages from package-lock.json (npm ci; 1 to 4 min on a fresh machine)"
    quietly .data/npm-ci.log npm ci --no-audit --no-fund
  else
    step "npm packages: already installed"
  fi
}

# Debian's Chromium for the browser tests (never a downloaded browser).
install_chromium() {
  if [ -x /usr/bin/chromium ]; then
    step "Chromium: /usr/bin/chromium is there"
    return
  fi
  step "installing Debian's chromium (apt-get; 1 to 3 min)"
  local sudo=""
  [ "$(id -u)" -ne 0 ] && sudo="sudo"
  quietly .data/apt-chromium.log sh -c "$sudo apt-get update -qq && DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq chromium fonts-dejavu-core"
}

# The local PostgreSQL (installs Debian's postgresql the first time; db.sh does nothing when
# DATABASE_URL points at a managed database).
start_postgres() {
  step "starting PostgreSQL on 127.0.0.1:$HM_PG_PORT (installs Debian's postgresql the first time)"
  quietly .data/db-start.log bash scripts/db.sh start
}
