package org.tensio.cli.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TimeZone;

import org.tensio.cli.report.spi.ReportContext;
import org.tensio.cli.report.spi.ReportSection;
import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.io.AtomicFiles;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.project.Combination;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.service.EngineInfo;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;
import org.tensio.engine.units.UnitSystem;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/**
 * Writes a project's check report as one self-contained HTML file and a PDF of the same content.
 * <p>
 * The report ties itself to its input: it states the SHA-256 of the project file's bytes, the time it was made
 * (ISO 8601, UTC) and the engine's bundle version. It echoes the inputs (units, materials and their limits,
 * sections with their profile parameters, stations with the forces of every load case and combination,
 * combinations), then per section a drawing with the finite-element mesh and the exact properties, the table of
 * every check result with the governing one highlighted, and per station the contour plot of the governing case's
 * governing criterion with the stress element and Mohr's circle at the governing point, and, when the project has
 * fatigue checks, the fatigue section ({@link FatigueSection}). The caution stands at the top and at the bottom (and
 * in every PDF page footer).
 * <p>
 * Files: {@code <name>.report.html} and {@code <name>.report.pdf} in {@code dir}, where {@code <name>} is the
 * project file's name without {@code .tensio.json} (or {@code .json}); each written atomically (a temporary file in
 * {@code dir}, then ATOMIC_MOVE over the target).
 */
public final class ReportWriter {

    /** The caution every Tensio report carries. */
    public static final String CAUTION = "Results support, not replace, a competent engineer's review;"
            + " local codes and licensed practice govern.";

    private ReportWriter() {
    }

    /**
     * Writes the HTML and PDF reports.
     *
     * @param dir         output folder, created when missing
     * @param projectFile the project file {@code p} was read from (hashed, and read for its name and description)
     * @param p           the project
     * @param r           the project's check results
     * @param engine      the engine (properties and finite-element solutions, cached per section)
     * @return the HTML file
     * @throws IllegalArgumentException naming the value when {@code dir} exists and is not a folder
     * @throws IOException              when the project file cannot be read or a report cannot be written
     */
    public static Path write(Path dir, Path projectFile, Project p, CheckReport r, SectionAnalysisService engine)
            throws IOException {
        return write(dir, projectFile, p, r, engine, List.of(), Clock.systemUTC());
    }

    /**
     * As {@link #write(Path, Path, Project, CheckReport, SectionAnalysisService)}, with contributed sections
     * after the built-in ones.
     *
     * @since 0.1
     */
    public static Path write(Path dir, Path projectFile, Project p, CheckReport r, SectionAnalysisService engine,
            List<ReportSection> sections) throws IOException {
        return write(dir, projectFile, p, r, engine, sections, Clock.systemUTC());
    }

    /** As {@link #write(Path, Path, Project, CheckReport, SectionAnalysisService)} with the clock given (tests). */
    static Path write(Path dir, Path projectFile, Project p, CheckReport r, SectionAnalysisService engine, Clock clock)
            throws IOException {
        return write(dir, projectFile, p, r, engine, List.of(), clock);
    }

    static Path write(Path dir, Path projectFile, Project p, CheckReport r, SectionAnalysisService engine,
            List<ReportSection> sections, Clock clock) throws IOException {
        if (dir == null || projectFile == null || p == null || r == null || engine == null) {
            throw new IllegalArgumentException("report: folder, project file, project, check report and engine are"
                    + " all needed");
        }
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new IllegalArgumentException("--report: '" + dir + "' exists and is not a folder");
        }
        byte[] input = Files.readAllBytes(projectFile);
        Instant now = Instant.now(clock).truncatedTo(ChronoUnit.SECONDS);
        String version = EngineInfo.version();
        Meta meta = Meta.of(input, projectFile);
        Doc doc = new Builder(projectFile, p, r, engine, meta, sha256(input), now, version,
                sections == null ? List.of() : List.copyOf(sections)).build();

