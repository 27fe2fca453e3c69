#!/usr/bin/env bash
# End-to-end checks of `tensio check` and `tensio envelope` on small fixtures written here (invented scenarios).
# Prints one line per check and a closing "e2e-checks: N passed, N failed" line; exit 1 when any check failed.
# Hand numbers (exact beam theory, σ = M·c/I of a rectangle; common practice, no source): a 60 wide × 20 deep
# steel bar, I = 60·20³/12 = 40 000 mm⁴, c = 10 mm: Mx = 1e6 N·mm gives 250 MPa (utilisation 250/355 = 0.70423),
# Mx = 2e6 gives 500 MPa (1.40845).
set -u
. "$(dirname "$0")/lib.sh"

# one bar, two stations; B lacks load case Q, so the combination ULS cannot be evaluated there
cat > "$work/pass.json" <<'JSON'
{"tensio": 1, "units": {"length": "mm", "force": "N"},
 "materials": {"S355": {"E": 210000, "nu": 0.3, "fy": 355}},
 "sections": {"bar": {"material": "S355", "profile": {"type": "RectangleProfile", "xDim": 60, "yDim": 20}}},
 "stations": {"A": {"section": "bar", "forces": {"G": {"Mx": 4e5}, "Q": {"Mx": 4e5}}},
              "B": {"section": "bar", "forces": {"G": {"Mx": 1e6}}}},
 "combinations": {"ULS": {"G": 1.25, "Q": 1.25}}}
JSON
# the same bar overloaded at B
sed 's/"G": {"Mx": 1e6}/"G": {"Mx": 2e6}/' "$work/pass.json" > "$work/fail.json"

# 1. all pass: exit 0, stable JSON keys, utilisation = demand / capacity, the hand number at the top fibre
if run pass-json 0 -- check "$work/pass.json" --format json && py '
import json,sys,math
d=json.load(open(sys.argv[1]))
for k in "passed maxUtilisation results units warnings caution".split(): assert k in d, k
assert d["passed"] is True
r=d["results"]; assert len(r)==4, r
for x in r:
    for k in "station case criterion utilisation demand capacity point material sigmaZ tauZX tauZY singular".split(): assert k in x, k
    assert set(x["point"])>={"x","y"}
    assert x["utilisation"]==x["demand"]/x["capacity"], x
b=[x for x in r if x["station"]=="B"]
assert len(b)==1 and b[0]["criterion"]=="vonMises" and b[0]["material"]=="S355", b
assert abs(b[0]["demand"]-250.0)<1e-9*250 and abs(b[0]["utilisation"]-250/355)<1e-12, b[0]
assert abs(abs(b[0]["point"]["y"])-10)<1e-12, b[0]["point"]
assert abs(d["maxUtilisation"]-max(x["utilisation"] for x in r))==0
assert any("ULS" in w and "B" in w for w in d["warnings"]), d["warnings"]
assert "competent engineer" in d["caution"]
'; then ok "check --format json: exit 0, stable keys, 250 MPa / 355 at the extreme fibre"; else bad "check json (pass)" "$work/out"; fi

# 2. project order: station A's cases then the combination, then B (without ULS)
if run order 0 -- check "$work/pass.json" --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
got=[(x["station"],x["case"]) for x in d["results"]]
assert got==[("A","G"),("A","Q"),("A","ULS"),("B","G")], got
u=d["results"][2]
assert abs(u["demand"]-1.25*(4e5+4e5)*10/40000)<1e-9*250, u     # 250 MPa from the combination
'; then ok "results in project order; combination = factored sum of its cases"; else bad "order" "$work/out"; fi

# 3. some utilisation > 1: exit 1
if run fail-json 1 -- check "$work/fail.json" --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
assert d["passed"] is False and abs(d["maxUtilisation"]-500/355)<1e-12, d["maxUtilisation"]
assert sum(1 for x in d["results"] if x["utilisation"]>1)==1
'; then ok "check: utilisation 1.408 > 1 exits 1"; else bad "check json (fail)" "$work/out"; fi

# 4. text: a table with the governing row marked, the verdict and the caution at the end
if run fail-text 1 -- check "$work/fail.json" && grep -q '^>.*governing' "$work/out" && grep -q '^FAIL: 1 of 4' "$work/out" \
   && tail -n 1 "$work/out" | grep -q "^Caution: results support, not replace, a competent engineer's review"; then
  ok "check text: governing row marked, FAIL verdict, caution last"; else bad "check text" "$work/out"; fi

# 5. CSV: exact header, one row per result, '#' comment lines at the end with the caution last
if run csv 1 -- check "$work/fail.json" --format csv && py '
import csv,sys
lines=open(sys.argv[1],newline="").read().splitlines()
assert lines[0]=="station,case,criterion,material,utilisation,demand,capacity,x,y", lines[0]
body=[l for l in lines[1:] if not l.startswith("#")]
rows=list(csv.reader(body)); assert len(rows)==4, rows
for r in rows: assert len(r)==9, r; float(r[4]); float(r[7])
assert rows[3][:4]==["B","G","vonMises","S355"] and abs(float(rows[3][4])-500/355)<1e-12, rows[3]
assert lines[-1].startswith("# ") and "competent engineer" in lines[-1], lines[-1]
assert all(l.startswith("#") for l in lines[1+len(body):]), "comments only at the end"
'; then ok "check --format csv: header, rows, trailing '#' caution"; else bad "csv" "$work/out"; fi

