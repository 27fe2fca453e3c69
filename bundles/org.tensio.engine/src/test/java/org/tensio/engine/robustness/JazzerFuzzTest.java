package org.tensio.engine.robustness;

import java.nio.charset.StandardCharsets;

import com.code_intelligence.jazzer.junit.FuzzTest;

import org.tensio.engine.robustness.Harness.PathRule;

/**
 * Coverage-guided fuzzing of the reader with Jazzer (com.code-intelligence:jazzer-junit from Maven Central): the
 * bytes become project text (UTF-8, malformed sequences replaced) and go through {@link Harness} (rejection naming
 * the place, or finite results). In a normal test run Jazzer replays only the stored inputs in
 * {@code src/test/resources/org/tensio/engine/robustness/JazzerFuzzTestInputs/readerKeepsItsContract/} (regression
 * mode: the shipped examples as seeds and the inputs of past findings); with the environment variable
 * {@code JAZZER_FUZZ=1} it fuzzes, guided by coverage, for {@code maxDuration}:
 * {@code JAZZER_FUZZ=1 ./mvnw -o verify -pl releng/org.tensio.target,bundles/org.tensio.engine -Dtest=JazzerFuzzTest
 * -Dsurefire.failIfNoSpecifiedTests=false}. It writes the inputs of a finding into that folder (commit them as
 * regression inputs once fixed) and its working corpus into {@code .cifuzz-corpus/} (ignored). Findings so far:
 * a Gson message quoting the input across a line break (fixed: StrictJson escapes it), and two false alarms of the
 * harness itself (it learned the harness's own marker strings).
 */
class JazzerFuzzTest {

    @FuzzTest(maxDuration = "60s")
    void readerKeepsItsContract(byte[] data) {
        String text = new String(data, StandardCharsets.UTF_8);
        Harness.run("jazzer", text, null, PathRule.ANY, false, false, "jazzer input of " + data.length + " bytes");
    }
}
