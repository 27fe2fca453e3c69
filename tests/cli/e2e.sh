#!/usr/bin/env bash
# End-to-end checks of the ./tensio launcher on the bundled demo and on bad input.
# Prints one line per check and a closing "N passed, N failed" line; exit 1 when any check failed.
set -u
. "$(dirname "$0")/lib.sh"
demo="$here/docs/examples/demo.tensio.json"

# 1. the demo runs and prints readable results with the caution
if run demo 0 -- demo && grep -q "von Mises" "$work/out" && grep -q "Caution" "$work/out" && grep -q "area A" "$work/out"; then
  ok "demo prints properties, stresses and the caution"; else bad "demo" "$work/out"; fi

# ids from the demo file
read -r station case section < <(python3 - "$demo" <<'PY'
import json,sys
d=json.load(open(sys.argv[1]))
st=next(iter(d["stations"])); s=d["stations"][st]
print(st, next(iter(s["forces"])), s["section"])
PY
)

# 2. properties JSON, all sections: stable keys
if run props-json 0 -- properties "$demo" --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
keys="section units area centroid Ixx Iyy Ixy I1 I2 principalAngleDeg rx ry Zx Zy J shearCentre Cw".split()
secs=d["sections"]
assert len(secs)>=2
for s in secs:
    for k in keys: assert k in s, k
    assert set(s["centroid"])>={"x","y"}
    assert s["area"]>0 and s["I1"]>=s["I2"]
'; then ok "properties --format json lists every section with the stable keys"; else bad "properties json" "$work/out"; fi

# 3. one section
if run props-one 0 -- properties "$demo" --section "$section" --format json && py '
import json,sys
d=json.load(open(sys.argv[1])); assert d["section"]=="'"$section"'", d
'; then ok "properties --section gives one object"; else bad "properties --section" "$work/out"; fi

# 4. stress JSON at the centroid of the first station
xy=$(python3 -c 'import json,sys; d=json.load(open(sys.argv[1])); print("%r,%r"%(d["centroid"]["x"],d["centroid"]["y"]))' "$work/out")
if run stress-json 0 -- stress "$demo" --station "$station" --case "$case" --at "$xy" --format json && py '
import json,sys,math
d=json.load(open(sys.argv[1]))
for k in "station case point sigmaZ tauZX tauZY sigma1 sigma2 sigma3 tauMax vonMises tresca shearMethod torsionMethod".split(): assert k in d, k
assert d["station"]=="'"$station"'" and d["case"]=="'"$case"'"
for k in "sigmaZ sigma1 sigma3 vonMises".split():
    v=d[k]; assert v is None or math.isfinite(v)
if d["sigma1"] is not None: assert d["sigma1"]>=d["sigma2"]>=d["sigma3"]
'; then ok "stress --format json has the stable keys and ordered principal stresses"; else bad "stress json" "$work/out"; fi

# 5. stress text
if run stress-text 0 -- stress "$demo" --station "$station" --case "$case" --at "$xy" && grep -q "sigmaZ" "$work/out"; then
  ok "stress text output"; else bad "stress text" "$work/out"; fi

# 5b. finite-element torsion and shear on a non-circular section: J, shear centre and Cw for every section,
#     and a stress point on the I beam under torsion with both shear methods
cat > "$work/fe.json" <<'JSON'
{"tensio": 1, "units": {"length": "mm", "force": "N"},
 "materials": {"S": {"E": 210000, "nu": 0.3, "fy": 355}},
 "sections": {"bar": {"material": "S", "profile": {"type": "RectangleProfile", "xDim": 60, "yDim": 20}}},
 "stations": {"A": {"section": "bar", "forces": {"T1": {"T": 1e5, "Vy": 1000}}}},
 "combinations": {}}
JSON
if run fe-props 0 -- properties "$work/fe.json" --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
# 60 x 20 rectangle: exact J = 126392 mm^4 (series, Timoshenko & Goodier, Theory of Elasticity, §109), within 0.1 %
j=d["J"]; assert d["torsionMethod"]=="finiteElement", d["torsionMethod"]
assert abs(j-126392.)/126392. < 1e-3, j
assert d["shearCentre"] is not None and d["Cw"] is not None
fe=d["finiteElement"]; assert fe["JStressFunction"] <= j and fe["JBracket"] < 1e-3
'; then ok "properties: finite-element J, shear centre and Cw for a rectangle"; else bad "fe properties" "$work/out"; fi
if run fe-stress 0 -- stress "$work/fe.json" --station A --case T1 --at 0,10 --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
assert d["torsionMethod"]=="finiteElement" and d["shearMethod"]=="finiteElement"
assert d["tauZX"] is not None and d["vonMises"] is not None
assert d["tauZX"] < 0   # positive T: tau_zx = -T.y/... on the top face (y > 0)
'; then ok "stress: finite-element torsion and shear at a rectangle's top fibre"; else bad "fe stress" "$work/out"; fi
if run fe-elem 0 -- stress "$work/fe.json" --station A --case T1 --at 0,0 --shear-method elementary --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
assert d["shearMethod"]=="elementary"
c=d["contributions"]["Vy"]["tauZY"]; assert abs(c-1.5*1000/1200)<1e-9, c   # 1.5 V/A
'; then ok "stress --shear-method elementary gives 1.5 V/A at a rectangle's centre"; else bad "elementary" "$work/out"; fi

# 6-11. bad input: exit 2, one clear line naming the field, no stack trace
badcase() { # name, file content or '', expected substring, args...
  local name=$1 content=$2 want=$3; shift 3
  if [ -n "$content" ]; then printf '%s' "$content" > "$work/bad.json"; fi
  if run "$name" 2 -- "$@" && grep -q -- "$want" "$work/err" && ! grep -q "at org\.\|Exception in" "$work/err"; then
    ok "bad input: $name"; else bad "bad input: $name (wanted '$want')" "$work/err"; fi
}
badcase missing-file '' "no such file" properties "$work/nope.json"
badcase negative-radius '{"tensio":1,"materials":{"S":{"E":210000,"nu":0.3}},"sections":{"s":{"material":"S","profile":{"type":"CircleProfile","radius":-5}}},"stations":{},"combinations":{}}' "radius" properties "$work/bad.json"
badcase malformed-json '{"tensio":1,"materials":' '$' properties "$work/bad.json"
badcase point-outside '' "outside" stress "$demo" --station "$station" --case "$case" --at 1e6,1e6
badcase unknown-station '' "nosuchstation" stress "$demo" --station nosuchstation --case "$case" --at 0,0
badcase unknown-case '' "nosuchcase" stress "$demo" --station "$station" --case nosuchcase --at "$xy"
badcase bad-point '' "--at" stress "$demo" --station "$station" --case "$case" --at abc
badcase unknown-type '{"tensio":1,"materials":{"S":{"E":210000,"nu":0.3}},"sections":{"s":{"material":"S","profile":{"type":"BananaProfile"}}},"stations":{},"combinations":{}}' "BananaProfile" properties "$work/bad.json"

# 12. usage error
if run usage 2 -- properties && [ -s "$work/err" ]; then ok "usage error exits 2"; else bad "usage"; fi

finish e2e
