#!/usr/bin/env bash
# End-to-end robustness checks of the launcher: hostile and huge inputs end in exit 2 with one line naming the
# place (never a stack trace, exit 70), and a report written over an existing one leaves no temporary file.
# The SIGKILL-in-the-middle-of-a-write test is in the engine's tests (org.tensio.engine.robustness.AtomicFilesTest).
# Prints one line per check and a closing "e2e-robust: N passed, N failed" line; exit 1 when any check failed.
set -u
. "$(dirname "$0")/lib.sh"

# one_line NAME FILE PATH_FRAGMENT: `check FILE` exits 2 with exactly one line on stderr naming the fragment
one_line() {
  local name=$1 file=$2 want=$3
  if run "$name" 2 -- check "$file" && [ "$(wc -l <"$work/err")" -eq 1 ] && grep -qF -- "$want" "$work/err" \
      && ! grep -q 'Exception' "$work/err"; then
    ok "$name: exit 2, one line naming $want"
  else
    bad "$name" "$work/err"
  fi
}

head='{"tensio": 1, "materials": {"m": {"E": 210000, "nu": 0.3, "fy": 355}}, "sections": {"s": {"material": "m", "profile": {"type": "RectangleProfile", "xDim": 10, "yDim": 20}}}'

# 1. nesting 100 000 deep
python3 -c "import sys; d=100000; sys.stdout.write('$head' + ', \"name\": ' + '['*d + ']'*d + '}')" >"$work/deep.tensio.json"
one_line "deep nesting" "$work/deep.tensio.json" "nesting is deeper than 64 levels"

# 2. a file above 16 MiB
python3 -c "import sys; sys.stdout.write('$head' + ', \"description\": \"' + 'x'*(17*1024*1024) + '\"}')" >"$work/big.tensio.json"
one_line "file above 16 MiB" "$work/big.tensio.json" "more than the limit of 16777216 bytes"

# 3. a force beyond 1e30 and a combination that overflows
printf '%s, "stations": {"A": {"section": "s", "forces": {"G": {"Mx": 1e31}}}}}' "$head" >"$work/force.tensio.json"
one_line "huge force" "$work/force.tensio.json" '$.stations.A.forces.G.Mx'
printf '%s, "stations": {"A": {"section": "s", "forces": {"G": {"Mx": 1e29}}}}, "combinations": {"U": {"G": 1e300}}}' \
  "$head" >"$work/combo.tensio.json"
one_line "overflowing combination" "$work/combo.tensio.json" '$.combinations.U'

# 4. a combination naming a missing case, an unknown profile type, a self-intersecting loop
printf '%s, "stations": {"A": {"section": "s", "forces": {"G": {"N": 1}}}}, "combinations": {"U": {"Q": 1.5}}}' \
  "$head" >"$work/missing.tensio.json"
one_line "combination naming a missing case" "$work/missing.tensio.json" '$.combinations.U.Q'
sed 's/RectangleProfile/RectangularProfile/' "$work/missing.tensio.json" >"$work/type.tensio.json"
one_line "unknown profile type" "$work/type.tensio.json" '$.sections.s.profile.type'
printf '{"tensio": 1, "materials": {"m": {"E": 210000, "nu": 0.3}}, "sections": {"s": {"material": "m", "profile": {"type": "ArbitraryClosedProfile", "outer": [[0,0],[10,10],[10,0],[0,10]]}}}}' \
  >"$work/bowtie.tensio.json"
one_line "self-intersecting loop" "$work/bowtie.tensio.json" '$.sections.s.profile.outer'

# 5. a report written twice over itself: the second replaces the first, no temporary file is left
cp "$here/docs/examples/demo.tensio.json" "$work/demo.tensio.json"
if run report1 0 -- check "$work/demo.tensio.json" --report "$work/rep" && run report2 0 -- check "$work/demo.tensio.json" --report "$work/rep" \
    && [ -s "$work/rep/demo.report.html" ] && [ -s "$work/rep/demo.report.pdf" ] \
    && [ -z "$(find "$work/rep" -name '*.tmp')" ]; then
  ok "check --report twice: both files replaced, no temporary file left"
else
  bad "report twice" "$work/err"
fi

finish e2e-robust
