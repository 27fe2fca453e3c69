#!/usr/bin/env bash
# The headless check of the materialised RCP product (`-application org.tensio.ui.results.check FILE [options]`,
# no DISPLAY) against the command line `./tensio check FILE [options]`: the same standard output and the same
# exit code (0 all pass, 1 some utilisation > 1, 2 bad input, with one `tensio: ...` line on stderr).
# Skips when the product has not been built (./run-tests builds it before running this script).
set -u
. "$(dirname "$0")/lib.sh"
product="$here/releng/org.tensio.repository/target/products/org.tensio.product/linux/gtk/x86_64"
launcher=$(ls "$product"/plugins/org.eclipse.equinox.launcher_*.jar 2>/dev/null | head -n 1)
java_cmd="${JAVA_HOME:+$JAVA_HOME/bin/}java"
demo="$here/docs/examples/demo.tensio.json"

if [ -z "$launcher" ]; then
  skip "no materialised product under ${product#"$here"/} (build it with ./mvnw verify)"
  finish e2e-headless-check
  exit $?
fi

# app NAME -- ARGS...: the product's headless check; stdout to $work/app.out, stderr to $work/app.err, exit code in $app_exit
app() {
  shift 2
  env -u DISPLAY "$java_cmd" -jar "$launcher" -nosplash -data "$work/workspace" \
      -application org.tensio.ui.results.check "$@" >"$work/app.out" 2>"$work/app.err"
  app_exit=$?
}

# same NAME EXIT -- ARGS...: both give exit EXIT and the same stdout (and, for exit 2, the same error line)
same() {
  local name=$1 want=$2; shift 3
  "$tensio" check "$@" >"$work/cli.out" 2>"$work/cli.err"; local cli_exit=$?
  app "$name" -- "$@"
  if [ "$cli_exit" != "$want" ] || [ "$app_exit" != "$want" ]; then
    bad "$name: exit codes command line $cli_exit, headless $app_exit, wanted $want" "$work/app.err"; return
  fi
  if ! cmp -s "$work/cli.out" "$work/app.out"; then
    diff "$work/cli.out" "$work/app.out" > "$work/diff"; bad "$name: standard output differs" "$work/diff"; return
  fi
  if [ "$want" = 2 ] && ! grep -qxF "$(grep '^tensio' "$work/cli.err" | head -n 1)" "$work/app.err"; then
    bad "$name: the error line differs" "$work/app.err"; return
  fi
  ok "$name: exit $want and the same output as tensio check"
}

cat > "$work/fail.json" <<'JSON'
{"tensio": 1, "units": {"length": "mm", "force": "N"},
 "materials": {"S355": {"E": 210000, "nu": 0.3, "fy": 355}},
 "sections": {"bar": {"material": "S355", "profile": {"type": "RectangleProfile", "xDim": 60, "yDim": 20}}},
 "stations": {"B": {"section": "bar", "forces": {"G": {"Mx": 2e6}}}}, "combinations": {}}
JSON
printf '{"tensio": 1, "materials": 5}' > "$work/bad.json"

same "demo, json" 0 -- "$demo" --format json
same "demo, text" 0 -- "$demo"
same "overloaded bar (500 MPa / 355), csv" 1 -- "$work/fail.json" --format csv
same "bad file" 2 -- "$work/bad.json"
same "missing file" 2 -- "$work/missing.json"
finish e2e-headless-check