# 6. --report DIR: accepted; the exit code is still the check's
if run report 1 -- check "$work/fail.json" --report "$work/report" && grep -q "^report: " "$work/err"; then
  ok "check --report DIR: accepted, exit code from the checks ($(head -1 "$work/err"))"; else bad "report" "$work/err"; fi

# 7. composite section, each material against its own limits (needs the reader's limit keys)
cat > "$work/composite.json" <<'JSON'
{"tensio": 1, "units": {"length": "mm", "force": "N"},
 "materials": {"steel": {"E": 210000, "nu": 0.3, "fy": 355, "partialFactor": 1.1},
               "alu": {"E": 70000, "nu": 0.33, "fy": 160, "criteria": ["vonMises"], "allowable": {"equivalent": 120}}},
 "sections": {"sandwich": {"parts": [
   {"material": "steel", "profile": {"type": "RectangleProfile", "xDim": 100, "yDim": 10}, "offset": [0, -5]},
   {"material": "alu", "profile": {"type": "RectangleProfile", "xDim": 100, "yDim": 10}, "offset": [0, 5]}]}},
 "stations": {"C": {"section": "sandwich", "forces": {"M": {"Mx": 1e6}}}}}
JSON
"$tensio" check "$work/composite.json" --format json >"$work/out" 2>"$work/err"; code=$?
if [ "$code" = 2 ] && grep -q "unknown key" "$work/err"; then
  skip "composite limits: the project reader does not know the limit keys yet ($(head -c 120 "$work/err"))"
elif [ "$code" = 0 ] && py '
import json,sys
# transformed section (n = 1/3): Ixx = 325000/9 mm^4, centroid y = -2.5; steel fibre y = -10: 1e6*7.5/Ixx =
# 207.692 MPa vs 355/1.1; aluminium fibre y = +10: (1/3)*1e6*12.5/Ixx = 115.385 MPa vs the allowable 120
d=json.load(open(sys.argv[1])); I=325000/9
r={x["material"]:x for x in d["results"]}
assert abs(r["steel"]["demand"]-1e6*7.5/I)<1e-9 and abs(r["steel"]["capacity"]-355/1.1)<1e-9, r["steel"]
assert abs(r["alu"]["demand"]-1e6*12.5/(3*I))<1e-9 and r["alu"]["capacity"]==120, r["alu"]
assert abs(d["maxUtilisation"]-r["alu"]["utilisation"])==0
'; then ok "composite: each material against its own allowable"; else bad "composite (exit $code)" "$work/out"; cat "$work/err" | head -3; fi

# 8. envelope JSON: stable keys, force envelope with cases, sigmaZ extremes = the hand numbers at the top fibre
if run env-json 0 -- envelope "$work/pass.json" --station A --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
for k in "station units forces points".split(): assert k in d, k
assert d["station"]=="A"
for c in "N Vx Vy Mx My T".split():
    f=d["forces"][c]; assert set(f)>={"max","min","maxCase","minCase"}, f
assert d["forces"]["Mx"]=={"max":1e6,"min":4e5,"maxCase":"ULS","minCase":"G"}, d["forces"]["Mx"]
p=d["points"]; assert len(p)>100
for x in p:
    for k in "x y part sigmaZ tauZX tauZY vonMises tauMax".split(): assert k in x, k
    assert set(x["sigmaZ"])>={"max","min","maxCase","minCase"} and set(x["vonMises"])>={"max","maxCase"}
top=max(p,key=lambda x:x["sigmaZ"]["max"])
assert abs(top["sigmaZ"]["max"]-250)<1e-9*250 and top["sigmaZ"]["maxCase"]=="ULS" and abs(top["y"]-10)<1e-12, top
assert abs(top["vonMises"]["max"]-250)<1e-9*250
'; then ok "envelope --format json: stable keys, forces and per-point extremes with their cases"; else bad "envelope json" "$work/out"; fi

# 9. envelope text
if run env-text 0 -- envelope "$work/pass.json" --station A && grep -q "von Mises max" "$work/out" && grep -q "Caution" "$work/out"; then
  ok "envelope text"; else bad "envelope text" "$work/out"; fi

# 9b. fatigue rows of the demo: the stable keys, a fatigue object with factors, utilisation = demand / capacity
demo="$here/docs/examples/demo.tensio.json"
if run fatigue-json 0 -- check "$demo" --format json && py '
import json,sys
d=json.load(open(sys.argv[1]))
f=[x for x in d["results"] if x["criterion"] in ("fatigueGoodman","fatigueGerber","fatigueAsmeElliptic","fatigueSoderberg","firstCycleYield","langer")]
assert len(f)==12, len(f)
for x in f:
    for k in "station case criterion utilisation demand capacity point".split(): assert k in x, k
    fa=x["fatigue"]
    for k in "ka kb kc kd ke kf Se Kt Kts Kf Kfs".split(): assert k in fa["factors"], k
    assert abs(fa["n"]*x["utilisation"]-1)<1e-12, x
    assert x["utilisation"]==x["demand"]/x["capacity"], x
    assert "sensitive" in fa["caution"]
