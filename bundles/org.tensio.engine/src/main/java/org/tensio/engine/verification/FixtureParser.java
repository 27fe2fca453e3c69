package org.tensio.engine.verification;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.tensio.engine.geometry.ArcSegment;
import org.tensio.engine.geometry.Contour;
import org.tensio.engine.geometry.LineSegment;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.geometry.Segment;
import org.tensio.engine.profile.ArbitraryClosedProfile;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.profile.ProfileTypes;
import org.tensio.engine.section.Material;
import org.tensio.engine.section.Section;
import org.tensio.engine.section.SectionPart;
import org.tensio.engine.section.SectionValidator;

/**
 * Reads one verification fixture. Line by line ({@code #} starts a comment line, blank lines are skipped):
 *
 * <pre>
 * family NAME                         the family of the cases below (default: the file name without .txt)
 * let NAME = EXPR                     a number for the lines below ({@link Expr}: + - * / ^, pi, sqrt, ...)
 * text NAME = TEXT                    a text, quoted as {NAME} in the last two columns of a case
 * material NAME E=EXPR nu=EXPR [fy=EXPR]   (predefined: steel, E = 210000 MPa, ν = 0.3, fy = 355 MPa)
 * section NAME = SHAPE [at=X,Y] [material=NAME]
 *     SHAPE: a ProfileTypes type and its IFC4 parameters, e.g. RectangleProfile xDim=120 yDim=300
 *            (placed by at=X,Y, default 0,0), or contour X,Y X,Y ... (coordinates as given; a point
 *            written ~X,Y makes the edge from the previous point to the next an arc through it)
 *     expressions inside SHAPE contain no blanks
 * case ID | SECTION | QUANTITY | REFERENCE | TOLERANCE | WHY THIS TOLERANCE | SOURCE
 *     QUANTITY: see {@link Quantity}; REFERENCE: an expression; TOLERANCE: rel EXPR | abs EXPR | upper EXPR |
 *     lower EXPR (see {@link Tolerance})
 * </pre>
 *
 * Sections are validated ({@link SectionValidator}) when defined. Every error is an
 * {@link IllegalStateException} naming the fixture, the line and what is wrong: the fixtures ship with the
 * engine, so a bad one is a defect, not bad user input.
 */
final class FixtureParser {

    /** A parsed case with the section instance it is computed on and its compiled quantity. */
    record Compiled(VerificationCase definition, Section section, Quantity quantity) {
    }

    /** Structural steel, E = 210 000 MPa, ν = 0.3 (EN 1993-1-1 §3.2.6), fy = 355 MPa (S355). */
    static final Material STEEL = new Material("steel", 210_000, 0.3, 355.0);

