package org.tensio.engine.fem;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.section.Section;

/**
 * Rolled I-sections with root fillets: J and Cw on the default mesh within 2 % of the producer's section
 * table (dimensions EN 10365; It and Iw from the ArcelorMittal sales programme tables — from memory). The
 * tables compute It with fillet-correction formulas and Iw = Iz (h − tf)² / 4, so 2 % is the agreement one
 * can expect of an exact solution; for wide-flange H sections the table's thin-walled Iw exceeds the exact
 * value by 2–2.5 % (measured here: HEB 200 −2.4 %), so only their J is checked.
 */
class RolledSectionTorsionTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource({
        // name, b, h, tw, tf, r, It cm⁴, Iw 10³ cm⁶ (0 = not checked)
        "IPE 200, 100, 200, 5.6, 8.5, 12, 6.98, 12.99",
        "IPE 300, 150, 300, 7.1, 10.7, 15, 20.12, 125.9",
        "IPE 400, 180, 400, 8.6, 13.5, 21, 51.08, 490.0",
        "HEB 200, 200, 200, 9, 15, 18, 59.28, 0",
    })
    void againstTable(String name, double b, double h, double tw, double tf, double r, double itCm4, double iwCm6e3) {
        Section s = FemFixtures.of(new IShapeProfile(b, h, tw, tf, r, 0), FemFixtures.STEEL);
        FiniteElementSolution f = SectionSolver.solve(s, MeshGenerator.generate(s), null);
        double it = itCm4 * 1e4;
        assertEquals(it, f.jWarping(), 0.02 * it, name + " It");
        if (iwCm6e3 > 0) {
            double iw = iwCm6e3 * 1e9;
            assertEquals(iw, f.cw(), 0.02 * iw, name + " Iw");
        }
    }
}
