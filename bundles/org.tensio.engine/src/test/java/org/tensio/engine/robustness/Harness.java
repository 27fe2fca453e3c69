package org.tensio.engine.robustness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.lang.reflect.RecordComponent;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Collection;
import java.util.Map;
import java.util.function.Predicate;

import org.tensio.engine.checks.CheckReport;
import org.tensio.engine.checks.CheckOp;
import org.tensio.engine.checks.CheckResult;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;

/**
 * Runs one generated input through the real reader, validation and properties (and, when asked, the mesh,
 * finite-element and check path) and holds it to the robustness contract:
 * <ul>
 * <li>rejection only as a {@link ProjectFormatException} whose path is a JSONPath, whose message is one line
 * beginning with that path, and which is not the reader's safety net ("cannot read the project: ...", which
 * would mean some other exception escaped a check); where the generator knows which field it broke, the path
 * must satisfy the generator's expectation (the field, or the object that holds it);</li>
 * <li>acceptance only with finite results: every number of the section properties, every load case's and
 * combination's forces, the stresses at a boundary point, and (full path) every utilisation and stress of the
 * check;</li>
 * <li>no other exception, and an end within {@link #TIME_LIMIT} — a hang guard, not a speed test (a typical
 * input takes milliseconds).</li>
 * </ul>
 * Every input is counted in {@link Counts}.
 */
final class Harness {

    /** Per input; generous (hang guard only). */
    static final Duration TIME_LIMIT = Duration.ofSeconds(60);

    private static final SectionAnalysisService ENGINE = SectionAnalysisService.create();

    /** What the generator expects of the error path when the input is rejected. */
    interface PathRule extends Predicate<String> {
        /** Any well-formed path. */
        PathRule ANY = p -> true;

        /** @return a rule: the error is at {@code path} or at an object that contains it */
        static PathRule atOrAbove(String path) {
            return p -> p.equals(path) || path.startsWith(p + ".") || path.startsWith(p + "[");
        }

        /** @return a rule: exactly at {@code path} */
        static PathRule exactly(String path) {
            return p -> p.equals(path);
        }

        /** @return a rule: within the top-level entity holding {@code path} ({@code $.sections.x} and below) */
        static PathRule sameEntity(String path) {
            String entity = entity(path);
            return p -> p.equals("$") || p.equals(entity) || p.startsWith(entity + ".") || p.startsWith(entity + "[")
                    || entity.startsWith(p + ".");
        }
    }

    private Harness() {
    }

    /** @return the first two components of a path ({@code $.sections.beam} of {@code $.sections.beam.profile}) */
    static String entity(String path) {
        int dots = 0;
        for (int i = 0; i < path.length(); i++) {
            char c = path.charAt(i);
            if ((c == '.' || c == '[') && ++dots == 3) {
                return path.substring(0, i);
            }
        }
        return path;
    }

    /**
     * @param family   counter family (e.g. "structured")
     * @param json     the input
     * @param dir      folder for load tables, may be null
     * @param rule     expectation on the error path
     * @param fullPath also mesh, solve and check accepted projects
     * @param mustFail the generator knows the input is invalid: acceptance is a failure
     * @param what     description of the input for failure messages
     */
    static void run(String family, String json, Path dir, PathRule rule, boolean fullPath, boolean mustFail,
            String whatever) {
        Counts.generated(family);
        String what = whatever.length() > 300 ? whatever.substring(0, 300) + "..." : whatever;
        Project p = assertTimeoutPreemptively(TIME_LIMIT, () -> read(json, dir, rule, what), () -> "hang: " + what);
        if (p == null) {
            Counts.rejected(family);
            return;
        }
        if (mustFail) {
            fail("accepted an invalid input (" + what + "):\n" + abbreviate(json));
        }
        assertTimeoutPreemptively(TIME_LIMIT, () -> {
            try {
                checkAccepted(family, p, fullPath, what, json);
            } catch (RuntimeException e) {
                throw new AssertionError("escaped " + e + " from an accepted input (" + what + "):\n" + abbreviate(json), e);
            }
        }, () -> "hang: " + what);
        Counts.accepted(family);
    }

    /** @return the project, or null when it was rejected correctly */
    private static Project read(String json, Path dir, PathRule rule, String what) {
        try {
            return dir == null ? ProjectReader.parse(json, "fuzz") : ProjectReader.parse(json, "fuzz", dir);
        } catch (ProjectFormatException e) {
            checkRejection(e, rule, what, json);
            return null;
        } catch (RuntimeException | Error e) {
            throw new AssertionError("escaped " + e + " (" + what + "):\n" + abbreviate(json), e);
        }
    }

    /** The form of every rejection: path, one line, path first, names no Java exception. */
    static void checkRejection(ProjectFormatException e, PathRule rule, String what, String json) {
        String path = e.path();
        String m = e.getMessage();
        assertTrue(path != null && path.startsWith("$"), () -> "path '" + path + "' (" + what + ")");
        assertTrue(m.startsWith(path + ": "), () -> "message must start with its path: " + m);
        assertEquals(-1, m.indexOf('\n'), () -> "one-line message: " + m);
        assertFalse(m.startsWith("$: cannot read the project: "), () -> "safety net hit (an exception escaped a check): " + m
                + " (" + what + ")\n" + abbreviate(json));
        assertFalse(m.contains("Exception") && !json.contains("Exception") || m.contains("\tat "),
                () -> "Java internals in the message: " + m);
        assertTrue(m.length() < 2000, () -> "message too long (" + m.length() + "): " + m.substring(0, 400) + " (" + what + ")");
        assertTrue(rule.test(path), () -> "error at " + path + " does not name the broken field (" + what + "): " + m);
    }

