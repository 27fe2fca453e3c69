package org.tensio.engine.internal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.LogRecord;
import java.util.logging.Logger;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.tensio.engine.geometry.Region;
import org.tensio.engine.profile.ProfileDef;
import org.tensio.engine.profile.RectangleProfile;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.spi.CheckCriterion;
import org.tensio.engine.spi.Extensions;
import org.tensio.engine.spi.ProfileType;

/**
 * The DS component's dynamic references: many contributions bound one at a time are all in force, in bind order;
 * malformed, built-in and repeated names are refused with {@link Extensions#of}'s messages and logged; unbinding
 * the one in force lets the next one of that name take its place. A correctness test of the incremental binding,
 * no timing.
 */
class ServiceBindingTest {

    private static final int COUNT = 200;
    private static final Logger JUL = Logger.getLogger(SectionAnalysisServiceImpl.class.getName());

    /** A contributed criterion with a given id (demand and capacity are not evaluated here). */
    record Rule(String id) implements CheckCriterion {
        @Override
        public String description() {
            return "test rule " + id;
        }

        @Override
        public double demand(double sigmaZ, double tauZX, double tauZY) {
            return Math.abs(sigmaZ);
        }

        @Override
        public double capacity(MaterialLimits limits) {
            return 1;
        }
    }

    /** A contributed profile type with a given name, making rectangles. */
    record Bar(String type) implements ProfileType {
        @Override
        public List<String> parameterNames() {
            return List.of("xDim", "yDim");
        }

        @Override
        public List<String> requiredParameterNames() {
            return List.of("xDim", "yDim");
        }

        @Override
        public ProfileDef create(Map<String, Double> p) {
            return new Rect(type, p.get("xDim"), p.get("yDim"));
        }
    }

    /** A rectangle under a contributed type name (its region is the built-in rectangle's). */
    record Rect(String type, double xDim, double yDim) implements ProfileDef {
        @Override
        public Region region() {
            return new RectangleProfile(xDim, yDim).region();
        }

        @Override
        public Map<String, Double> parameters() {
            return Map.of("xDim", xDim, "yDim", yDim);
        }
    }

    private final List<String> warnings = new ArrayList<>();
    private final Handler capture = new Handler() {
        @Override
        public void publish(LogRecord r) {
            if (r.getLevel().intValue() >= Level.WARNING.intValue()) {
                synchronized (warnings) {
                    warnings.add(r.getMessage());
                }
            }
        }

        @Override
        public void flush() {
        }

        @Override
        public void close() {
        }
    };

    @BeforeEach
    void listen() {
        JUL.addHandler(capture);
    }

    @AfterEach
    void stopListening() {
        JUL.removeHandler(capture);
    }

    @Test
    void manyContributionsAreAllInForceAndClashesAreRefused() throws Exception {
        SectionAnalysisServiceImpl engine = new SectionAnalysisServiceImpl();
        List<Rule> rules = new ArrayList<>();
        List<Bar> bars = new ArrayList<>();
        List<String> expectedWarnings = new ArrayList<>();
        for (int i = 0; i < COUNT; i++) {
            Rule r = new Rule("firm" + i);
            Bar b = new Bar("Firm" + i + "Profile");
            rules.add(r);
            bars.add(b);
            engine.addCriterion(r);
            engine.addProfileType(b);
            if (i % 10 == 0) {
                // a second contribution under a name bound before: refused, the first stays in force
                Rule inForce = rules.get(i / 2);
                Rule again = new Rule(inForce.id());
                engine.addCriterion(again);
                expectedWarnings.add(message(() -> Extensions.of(List.of(inForce, again), List.of())));
                Bar typeInForce = bars.get(i / 2);
                Bar twice = new Bar(typeInForce.type());
                engine.addProfileType(twice);
                expectedWarnings.add(message(() -> Extensions.of(List.of(), List.of(typeInForce, twice))));
            }
        }
        Rule builtIn = new Rule("vonMises");
        Rule malformed = new Rule("Bad id");
        Bar builtInType = new Bar("RectangleProfile");
        Bar malformedType = new Bar("firmBar");
        engine.addCriterion(builtIn);
        engine.addCriterion(malformed);
        engine.addProfileType(builtInType);
        engine.addProfileType(malformedType);
        expectedWarnings.add(message(() -> Extensions.of(List.of(builtIn), List.of())));
        expectedWarnings.add(message(() -> Extensions.of(List.of(malformed), List.of())));
        expectedWarnings.add(message(() -> Extensions.of(List.of(), List.of(builtInType))));
        expectedWarnings.add(message(() -> Extensions.of(List.of(), List.of(malformedType))));

        Extensions e = engine.extensions();
        assertEquals(rules.stream().map(Rule::id).toList(), List.copyOf(e.criteria().keySet()), "all, in bind order");
        assertEquals(bars.stream().map(Bar::type).toList(), List.copyOf(e.profileTypes().keySet()));
        for (int i = 0; i < COUNT; i++) {
            assertSame(rules.get(i), e.criteria().get("firm" + i), "the first bound is in force");
            assertSame(bars.get(i), e.profileTypes().get("Firm" + i + "Profile"));
        }
        assertEquals(expectedWarnings.stream().sorted().toList(), warnings.stream().sorted().toList(),
                "each refusal logged once, with the message of Extensions.of");
        assertSame(e, engine.extensions(), "rebuilt once after the changes, not on every use");

        // the reader sees the bound contributions
        Project p = engine.parseProject(project("firm137", "{\"type\": \"Firm42Profile\", \"xDim\": 20, \"yDim\": 40}"),
                "t");
        assertEquals(20 * 40, engine.properties(p.section("bar")).area(), 1e-9, "A = b·h of the contributed rectangle");
    }

