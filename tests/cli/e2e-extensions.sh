#!/usr/bin/env bash
# End-to-end checks of contributions outside OSGi: the example bundle's jar (examples/org.tensio.example.housekit,
# built by the reactor) handed to `./tensio` with --extensions or TENSIO_EXTENSIONS contributes a profile type,
# a criterion and a report section through java.util.ServiceLoader.
# Hand numbers (regular hexagon, six equilateral triangles; Roark's Formulas for Stress and Strain, 7th ed.,
# Table A.1, from memory): 36 across flats with a 12 bore, A = (√3/2)·36² − π·12²/4 = 1009.2716 mm².
# Prints one line per check and a closing "e2e-extensions: N passed, N failed" line; exit 1 when any check failed.
set -u
. "$(dirname "$0")/lib.sh"

kit_dir="$here/examples/org.tensio.example.housekit"
jar=$(ls "$kit_dir"/target/org.tensio.example.housekit-*.jar 2>/dev/null | grep -v -- '-sources' | head -n 1)
if [ -z "$jar" ]; then
  (cd "$here" && ./mvnw -B -q -ntp -DskipTests package -pl releng/org.tensio.target,bundles/org.tensio.engine,bundles/org.tensio.cli,bundles/org.tensio.ui,bundles/org.tensio.extensions,examples/org.tensio.example.housekit) >"$work/build" 2>&1 \
    || { bad "build the example jar" "$work/build"; echo "e2e-extensions: $pass passed, $fail failed"; exit 1; }
  jar=$(ls "$kit_dir"/target/org.tensio.example.housekit-*.jar | grep -v -- '-sources' | head -n 1)
fi
project="$kit_dir/projects/sluice-spindle.tensio.json"

# 1. without the jar the file is refused, naming the contributed name and its path (exit 2)
if run none 2 -- properties "$project" && grep -q "'houseCombined'" "$work/err" && grep -q "materials.S355.criteria\[1\]" "$work/err"; then
  ok "without --extensions: exit 2 naming materials.S355.criteria[1]"; else bad "without --extensions" "$work/err"; fi

# 2. properties with --extensions: the contributed profile's exact area
if run props 0 -- properties "$project" --format json --extensions "$jar" && py '
import json,sys,math
d=json.load(open(sys.argv[1]))
assert d["section"]=="spindle", d.get("section")
a=d["area"]; want=math.sqrt(3)/2*36**2-math.pi*12**2/4
assert abs(a-want)<1e-6*want,(a,want)
'; then ok "properties --extensions: hexagon area = closed form"; else bad "properties --extensions" "$work/out"; fi

# 3. check with TENSIO_EXTENSIONS: the house criterion is checked per case, utilisation = demand/capacity, capacity 0.9·355/1.1
if TENSIO_EXTENSIONS="$jar" run check 0 -- check "$project" --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
h=[r for r in d["results"] if r["criterion"]=="houseCombined"]
assert len(h)==2,h
for r in h:
    assert abs(r["capacity"]-0.9*355/1.1)<1e-9, r["capacity"]
    assert abs(r["utilisation"]-r["demand"]/r["capacity"])<1e-12
v={r["case"]:r["demand"] for r in d["results"] if r["criterion"]=="vonMises"}
for r in h: assert r["demand"]>=v[r["case"]]*(1-1e-9), "|s|+2t >= von Mises"
'; then ok "check with TENSIO_EXTENSIONS: houseCombined rows"; else bad "check houseCombined" "$work/out"; fi

# 4. report: the contributed sign-off section is in the HTML, before the closing lines
if run report 0 -- check "$project" --extensions "$jar" --report "$work/rep" && python3 - "$work/rep" <<'PY'
import sys,glob
h=open(glob.glob(sys.argv[1]+"/*.report.html")[0],encoding="utf-8").read()
i=h.find('id="x-signOff"'); j=h.find('id="end"')
assert i>0 and j>i,(i,j)
assert "Sign-off (QP-12)" in h and "Checked" in h
PY
then ok "report: contributed section x-signOff before the end"; else bad "report section" "$work/err"; fi

# 5. a path that is not a jar: exit 2 naming it
if run badpath 2 -- check "$project" --extensions "$work/nothing.txt" && grep -q "nothing.txt" "$work/err"; then
  ok "--extensions with a bad path: exit 2 naming it"; else bad "--extensions bad path" "$work/err"; fi

finish e2e-extensions
