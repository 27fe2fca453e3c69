#!/usr/bin/env bash
# End-to-end checks of `./tensio verify`: the verification record in every format, its stable JSON keys, exit
# codes, the atomic --output, and the fixtures inside the built engine jar.
# Prints one line per check and a closing "e2e-verify: N passed, N failed" line; exit 1 when any check failed.
set -u
. "$(dirname "$0")/lib.sh"

# 1. JSON record on stdout: exit 0, the stable keys, >= 40 cases, every case passed and sourced
if run json 0 -- verify --format json && py '
import json,sys,re
d=json.load(open(sys.argv[1]))
for k in "cases passed engineVersion date caution javaVersion os".split(): assert k in d, k
assert d["passed"] is True, "record passed"
assert re.fullmatch(r"\d{4}-\d\d-\d\dT\d\d:\d\d:\d\dZ", d["date"]), d["date"]
assert d["engineVersion"] and d["engineVersion"] != "unknown", d["engineVersion"]
assert d["caution"]=="Results support, not replace, a competent engineer'"'"'s review; local codes and licensed practice govern.", d["caution"]
cs=d["cases"]; assert len(cs)>=40, len(cs)
ids=set()
for c in cs:
    for k in "id quantity value reference source relativeError tolerance passed".split(): assert k in c, (c.get("id"),k)
    assert c["id"] not in ids, c["id"]; ids.add(c["id"])
    assert c["passed"] is True, c["id"]
    assert c["source"].strip(), c["id"]
    assert isinstance(c["value"],float) or isinstance(c["value"],int), c["id"]
    if c["relativeError"] is not None and c["tolerance"] is not None and c["toleranceRule"].startswith(("rel","abs")):
        assert c["relativeError"] <= c["tolerance"]*(1+1e-12), c["id"]
'; then ok "verify --format json: exit 0, stable keys, >= 40 passing cases, each with a source"; else bad "verify json" "$work/out"; fi
cp "$work/out" "$work/record.json"

# 2. the engine version is the built engine jar's Bundle-Version, and the jar ships the fixtures
jar=$(ls "$here"/bundles/org.tensio.engine/target/org.tensio.engine-*.jar 2>/dev/null | grep -v -- '-sources\|-tests' | head -1)
if [ -n "$jar" ] && python3 - "$jar" "$work/record.json" <<'PY'
import json,sys,zipfile
z=zipfile.ZipFile(sys.argv[1]); names=set(z.namelist())
for f in "closed-form rolled-section-table torsion thin-walled shear elementary-shear combined-loading unsymmetric-bending".split():
    assert "verification/%s.txt"%f in names, f
mf=z.read("META-INF/MANIFEST.MF").decode().replace("\r\n","\n").replace("\n ","")  # unwrap 72-column continuation lines
ver=[l.split(":",1)[1].strip() for l in mf.splitlines() if l.startswith("Bundle-Version:")][0]
assert json.load(open(sys.argv[2]))["engineVersion"]==ver, ver
assert "org.tensio.engine.verification" in mf
PY
then ok "engine jar ships verification/*.txt, exports the package; record names its Bundle-Version"; else bad "engine jar contents ($jar)"; fi

# 3. text (default): every case, the verdict and the caution
if run text 0 -- verify && grep -q "cases passed" "$work/out" && grep -q "^Caution: Results support" "$work/out" \
   && grep -q "engine version" "$work/out" && grep -q "source: " "$work/out"; then
  ok "verify (text): verdict, provenance, sources and caution"; else bad "verify text" "$work/out"; fi

# 4. --output writes the file atomically: replaced by a rename (new inode), stdout empty, no temporary left
out_file="$work/rec/verification.csv"; mkdir -p "$work/rec"
echo "old content" > "$out_file"; inode_before=$(stat -c %i "$out_file")
if run output 0 -- verify --format csv --output "$out_file" && [ ! -s "$work/out" ] \
   && [ "$(stat -c %i "$out_file")" != "$inode_before" ] && [ "$(ls -A "$work/rec")" = "verification.csv" ] \
   && grep -q "record written to" "$work/err" && python3 - "$out_file" "$work/record.json" <<'PY'
import csv,json,sys
rows=list(csv.reader(open(sys.argv[1],newline="",encoding="utf-8")))
n=len(json.load(open(sys.argv[2]))["cases"])
assert len(rows)==n+1, (len(rows),n)
h=rows[0]
for k in "id quantity value reference source absoluteError relativeError tolerance passed engineVersion date javaVersion os caution".split(): assert k in h, k
assert all(len(r)==len(h) for r in rows)
assert all(r[h.index("passed")]=="pass" for r in rows[1:])
PY
then ok "verify --format csv --output FILE: replaced atomically (rename), one row per case, nothing on stdout"; else bad "verify --output" "$work/err"; fi

# 5. html to a file: self-contained page with the caution at top and bottom
if run html 0 -- verify --format html --output "$work/rec/record.html" && python3 - "$work/rec/record.html" <<'PY'
import sys
s=open(sys.argv[1],encoding="utf-8").read()
assert s.startswith("<!DOCTYPE html>")
assert s.count("Caution: Results support")==2
assert "<script" not in s and "http://" not in s and "https://" not in s
assert "rolled.IPE300.It" in s and "Timoshenko" in s
PY
then ok "verify --format html: self-contained page, caution top and bottom"; else bad "verify html" "$work/err"; fi

# 6. bad usage: exit 2, one line naming the option
if run missing-dir 2 -- verify --output "$work/nope/record.json" && grep -q -- "--output" "$work/err" \
   && [ "$(wc -l < "$work/err")" -eq 1 ] && [ ! -e "$work/nope" ]; then
  ok "verify --output into a missing folder: exit 2, one line"; else bad "missing folder" "$work/err"; fi
if run bad-format 2 -- verify --format pdf && grep -q -- "--format" "$work/err" && ! grep -q "at org\." "$work/err"; then
  ok "verify --format pdf: exit 2, names the option"; else bad "bad format" "$work/err"; fi

finish e2e-verify