    @Test
    void unbindingTheContributionInForceLetsTheNextOfItsNameIn() {
        SectionAnalysisServiceImpl engine = new SectionAnalysisServiceImpl();
        Rule first = new Rule("firmRule");
        Rule second = new Rule("firmRule");
        Rule other = new Rule("firmOther");
        Rule malformed = new Rule("9lives");
        engine.addCriterion(first);
        engine.addCriterion(other);
        engine.addCriterion(second);
        engine.addCriterion(malformed);
        assertSame(first, engine.extensions().criteria().get("firmRule"));
        engine.removeCriterion(malformed);
        engine.removeCriterion(first);
        assertSame(second, engine.extensions().criteria().get("firmRule"), "the waiting one takes its place");
        assertEquals(List.of("firmOther", "firmRule"), List.copyOf(engine.extensions().criteria().keySet()),
                "in the order they were bound");
        engine.removeCriterion(second);
        engine.removeCriterion(other);
        assertTrue(engine.extensions().isEmpty(), engine.extensions().toString());
        Bar bar = new Bar("FirmBarProfile");
        engine.addProfileType(bar);
        engine.removeProfileType(new Bar("FirmBarProfile"));
        assertSame(bar, engine.extensions().profileType("FirmBarProfile").orElseThrow(),
                "unbinding an equal but different service leaves the bound one");
        engine.removeProfileType(bar);
        assertTrue(engine.extensions().isEmpty());
    }

    @Test
    void bindingFromSeveralThreadsLosesNothing() throws Exception {
        SectionAnalysisServiceImpl engine = new SectionAnalysisServiceImpl();
        int threads = 4;
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<?>> done = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                int first = t * (COUNT / threads);
                done.add(pool.submit(() -> {
                    for (int i = first; i < first + COUNT / threads; i++) {
                        engine.addCriterion(new Rule("firm" + i));
                        engine.addProfileType(new Bar("Firm" + i + "Profile"));
                        engine.extensions();
                    }
                }));
            }
            for (Future<?> f : done) {
                f.get(5, TimeUnit.MINUTES); // hang guard, not a speed limit
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(COUNT, engine.extensions().criteria().size());
        assertEquals(COUNT, engine.extensions().profileTypes().size());
        for (int i = 0; i < COUNT; i++) {
            assertTrue(engine.extensions().criterion("firm" + i).isPresent(), "firm" + i);
        }
        assertEquals(List.of(), warnings, "no clash among distinct names");
    }

    private static String message(org.junit.jupiter.api.function.Executable e) {
        return assertThrows(IllegalArgumentException.class, e).getMessage();
    }

    private static String project(String criterion, String profile) {
        return "{\"tensio\": 1, \"units\": {\"length\": \"mm\", \"force\": \"N\"},"
                + " \"materials\": {\"steel\": {\"E\": 210000, \"nu\": 0.3, \"fy\": 300, \"partialFactor\": 1.2,"
                + " \"criteria\": [\"" + criterion + "\"]}},"
                + " \"sections\": {\"bar\": {\"material\": \"steel\", \"profile\": " + profile + "}},"
                + " \"stations\": {\"s1\": {\"section\": \"bar\", \"forces\": {\"c1\": {\"N\": 1000}}}}}";
    }
}
