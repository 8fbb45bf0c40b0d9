# Sourced by start.sh and test.sh: numbered steps, and long commands that say they are still
# working (with the time so far) instead of going silent, their output kept in a log under .data.
STEP=0
STEPS=${STEPS:-0}
STARTED=$SECONDS

# step "what" — prints "[3/7] what" and remembers when the step began.
step() {
  STEP=$((STEP + 1))
  STEP_STARTED=$SECONDS
  echo
  echo "[$STEP/$STEPS] $*"
}

# quietly LOG cmd args… — runs the command with its output in LOG; every 15 s says it is still
# running; on failure shows the end of LOG and fails; on success says how long it took.
quietly() {
  local log=$1
  shift
  "$@" >"$log" 2>&1 &
  local pid=$! waited=0
  while kill -0 "$pid" 2>/dev/null; do
    sleep 1
    waited=$((waited + 1))
    if [ $((waited % 15)) -eq 0 ] && kill -0 "$pid" 2>/dev/null; then
      echo "      … still working (${waited} s so far; output in $log)"
    fi
  done
  if ! wait "$pid"; then
    echo "      failed; the end of $log:"
    tail -n 40 "$log" | sed 's/^/      | /'
    return 1
  fi
  echo "      done in $((SECONDS - STEP_STARTED)) s"
}

# elapsed — "4 min 12 s" since the script began.
elapsed() {
  local s=$((SECONDS - STARTED))
  echo "$((s / 60)) min $((s % 60)) s"
}