assert d["maxUtilisation"]==max(x["utilisation"] for x in d["results"])
assert {x["case"] for x in f}=={"running","start_up"}
'; then ok "check demo --format json: 12 fatigue rows with factors, n = 1/utilisation"; else bad "fatigue json" "$work/out"; fi

# 9c. stress at the check's fatigue point: the same numbers (same rules at the same point, round-off only)
cp "$work/out" "$work/check.json"
xy=$(python3 -c '
import json,sys
d=json.load(open(sys.argv[1]))
g=[x for x in d["results"] if x["station"]=="drive_shaft_sprocket" and x["case"]=="running" and x["criterion"]=="fatigueGoodman"][0]
print("%r,%r" % (g["point"]["x"], g["point"]["y"]))' "$work/check.json")
if run stress-fatigue 0 -- stress "$demo" --station drive_shaft_sprocket --case ULS --at "$xy" --format json && python3 -c '
import json,sys
s=json.load(open(sys.argv[1])); c=json.load(open(sys.argv[2]))
f=s["fatigue"]; assert f["onSurface"] is True, f
assert len(f["results"])==12, len(f["results"])
for r in f["results"]:
    m=[x for x in c["results"] if x["station"]=="drive_shaft_sprocket" and x["case"]==r["history"] and x["criterion"]==r["criterion"]][0]
    if (m["point"]["x"],m["point"]["y"])==tuple(s["point"][k] for k in "xy"):
        for k in "n sigmaA sigmaM".split(): assert abs(r["fatigue"][k]-m["fatigue"][k])<=1e-9*abs(m["fatigue"][k])+1e-12, (k,r,m)
        for k in "Se Kf Kfs".split(): assert abs(r["fatigue"]["factors"][k]-m["fatigue"]["factors"][k])<=1e-12*m["fatigue"]["factors"][k], k
    assert abs(r["utilisation"]*r["fatigue"]["n"]-1)<1e-12
assert "sensitive" in f["caution"]
' "$work/out" "$work/check.json"; then ok "stress at the fatigue governing point: fatigue object equal to check's"; else bad "stress fatigue" "$work/out"; fi
if run stress-fatigue-inside 0 -- stress "$demo" --station drive_shaft_sprocket --case ULS --at 0,0 --format json && py '
import json,sys
f=json.load(open(sys.argv[1]))["fatigue"]
assert f["onSurface"] is False and abs(f["surfaceDistance"]-30)<0.05, f["surfaceDistance"]
assert all(r["fatigue"]["factors"]["Kf"]==1 and r["fatigue"]["factors"]["Kfs"]==1 for r in f["results"])
'; then ok "stress at the shaft axis: inside, no notch factors"; else bad "stress fatigue inside" "$work/out"; fi
if run stress-fatigue-text 0 -- stress "$demo" --station drive_shaft_sprocket --case ULS --at 0,0 && grep -q "Fatigue at this point" "$work/out" && grep -q "fatigueGoodman" "$work/out"; then
  ok "stress text: fatigue block"; else bad "stress fatigue text" "$work/out"; fi

# 10-15. bad input: exit 2, one line naming the field or value, no stack trace
badcase() { # name, expected substring, args...
  local name=$1 want=$2; shift 2
  if run "$name" 2 -- "$@" && grep -q -- "$want" "$work/err" && ! grep -q "at org\.\|Exception in" "$work/err"; then
    ok "bad input: $name"; else bad "bad input: $name (wanted '$want')" "$work/err"; fi
}
printf '%s' '{"tensio":1,"materials":' > "$work/broken.json"
badcase missing-file "no such file" check "$work/nope.json"
badcase malformed-json '\$' check "$work/broken.json"
badcase bad-format "csv" check "$work/pass.json" --format xml
badcase env-unknown-station "nowhere" envelope "$work/pass.json" --station nowhere
badcase env-no-station "station" envelope "$work/pass.json"
badcase env-bad-limit "--limit" envelope "$work/pass.json" --station A --limit -3
badcase stress-bad-tolerance "--surface-tolerance" stress "$demo" --station drive_shaft_sprocket --case ULS --at 0,0 --surface-tolerance -1
python3 - "$work/pass.json" "$work/fatigue-bad.json" <<'PY'
import json,sys
d=json.load(open(sys.argv[1]))
d["fatigue"]={"materials":{"S355":{"estimate":"steel","fu":510,"surface":"polished"}},"stations":{"A":{"histories":{"h":{"rotating":"G"}}}}}
json.dump(d,open(sys.argv[2],"w"))
PY
badcase fatigue-bad-surface "fatigue.materials.S355.surface: unknown surface 'polished'" check "$work/fatigue-bad.json"

finish e2e-checks