        String base = baseName(projectFile);
        Files.createDirectories(dir);
        Path html = dir.resolve(base + ".report.html");
        Path pdf = dir.resolve(base + ".report.pdf");
        AtomicFiles.write(html, Html.of(doc).getBytes(StandardCharsets.UTF_8));
        Calendar cal = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
        cal.setTimeInMillis(now.toEpochMilli());
        AtomicFiles.write(pdf, Pdf.of(doc, meta.name + " · " + projectFile.getFileName() + " · SHA-256 " + sha256(input)
                + " · " + now, cal, "Tensio " + version));
        return html;
    }

    /** @return the PDF written beside {@code html} by {@link #write} */
    public static Path pdfFor(Path html) {
        String n = html.getFileName().toString();
        return html.resolveSibling(n.substring(0, n.length() - ".html".length()) + ".pdf");
    }

    static String baseName(Path file) {
        String n = file.getFileName().toString();
        for (String ext : new String[] {".tensio.json", ".json"}) {
            if (n.length() > ext.length() && n.toLowerCase(java.util.Locale.ROOT).endsWith(ext)) {
                return n.substring(0, n.length() - ext.length());
            }
        }
        return n;
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /** Name and descriptions from the file itself (the project model does not keep them). */
    record Meta(String name, String description, Map<String, String> sectionDescriptions) {
        static Meta of(byte[] input, Path file) {
            String name = baseName(file), description = null;
            Map<String, String> sd = new LinkedHashMap<>();
            try {
                String text = new String(input, StandardCharsets.UTF_8);
                if (text.startsWith("\uFEFF")) {
                    text = text.substring(1);
                }
                JsonObject o = JsonParser.parseString(text).getAsJsonObject();
                if (o.has("name") && o.get("name").isJsonPrimitive()) {
                    name = o.get("name").getAsString();
                }
                if (o.has("description") && o.get("description").isJsonPrimitive()) {
                    description = o.get("description").getAsString();
                }
                if (o.has("sections") && o.get("sections").isJsonObject()) {
                    for (Map.Entry<String, JsonElement> e : o.getAsJsonObject("sections").entrySet()) {
                        if (e.getValue().isJsonObject() && e.getValue().getAsJsonObject().has("description")) {
                            sd.put(e.getKey(), e.getValue().getAsJsonObject().get("description").getAsString());
                        }
                    }
                }
            } catch (RuntimeException e) {
                // the project was read by the engine already; without name and descriptions the report still stands
            }
            return new Meta(name, description, sd);
        }
    }

    /** Assembles the report's blocks. */
    private static final class Builder {
        private final Path file;
        private final Project p;
        private final CheckReport r;
        private final SectionAnalysisService engine;
        private final Meta meta;
        private final String sha;
        private final Instant now;
        private final String version;
        private final UnitSystem u;
        private final String len, stress;
        private final Map<String, Integer> materialIndex = new LinkedHashMap<>();
        private final Doc doc;
        private final CheckResult governing;

        private final List<ReportSection> contributed;

        Builder(Path file, Project p, CheckReport r, SectionAnalysisService engine, Meta meta, String sha, Instant now,
                String version, List<ReportSection> contributed) {
            this.contributed = contributed;
            this.file = file;
            this.p = p;
            this.r = r;
            this.engine = engine;
            this.meta = meta;
            this.sha = sha;
            this.now = now;
            this.version = version;
            this.u = p.units();
            this.len = u.length();
            this.stress = u.stressUnit();
            int i = 0;
            for (String m : p.materials().keySet()) {
                materialIndex.put(m, i++);
            }
            this.doc = new Doc("Tensio report — " + meta.name());
            this.governing = max(r.results());
        }

        Doc build() {
            doc.add(new Doc.Heading(1, "Tensio report — " + meta.name(), "title"));
            doc.add(new Doc.Caution(CAUTION, "caution-top"));
            verdict();
            summary();
            inputs();
            sections();
            utilisations();
            stations();
            FatigueSection.add(doc, r, stress, len, this::at);
            ContributedSections.add(doc, contributed, new ReportContext(file, sha, now, p, r, engine));
            doc.add(new Doc.Heading(2, "End of report", "end"));
            doc.add(new Doc.Para("Input file " + file.getFileName() + ", SHA-256 " + sha + "; made " + now
                    + " by Tensio engine " + version + ".", true));
            doc.add(new Doc.Caution(CAUTION, "caution-bottom"));
            return doc;
        }

        private static CheckResult max(List<CheckResult> rs) {
            CheckResult best = null;
            for (CheckResult c : rs) {
                if (best == null || c.utilisation() > best.utilisation() || Double.isNaN(c.utilisation())) {
                    best = c;
                }
            }
            return best;
        }

        private void verdict() {
            if (r.results().isEmpty()) {
                doc.add(new Doc.Verdict(r.passed(), "No checks were made: no material of this project has limits."));
                return;
            }
            long failed = r.results().stream().filter(c -> !c.passed()).count();
            String why = "largest utilisation " + Fmt.fixed(r.maxUtilisation(), 3) + " at station " + governing.station()
                    + ", case " + governing.caseId() + ", criterion " + governing.criterion();
            doc.add(new Doc.Verdict(r.passed(), r.passed() ? "PASSED: all " + r.results().size()
                    + " checks have utilisation ≤ 1; " + why + "." : "FAILED: " + failed + " of " + r.results().size()
                            + " checks have utilisation > 1; " + why + "."));
        }

        private void summary() {
            Doc.TableBuilder t = new Doc.TableBuilder("report-facts", "facts", null, null);
            t.row("project", "", Doc.Cell.text("Project"), Doc.Cell.text(meta.name()));
            if (meta.description() != null) {
                t.row("description", "", Doc.Cell.text("Description"), Doc.Cell.text(meta.description()));
            }
            t.row("file", "", Doc.Cell.text("Input file"), Doc.Cell.text(file.getFileName().toString()));
            t.row("sha256", "", Doc.Cell.text("SHA-256 of the input file's bytes"), Doc.Cell.mono(sha));
            t.row("date", "", Doc.Cell.text("Made (UTC)"), Doc.Cell.mono(now.toString()));
            t.row("engine", "", Doc.Cell.text("Engine version"), Doc.Cell.mono(version));
            t.row("units", "", Doc.Cell.text("Units"), Doc.Cell.text("length " + len + ", force " + u.force()
                    + ", stress " + stress + ", moment " + u.momentUnit()));
            t.row("checks", "", Doc.Cell.text("Checks"), Doc.Cell.num(Integer.toString(r.results().size()),
                    (double) r.results().size()));
            t.row("maxUtilisation", "", Doc.Cell.text("Largest utilisation"), Doc.Cell.num(Fmt.fixed(r.maxUtilisation(),
                    3), r.maxUtilisation()));
            doc.add(t.build());
            if (!r.warnings().isEmpty()) {
                doc.add(new Doc.Heading(3, "Warnings", "warnings"));
                for (String w : r.warnings()) {
                    doc.add(new Doc.Para("• " + w, false));
                }
            }
        }

        private void inputs() {
            doc.add(new Doc.Heading(2, "Inputs", "inputs"));
            doc.add(new Doc.Para("Units: length " + len + ", force " + u.force() + "; stresses in " + stress
                    + ", moments in " + u.momentUnit() + ". No conversion: every number is in these units.", false));
            Doc.TableBuilder m = new Doc.TableBuilder("materials", "materials", null, "Materials", "Material",
                    "E (" + stress + ")", "ν", "G (" + stress + ")", "fy (" + stress + ")");
            for (Material mat : p.materials().values()) {
                m.row(mat.name(), "", Doc.Cell.text(mat.name()), num(mat.e(), 6), num(mat.nu(), 4),
                        num(mat.shearModulus(), 6), num(mat.fy(), 5));
            }
            doc.add(m.build());
            Doc.TableBuilder l = new Doc.TableBuilder("limits", "limits", null, "Material limits (what each material"
                    + " is checked against)", "Material", "Criteria", "γ", "fy", "fu", "allow. normal",
                    "allow. shear", "allow. equivalent", "Capacity by criterion (" + stress + ")");
            for (String id : p.materials().keySet()) {
                MaterialLimits ml = p.limits().get(id);
                if (ml == null) {
                    l.row(id, "", Doc.Cell.text(id), Doc.Cell.text("not checked"), Doc.Cell.text(""),
                            Doc.Cell.text(""), Doc.Cell.text(""), Doc.Cell.text(""), Doc.Cell.text(""),
                            Doc.Cell.text(""), Doc.Cell.text(""));
                    continue;
                }
                StringBuilder crit = new StringBuilder(), cap = new StringBuilder();
                for (Criterion c : ml.criteria()) {
                    crit.append(crit.length() == 0 ? "" : ", ").append(c.name());
                    cap.append(cap.length() == 0 ? "" : "; ").append(c.name()).append(' ')
                            .append(Fmt.sig(ml.capacity(c), 5));
                }
                l.row(id, "", Doc.Cell.text(id), Doc.Cell.text(crit.toString()), num(ml.partialFactor(), 4),
                        num(ml.yieldStrength(), 5), num(ml.ultimateStrength(), 5), num(ml.allowableNormal(), 5),
                        num(ml.allowableShear(), 5), num(ml.allowableEquivalent(), 5), Doc.Cell.text(cap.toString()));
            }
            doc.add(l.build());

            Doc.TableBuilder s = new Doc.TableBuilder("section-inputs", "section-inputs", null, "Sections and their"
                    + " profiles (parameters in " + len + ")", "Section", "Part", "Material", "Profile",
                    "Parameters", "Offset (dx, dy)");
            for (Section sec : p.sections().values()) {
                int k = 1;
                for (SectionPart part : sec.parts()) {
                    s.row(sec.name() + "/" + k, "", Doc.Cell.text(sec.name()), Doc.Cell.num(Integer.toString(k),
                            (double) k), Doc.Cell.text(part.material().name()), Doc.Cell.text(part.profile().type()),
                            Doc.Cell.text(parameters(part)), Doc.Cell.text(Fmt.point(part.offsetX(), part.offsetY())));
                    k++;
                }
            }
            doc.add(s.build());

            String f = u.force(), mu = u.momentUnit();
            Doc.TableBuilder st = new Doc.TableBuilder("station-inputs", "station-inputs", null, "Stations and their"
                    + " internal forces (load cases as given; combinations as the engine resolves them)", "Station",
                    "Section", "Case", "N (" + f + ")", "Vx (" + f + ")", "Vy (" + f + ")", "Mx (" + mu + ")",
                    "My (" + mu + ")", "T (" + mu + ")");
            for (Station sta : p.stations().values()) {
                List<String> cases = new ArrayList<>(sta.cases().keySet());
                for (String c : p.combinations().keySet()) {
                    if (!cases.contains(c)) {
                        cases.add(c);
                    }
                }
                for (String c : cases) {
                    InternalForces fo;
                    try {
                        fo = p.forces(sta.id(), c);
                    } catch (IllegalArgumentException e) {
                        continue;
                    }
                    boolean combo = !sta.cases().containsKey(c);
                    st.row(sta.id() + "/" + c, "", Doc.Cell.text(sta.id()), Doc.Cell.text(sta.sectionId()),
                            Doc.Cell.text(c + (combo ? " (combination)" : "")), num(fo.n(), 6), num(fo.vx(), 6),
                            num(fo.vy(), 6), num(fo.mx(), 6), num(fo.my(), 6), num(fo.t(), 6));
                }
            }
            doc.add(st.build());

            if (!p.combinations().isEmpty()) {
                Doc.TableBuilder cb = new Doc.TableBuilder("combinations", "combinations", null, "Combinations",
                        "Combination", "Definition");
                for (Combination c : p.combinations().values()) {
                    StringBuilder d = new StringBuilder();
                    for (Map.Entry<String, Double> e : c.factors().entrySet()) {
                        d.append(d.length() == 0 ? "" : " + ").append(Fmt.sig(e.getValue(), 6)).append(" × ")
                                .append(e.getKey());
                    }
                    cb.row(c.id(), "", Doc.Cell.text(c.id()), Doc.Cell.text(d.toString()));
                }
                doc.add(cb.build());
            }
        }

        private String parameters(SectionPart part) {
            Map<String, Double> ps = part.profile().parameters();
            if (!ps.isEmpty()) {
                StringBuilder b = new StringBuilder();
                for (Map.Entry<String, Double> e : ps.entrySet()) {
                    b.append(b.length() == 0 ? "" : ", ").append(e.getKey()).append(" = ").append(Fmt.sig(e.getValue(), 6));
                }
                return b.toString();
            }
            List<Contour> cs = part.region().contours();
            int segs = 0, arcs = 0;
            for (Contour c : cs) {
                for (Segment sg : c.segments()) {
                    segs++;
                    if (sg instanceof ArcSegment) {
                        arcs++;
                    }
                }
            }
            return "outline of " + cs.get(0).segments().size() + " edges" + (cs.size() > 1 ? ", " + (cs.size() - 1)
                    + (cs.size() == 2 ? " void" : " voids") : "") + "; " + segs + " edges in all, " + arcs + " of them arcs";
        }

        private void sections() {
            doc.add(new Doc.Heading(2, "Sections", "sections"));
            doc.add(new Doc.Para("Exact properties by boundary integration (arcs kept as arcs); J, shear centre and Cw"
                    + " from the closed forms for circles and tubes and from the finite-element solution otherwise."
                    + " Composite sections: E-weighted, transformed to the reference material (first part).", true));
            for (Section s : p.sections().values()) {
                doc.add(new Doc.Heading(3, "Section " + s.name(), "section-" + s.name()));
                String d = meta.sectionDescriptions().get(s.name());
                if (d != null) {
                    doc.add(new Doc.Para(d, false));
                }
                SectionProperties pr = engine.properties(s);
                Mesh mesh = null;
                String meshNote = null;
                try {
                    mesh = engine.solution(s).mesh();
                } catch (RuntimeException e) {
                    meshNote = "no finite-element mesh: " + e.getMessage();
                }
                doc.add(new Doc.Figures(List.of(new Doc.Figure(SectionDrawing.of(s, pr, mesh, materialIndex, len),
                        "section-drawing", "Section " + s.name() + " in its own frame (x along the width, y along the"
                                + " depth, z towards the viewer); " + (mesh != null ? "mesh of six-node triangles used"
                                        + " for torsion, shear and the contour plots." : meshNote)))));
                doc.add(properties(s, pr));
            }
        }

        private Doc.Table properties(Section s, SectionProperties pr) {
            String l2 = len + "²", l3 = len + "³", l4 = len + "⁴", l6 = len + "⁶";
            Doc.TableBuilder t = new Doc.TableBuilder("properties-" + s.name(), "properties", s.name(),
                    "Properties of " + s.name() + (pr.composite() ? " (E-weighted, reference material "
                            + pr.referenceMaterial() + ")" : ""), "Property", "Value", "Unit");
            kv(t, "area", "Area A", pr.area(), l2);
            kv(t, "centroidX", "Centroid xc", pr.centroid().x(), len);
            kv(t, "centroidY", "Centroid yc", pr.centroid().y(), len);
            kv(t, "ixx", "Ixx (about the centroidal x axis)", pr.ixx(), l4);
            kv(t, "iyy", "Iyy (about the centroidal y axis)", pr.iyy(), l4);
            kv(t, "ixy", "Ixy", pr.ixy(), l4);
            kv(t, "i1", "I1 (major principal)", pr.i1(), l4);
            kv(t, "i2", "I2 (minor principal)", pr.i2(), l4);
            t.kv("principalAngle", "Angle of axis 1 from +x", Fmt.fixed(pr.principalAngleDeg(), 3), pr.principalAngleDeg(),
                    "°");
            kv(t, "rx", "Radius of gyration rx", pr.rx(), len);
            kv(t, "ry", "Radius of gyration ry", pr.ry(), len);
            kv(t, "sxTop", "Elastic modulus Sx, top fibre", pr.sxTop(), l3);
            kv(t, "sxBottom", "Elastic modulus Sx, bottom fibre", pr.sxBottom(), l3);
            kv(t, "syRight", "Elastic modulus Sy, right fibre", pr.syRight(), l3);
            kv(t, "syLeft", "Elastic modulus Sy, left fibre", pr.syLeft(), l3);
            kv(t, "zx", "Plastic modulus Zx", pr.zx(), l3);
            kv(t, "zy", "Plastic modulus Zy", pr.zy(), l3);
            kv(t, "j", "Torsion constant J", pr.j(), l4);
            kv(t, "shearCentreX", "Shear centre xs", pr.shearCentre() == null ? null : pr.shearCentre().x(), len);
            kv(t, "shearCentreY", "Shear centre ys", pr.shearCentre() == null ? null : pr.shearCentre().y(), len);
            kv(t, "cw", "Warping constant Cw", pr.cw(), l6);
            t.row("torsionSource", "", Doc.Cell.text("J, shear centre and Cw from"),
                    Doc.Cell.text(pr.torsionSource() == null ? "not computed" : pr.torsionSource()), Doc.Cell.text(""));
            return t.build();
        }

        private static void kv(Doc.TableBuilder t, String key, String label, Double v, String unit) {
            t.kv(key, label, Fmt.sig(v, 6), v, unit);
        }

        private static Doc.Cell num(Double v, int sig) {
            return Doc.Cell.num(Fmt.sig(v, sig), v);
        }

        private void utilisations() {
            doc.add(new Doc.Heading(2, "Utilisation", "utilisation"));
            if (r.results().isEmpty()) {
                doc.add(new Doc.Para("No check results.", false));
                return;
            }
            doc.add(new Doc.Para("Every check: the governing point of each station, case (or combination) and"
                    + " criterion. Utilisation = demand / capacity; a check passes when it is ≤ 1. The governing row"
                    + " (largest utilisation) is highlighted.", true));
            Doc.TableBuilder t = new Doc.TableBuilder("utilisation", "utilisation", null, null, "Station", "Case",
                    "Criterion", "Material", "Point (x, y) " + len, "σz", "τzx", "τzy", "Demand (" + stress + ")",
                    "Capacity (" + stress + ")", "Utilisation", "Result");
            int i = 0;
            for (CheckResult c : r.results()) {
                String style = (c == governing ? "governing" : "") + (c.passed() ? "" : (c == governing ? " " : "") + "fail");
                t.row(Integer.toString(i++), style, Doc.Cell.text(c.station()), Doc.Cell.text(c.caseId()),
                        Doc.Cell.text(c.criterion()), Doc.Cell.text(c.material()),
                        Doc.Cell.text(at(c) + (c.singular() ? " (sharp corner)" : "")),
                        num(c.sigmaZ(), 5), num(c.tauZX(), 5), num(c.tauZY(), 5), num(c.demand(), 5), num(c.capacity(), 5),
                        Doc.Cell.num(Fmt.fixed(c.utilisation(), 3), c.utilisation()),
                        Doc.Cell.text(c.passed() ? "pass" : "FAIL"));
            }
            doc.add(t.build());
            if (r.results().stream().anyMatch(CheckResult::singular)) {
                doc.add(new Doc.Para("(sharp corner): the point lies at a sharp re-entrant corner, where the elastic"
                        + " shear stress is singular and the value depends on the mesh; model the fillet.", true));
            }
        }

        private void stations() {
            doc.add(new Doc.Heading(2, "Stations", "stations"));
            for (Station st : p.stations().values()) {
                doc.add(new Doc.Heading(3, "Station " + st.id() + " (section " + st.sectionId() + ")", "station-"
                        + st.id()));
                CheckResult g = max(r.results().stream().filter(c -> c.station().equals(st.id()) && !c.isFatigue())
                        .toList());
                if (g == null) {
                    boolean fatigue = r.results().stream().anyMatch(c -> c.station().equals(st.id()) && c.isFatigue());
                    doc.add(new Doc.Para(fatigue ? "No static check (no load cases or no limits); see the fatigue"
                            + " section." : "Not checked (no limits for its material): no governing case to plot.", false));
                    continue;
                }
                doc.add(new Doc.Para("Governing: case " + g.caseId() + ", criterion " + g.criterion() + ", material "
                        + g.material() + ", utilisation " + Fmt.fixed(g.utilisation(), 3) + " (demand "
                        + Fmt.sig(g.demand(), 5) + " of capacity " + Fmt.sig(g.capacity(), 5) + " " + stress + ") at "
                        + at(g) + " " + len + ".", false));
                Criterion crit = criterion(g.criterion());
                String quantity = (crit == null ? Criterion.vonMises : crit).name() + " demand";
                Section s = p.section(st.sectionId());
                try {
                    FiniteElementSolution fe = engine.solution(s);
                    SectionProperties pr = engine.properties(s);
                    NodalField field = NodalField.of(s, pr, fe, p.forces(st.id(), g.caseId()), crit);
                    doc.add(new Doc.Figures(List.of(new Doc.Figure(ContourDrawing.of(s, field, quantity, stress,
                            g.caseId(), g.point(), g.capacity()), "contour", "Station " + st.id() + ": " + quantity
                                    + " at the mesh nodes for the governing case " + g.caseId() + "; capacity of material "
                                    + g.material() + " " + Fmt.sig(g.capacity(), 5) + " " + stress + "."))));
                } catch (RuntimeException e) {
                    doc.add(new Doc.Para("No contour plot: " + e.getMessage(), true));
                }
                StressComponents sc = new StressComponents(g.sigmaZ(), g.tauZX(), g.tauZY());
                doc.add(new Doc.Figures(List.of(
                        new Doc.Figure(PointDrawings.element(sc, stress), "stress-element", "Stress element at G on"
                                + " the plane of z and the shear direction t."),
                        new Doc.Figure(PointDrawings.mohr(sc, stress), "mohr", "Mohr's circle at G: τ plotted upward"
                                + " as it acts along +t on the z face; dashed, the circles through σ2 = 0."))));
                PrincipalStresses ps = PrincipalStresses.of(sc);
                Doc.TableBuilder t = new Doc.TableBuilder("point-" + st.id(), "governing-point", st.id(),
                        "Stress state at G (" + stress + ")", "σz", "τzx", "τzy", "τ", "σ1", "σ3", "τmax", "von Mises",
                        "Tresca", "Utilisation");
                t.row("G", "", num(g.sigmaZ(), 5), num(g.tauZX(), 5), num(g.tauZY(), 5), num(sc.tauResultant(), 5),
                        num(ps.sigma1(), 5), num(ps.sigma3(), 5), num(ps.tauMax(), 5), num(ps.vonMises(), 5),
                        num(ps.tresca(), 5), Doc.Cell.num(Fmt.fixed(g.utilisation(), 3), g.utilisation()));
                doc.add(t.build());
            }
        }

        /**
         * @return the result's point; coordinates below 1e-9 of the section's size shown as 0 (mesh round-off of
         *         points that lie on an axis)
         */
        private String at(CheckResult c) {
            if (c.point() == null) {
                return "—";
            }
            double tiny = 1e-9;
            try {
                tiny *= p.section(p.station(c.station()).sectionId()).bounds().diagonal();
            } catch (IllegalArgumentException e) {
                // a result for a station the project does not have: show the raw numbers
                tiny = 0;
            }
            return Fmt.point(SectionDrawing.snap(c.point().x(), tiny), SectionDrawing.snap(c.point().y(), tiny));
        }

        private static Criterion criterion(String name) {
            for (Criterion c : Criterion.values()) {
                if (c.name().equals(name)) {
                    return c;
                }
            }
            return null;
        }
    }
}