    private static final Pattern NAME = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9_][A-Za-z0-9_.\\-]*");
    private static final Pattern TEXT_REF = Pattern.compile("\\{([A-Za-z_][A-Za-z0-9_]*)\\}");

    private final String fixture;
    private String family;
    private final Map<String, Double> vars = new LinkedHashMap<>();
    private final Map<String, String> texts = new LinkedHashMap<>();
    private final Map<String, Material> materials = new LinkedHashMap<>();
    private final Map<String, Section> sections = new LinkedHashMap<>();
    private final Map<String, String> sectionDefinitions = new LinkedHashMap<>();
    private final List<Compiled> cases = new ArrayList<>();
    private int line;

    private FixtureParser(String fixture) {
        this.fixture = fixture;
        String base = fixture.substring(fixture.lastIndexOf('/') + 1);
        this.family = base.endsWith(".txt") ? base.substring(0, base.length() - 4) : base;
        materials.put(STEEL.name(), STEEL);
    }

    /**
     * @param fixture its resource name, for the record and for messages
     * @param text    its content
     * @return the cases in file order
     * @throws IllegalStateException naming the fixture and line of the first error
     */
    static List<Compiled> parse(String fixture, String text) {
        FixtureParser p = new FixtureParser(fixture);
        String[] lines = text.split("\r?\n", -1);
        for (int i = 0; i < lines.length; i++) {
            p.line = i + 1;
            String l = lines[i].strip();
            if (l.isEmpty() || l.startsWith("#")) {
                continue;
            }
            try {
                p.directive(l);
            } catch (IllegalArgumentException | IllegalStateException e) {
                throw new IllegalStateException(fixture + ":" + p.line + ": " + e.getMessage(), e);
            }
        }
        return List.copyOf(p.cases);
    }

    private void directive(String l) {
        int sp = l.indexOf(' ');
        String keyword = sp < 0 ? l : l.substring(0, sp);
        String rest = sp < 0 ? "" : l.substring(sp + 1).strip();
        switch (keyword) {
            case "family" -> {
                if (!ID.matcher(rest).matches()) {
                    throw new IllegalArgumentException("family: '" + rest + "' is not a name (letters, digits, . _ -)");
                }
                family = rest;
            }
            case "let" -> {
                String[] kv = assignment(rest, "let");
                vars.put(kv[0], Expr.eval(kv[1], vars));
            }
            case "text" -> {
                String[] kv = assignment(rest, "text");
                texts.put(kv[0], kv[1]);
            }
            case "material" -> material(rest);
            case "section" -> section(rest);
            case "case" -> caseLine(rest);
            default -> throw new IllegalArgumentException("unknown directive '" + keyword
                    + "' (use family, let, text, material, section or case)");
        }
    }

    private String[] assignment(String rest, String what) {
        int eq = rest.indexOf('=');
        if (eq < 0) {
            throw new IllegalArgumentException(what + ": 'NAME = VALUE' expected, got '" + rest + "'");
        }
        String n = name(rest.substring(0, eq).strip(), what);
        String v = rest.substring(eq + 1).strip();
        if (v.isEmpty()) {
            throw new IllegalArgumentException(what + " " + n + ": empty value");
        }
        return new String[] {n, v};
    }

    private static String name(String s, String what) {
        if (!NAME.matcher(s).matches()) {
            throw new IllegalArgumentException(what + ": '" + s + "' is not a name (letters, digits, _)");
        }
        return s;
    }

    private void material(String rest) {
        String[] tok = rest.split("\\s+");
        String n = name(tok[0], "material");
        Map<String, Double> kv = new LinkedHashMap<>();
        for (int i = 1; i < tok.length; i++) {
            String[] p = keyValue(tok[i], "material " + n);
            if (!List.of("E", "nu", "fy").contains(p[0])) {
                throw new IllegalArgumentException("material " + n + ": unknown key '" + p[0] + "' (use E, nu, fy)");
            }
            kv.put(p[0], Expr.eval(p[1], vars));
        }
        if (!kv.containsKey("E") || !kv.containsKey("nu")) {
            throw new IllegalArgumentException("material " + n + ": needs E= and nu=");
        }
        materials.put(n, new Material(n, kv.get("E"), kv.get("nu"), kv.get("fy")));
    }

    private static String[] keyValue(String token, String where) {
        int eq = token.indexOf('=');
        if (eq <= 0 || eq == token.length() - 1) {
            throw new IllegalArgumentException(where + ": 'key=value' expected, got '" + token + "'");
        }
        return new String[] {token.substring(0, eq), token.substring(eq + 1)};
    }

    private void section(String rest) {
        String[] nv = assignment(rest, "section");
        String n = nv[0];
        if (sections.containsKey(n)) {
            throw new IllegalArgumentException("section " + n + ": defined twice");
        }
        String[] tok = nv[1].split("\\s+");
        String type = tok[0];
        double atX = 0, atY = 0;
        Material material = STEEL;
        Map<String, Double> params = new LinkedHashMap<>();
        List<String> points = new ArrayList<>();
        for (int i = 1; i < tok.length; i++) {
            String t = tok[i];
            if (t.startsWith("at=")) {
                List<String> xy = Expr.splitTopLevel(t.substring(3), ',');
                if (xy.size() != 2) {
                    throw new IllegalArgumentException("section " + n + ": at=X,Y expected, got '" + t + "'");
                }
                atX = Expr.eval(xy.get(0), vars);
                atY = Expr.eval(xy.get(1), vars);
            } else if (t.startsWith("material=")) {
                material = materials.get(t.substring(9));
                if (material == null) {
                    throw new IllegalArgumentException("section " + n + ": unknown material '" + t.substring(9)
                            + "' (have " + materials.keySet() + ")");
                }
            } else if (type.equals("contour")) {
                points.add(t);
            } else {
                String[] kv = keyValue(t, "section " + n);
                params.put(kv[0], Expr.eval(kv[1], vars));
            }
        }
        ProfileDef profile = type.equals("contour") ? new ArbitraryClosedProfile(contour(n, points))
                : ProfileTypes.create(type, params);
        Section s = new Section(n, List.of(SectionPart.of(profile, atX, atY, material)));
        SectionValidator.validate(s);
        sections.put(n, s);
        sectionDefinitions.put(n, nv[1]);
    }

    private Contour contour(String n, List<String> tokens) {
        List<Point2> pts = new ArrayList<>();
        List<Boolean> via = new ArrayList<>();
        for (String t : tokens) {
            boolean arc = t.startsWith("~");
            List<String> xy = Expr.splitTopLevel(arc ? t.substring(1) : t, ',');
            if (xy.size() != 2) {
                throw new IllegalArgumentException("section " + n + ": point X,Y expected, got '" + t + "'");
            }
            pts.add(new Point2(Expr.eval(xy.get(0), vars), Expr.eval(xy.get(1), vars)));
            via.add(arc);
        }
        if (pts.size() < 3 || via.get(0)) {
            throw new IllegalArgumentException("section " + n + ": a contour needs at least three points and must"
                    + " start with a corner, not an arc point");
        }
        List<Segment> segs = new ArrayList<>();
        int i = 0;
        while (i < pts.size()) {
            Point2 a = pts.get(i);
            int j = i + 1;
            if (j < pts.size() && via.get(j)) {
                if (j + 1 < pts.size() && via.get(j + 1)) {
                    throw new IllegalArgumentException("section " + n + ": two arc points in a row");
                }
                Point2 end = j + 1 < pts.size() ? pts.get(j + 1) : pts.get(0);
                segs.add(ArcSegment.through(a, pts.get(j), end));
                i = j + 1;
            } else {
                segs.add(new LineSegment(a, j < pts.size() ? pts.get(j) : pts.get(0)));
                i = j;
            }
        }
        return new Contour(segs);
    }

    private void caseLine(String rest) {
        List<String> col = new ArrayList<>();
        for (String c : rest.split("\\|", -1)) {
            col.add(c.strip());
        }
        if (col.size() != 7) {
            throw new IllegalArgumentException("case: 7 columns expected (ID | SECTION | QUANTITY | REFERENCE |"
                    + " TOLERANCE | WHY THIS TOLERANCE | SOURCE), got " + col.size());
        }
        String id = col.get(0);
        if (!ID.matcher(id).matches()) {
            throw new IllegalArgumentException("case: '" + id + "' is not an id (letters, digits, . _ -)");
        }
        Section s = sections.get(col.get(1));
        if (s == null) {
            throw new IllegalArgumentException("case " + id + ": unknown section '" + col.get(1) + "' (have "
                    + sections.keySet() + ")");
        }
        Quantity q = Quantity.parse(col.get(2), vars);
        double reference = Expr.eval(col.get(3), vars);
        Tolerance tol = tolerance(id, col.get(4));
        String why = substitute(id, col.get(5));
        String source = substitute(id, col.get(6));
        VerificationCase c = new VerificationCase(id, family, fixture, line, col.get(1),
                sectionDefinitions.get(col.get(1)), col.get(2), q.description, q.unit, col.get(3), reference, tol, why,
                source);
        cases.add(new Compiled(c, s, q));
    }

    private Tolerance tolerance(String id, String t) {
        int sp = t.indexOf(' ');
        if (sp < 0) {
            throw new IllegalArgumentException("case " + id + ": tolerance 'rel|abs|upper|lower EXPR' expected, got '"
                    + t + "'");
        }
        Tolerance.Kind kind = switch (t.substring(0, sp)) {
            case "rel" -> Tolerance.Kind.relative;
            case "abs" -> Tolerance.Kind.absolute;
            case "upper" -> Tolerance.Kind.upperBound;
            case "lower" -> Tolerance.Kind.lowerBound;
            default -> throw new IllegalArgumentException("case " + id + ": tolerance kind '" + t.substring(0, sp)
                    + "' unknown (use rel, abs, upper, lower)");
        };
        return new Tolerance(kind, Expr.eval(t.substring(sp + 1), vars));
    }

    private String substitute(String id, String s) {
        Matcher m = TEXT_REF.matcher(s);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            String v = texts.get(m.group(1));
            if (v == null) {
                throw new IllegalArgumentException("case " + id + ": unknown text {" + m.group(1) + "} (have "
                        + texts.keySet() + ")");
            }
            m.appendReplacement(out, Matcher.quoteReplacement(v));
        }
        m.appendTail(out);
        if (out.toString().isBlank()) {
            throw new IllegalArgumentException("case " + id + ": empty tolerance justification or source");
        }
        return out.toString();
    }
}
