package org.tensio.engine.robustness;

import java.util.List;
import java.util.Random;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.lifecycle.AfterContainer;

/**
 * One structured mutation per try of a valid base project ({@link Bases}: the shipped examples, every profile
 * type, a composite), through the reader, validation and properties, every 15th (by seed) also through meshing, the
 * finite-element solution and the check ({@link Harness}). The seed is fixed so that CI runs the same inputs every
 * time; change it locally to explore (a failure prints the input).
 */
class StructuredFuzzTest {

    static final String FAMILY = "structured-mutations";

    @Property(tries = 3000, seed = "20261201", shrinking = ShrinkingMode.OFF)
    void everyMutationIsRejectedNamingTheFieldOrAcceptedWithFiniteResults(@ForAll long seed) {
        Random r = new Random(seed);
        List<String> bases = Bases.all();
        int b = r.nextInt(bases.size());
        Mutator.Mutation m = Mutator.mutate(bases.get(b), r);
        Harness.run(FAMILY, m.json(), null, m.rule(), Math.floorMod(seed, 15) == 0, m.mustFail(),
                "base " + b + ", seed " + seed + ": " + m.what());
    }

    @AfterContainer
    static void writeCounts() {
        Counts.write();
    }
}
