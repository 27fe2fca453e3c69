package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;

/**
 * Material limits in the project file (fy, fu, partialFactor, criteria, allowable; docs/file-format.md §4):
 * which materials get {@link MaterialLimits} and what they hold. Rejections are rows of bad-inputs.txt.
 * Capacities follow the rules of {@link Criterion}'s Javadoc (fy/γ, fy/(2γ), fy/(√3·γ), fu/γ; a given
 * allowable wins and is not divided by γ).
 */
class MaterialLimitsReadingTest {

    private static Project materials(String materials) throws ProjectFormatException {
        return ProjectReader.parse("{\"tensio\":1,\"materials\":{" + materials + "},\"sections\":{}}", "test");
    }

    @Test
    void fyAloneGivesVonMisesWithFactorOne() throws ProjectFormatException {
        Project p = materials("\"S355\":{\"E\":210000,\"nu\":0.3,\"fy\":355},\"bare\":{\"E\":70000,\"nu\":0.33}");
        MaterialLimits l = p.limits().get("S355");
        assertEquals(new MaterialLimits("S355", List.of(Criterion.vonMises), 1.0, 355.0, null, null, null, null), l);
        assertEquals(355, l.capacity(Criterion.vonMises), 0);
        assertFalse(p.limits().containsKey("bare"), "a material without strength or allowable is not checked");
        assertEquals(List.of("S355"), List.copyOf(p.limits().keySet()));
    }

    @Test
    void everyKeyIsRead() throws ProjectFormatException {
        Project p = materials("\"S355\":{\"E\":210000,\"nu\":0.3,\"fy\":355,\"fu\":510,\"partialFactor\":1.1,"
                + "\"criteria\":[\"maxShear\",\"vonMises\",\"maxPrincipal\",\"shear\"],"
                + "\"allowable\":{\"shear\":150}}");
        MaterialLimits l = p.limits().get("S355");
        assertEquals(List.of(Criterion.maxShear, Criterion.vonMises, Criterion.maxPrincipal, Criterion.shear),
                l.criteria());
        assertEquals(1.1, l.partialFactor(), 0);
        assertEquals(355.0, l.yieldStrength());
        assertEquals(510.0, l.ultimateStrength());
        assertEquals(150.0, l.allowableShear());
        assertNull(l.allowableNormal());
        assertNull(l.allowableEquivalent());
        assertEquals(150, l.capacity(Criterion.maxShear), 0);
        assertEquals(150, l.capacity(Criterion.shear), 0);
        assertEquals(355 / 1.1, l.capacity(Criterion.vonMises), 0);
        assertEquals(510 / 1.1, l.capacity(Criterion.maxPrincipal), 0);
    }

    @Test
    void allowablesAloneAreEnoughForTheCriteriaTheyServe() throws ProjectFormatException {
        Project p = materials("\"timber\":{\"E\":11000,\"nu\":0.3,\"criteria\":[\"normal\",\"shear\"],"
                + "\"allowable\":{\"normal\":14,\"shear\":2.5}},"
                + "\"weld\":{\"E\":210000,\"nu\":0.3,\"allowable\":{\"equivalent\":240}},"
                + "\"cast\":{\"E\":100000,\"nu\":0.26,\"fu\":200,\"partialFactor\":2,\"criteria\":[\"maxPrincipal\"]}");
        assertEquals(14, p.limits().get("timber").capacity(Criterion.normal), 0);
        assertEquals(2.5, p.limits().get("timber").capacity(Criterion.shear), 0);
        assertEquals(List.of(Criterion.vonMises), p.limits().get("weld").criteria());
        assertEquals(240, p.limits().get("weld").capacity(Criterion.vonMises), 0);
        assertEquals(100, p.limits().get("cast").capacity(Criterion.maxPrincipal), 0);
        assertNull(p.materials().get("cast").fy());
    }

    @Test
    void demoMaterialsCarryLimits() throws IOException, ProjectFormatException {
        Project p = ProjectReader.read(Path.of("../../docs/examples/demo.tensio.json"));
        assertEquals(List.copyOf(p.materials().keySet()), List.copyOf(p.limits().keySet()));
        MaterialLimits s355 = p.limits().get("S355");
        assertTrue(s355.criteria().containsAll(List.of(Criterion.vonMises, Criterion.maxShear)), s355.toString());
        assertEquals(355, s355.capacity(Criterion.vonMises), 0);
        assertEquals(177.5, s355.capacity(Criterion.maxShear), 0);
        MaterialLimits alu = p.limits().get("EN_AW_6082_T6");
        assertEquals(260.0, alu.yieldStrength());
        assertEquals(1.1, alu.partialFactor(), 0);
        assertEquals(260 / 1.1, alu.capacity(Criterion.vonMises), 0);
    }
}
