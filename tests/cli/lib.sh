# Shared by the tests/cli/e2e*.sh scripts (sourced, not run): the launcher's path, a scratch folder removed
# on exit, pass/fail counters and helpers. Each script ends with `finish NAME`.
here=$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)
tensio="$here/tensio"
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
pass=0; fail=0
ok()   { pass=$((pass+1)); echo "ok   - $1"; }
bad()  { fail=$((fail+1)); echo "FAIL - $1"; [ -n "${2:-}" ] && sed 's/^/       /' "$2" | head -20; }
skip() { echo "skip - $1"; }

# run NAME EXPECTED_EXIT -- ARGS...: stdout to $work/out, stderr to $work/err; true when the exit code is the expected one
run() {
  local name=$1 want=$2; shift 3
  "$tensio" "$@" >"$work/out" 2>"$work/err"; local got=$?
  if [ "$got" = "$want" ]; then return 0; fi
  echo "       exit $got, wanted $want: tensio $*"; head -5 "$work/err" | sed 's/^/       /'
  return 1
}

# py CODE: runs python3 CODE with $work/out as its argument
py() { python3 -c "$1" "$work/out"; }

# finish NAME: the closing line; exit status 1 when any check failed
finish() {
  echo "$1: $pass passed, $fail failed"
  [ "$fail" -eq 0 ]
}