    private static void checkAccepted(String family, Project p, boolean fullPath, String what, String json) {
        String ctx = what + "\n" + abbreviate(json);
        for (Section s : p.sections().values()) {
            SectionProperties props;
            try {
                props = SectionPropertiesOp.compute(s);
            } catch (IllegalArgumentException e) {
                throw new AssertionError("an accepted section failed in properties: " + e.getMessage() + " (" + ctx
                        + ")", e);
            }
            finite(props, "properties of " + s.name(), ctx);
        }
        for (Station st : p.stations().values()) {
            Section s = p.section(st.sectionId());
            SectionProperties props = SectionPropertiesOp.compute(s);
            Iterable<String> cases = concat(st.cases().keySet(), p.combinations().keySet());
            for (String c : cases) {
                InternalForces f;
                try {
                    f = p.forces(st.id(), c);
                } catch (IllegalArgumentException e) {
                    // a combination naming a case this station lacks: documented, named
                    assertTrue(e.getMessage().contains(c), () -> "unclear: " + e.getMessage());
                    continue;
                }
                finite(f, "forces " + st.id() + "/" + c, ctx);
                PointStress ps;
                try {
                    ps = PointStressOp.evaluate(s, props, f, onBoundary(s), st.id(), c);
                } catch (IllegalArgumentException e) {
                    // refused clearly: the forces and the section are too far apart in magnitude
                    assertTrue(e.getMessage().contains("not a finite number") && e.getMessage().contains(st.id()),
                            () -> "unclear refusal: " + e.getMessage());
                    Counts.refusedLater(family);
                    continue;
                }
                assertTrue(Double.isFinite(ps.sigmaZ()), () -> "sigmaZ " + ps.sigmaZ() + " at a boundary point of "
                        + st.id() + "/" + c + " (" + ctx + ")");
                if (ps.total() != null) {
                    finite(ps.total(), "stress " + st.id() + "/" + c, ctx);
                }
            }
        }
        if (fullPath) {
            checkFullPath(family, p, ctx);
        }
    }

    private static void checkFullPath(String family, Project p, String ctx) {
        Counts.fullPath(family);
        for (Section s : p.sections().values()) {
            SectionProperties props = ENGINE.properties(s);
            finite(props, "FE properties of " + s.name(), ctx);
        }
        if (p.limits().isEmpty() || p.stations().isEmpty()) {
            return;
        }
        CheckReport r;
        try {
            r = CheckOp.check(p, ENGINE);
        } catch (IllegalArgumentException e) {
            assertTrue(e.getMessage() != null && e.getMessage().contains("'"), () -> "check refused unclearly: " + e);
            Counts.refusedLater(family);
            return;
        }
        assertTrue(Double.isFinite(r.maxUtilisation()) || r.results().isEmpty(),
                () -> "max utilisation " + r.maxUtilisation() + " (" + ctx + ")");
        for (CheckResult c : r.results()) {
            finite(c, "check result", ctx);
        }
    }

    /** @return a point of the section (the start of its first boundary segment: boundary points count as inside) */
    static Point2 onBoundary(Section s) {
        return s.parts().get(0).region().contours().get(0).segments().get(0).start();
    }

    private static Iterable<String> concat(Collection<String> a, Collection<String> b) {
        java.util.List<String> all = new java.util.ArrayList<>(a);
        all.addAll(b);
        return all;
    }

    /**
     * Every double, Double and Point2 component of a record (recursively into records) is finite; the fatigue
     * package's records are left out (their NaN and +∞ are documented sentinels, not overflow).
     */
    static void finite(Record r, String what, String ctx) {
        for (RecordComponent c : r.getClass().getRecordComponents()) {
            Object v;
            try {
                v = c.getAccessor().invoke(r);
            } catch (ReflectiveOperationException e) {
                throw new AssertionError(e);
            }
            if (v instanceof Double d) {
                assertTrue(Double.isFinite(d), () -> what + "." + c.getName() + " = " + d + " (" + ctx + ")");
            } else if (v instanceof Point2 pt) {
                assertTrue(Double.isFinite(pt.x()) && Double.isFinite(pt.y()),
                        () -> what + "." + c.getName() + " = " + pt + " (" + ctx + ")");
            } else if (v instanceof Record inner && !inner.getClass().getPackageName().equals("org.tensio.engine.fatigue")) {
                // the fatigue records use NaN for "not applicable" and +∞ for "no demand", as their Javadoc says
                finite(inner, what + "." + c.getName(), ctx);
            }
        }
    }

    static String abbreviate(String s) {
        return s.length() <= 1500 ? s : s.substring(0, 1500) + "... (" + s.length() + " chars)";
    }
}
