package org.tensio.engine.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.project.Project;
import org.tensio.engine.section.Criterion;

/**
 * docs/examples/frame-export: a project whose load cases come from an invented frame program's CSV export
 * (kN and m, its own column names and signs). Every row of the CSV is compared with what the reader made of it,
 * the expected value computed here from the cell with the documented mapping and factors.
 */
class FrameExportExampleTest {

    private static final Path DIR = Path.of("../../docs/examples/frame-export");

    @Test
    void everyRowArrivesMappedConvertedAndSigned() throws IOException, ProjectFormatException {
        Project p = ProjectReader.read(DIR.resolve("mezzanine.tensio.json"));
        assertEquals(44, p.stations().size());
        List<String> lines = Files.readAllLines(DIR.resolve("mezzanine-forces.csv"));
        assertEquals("Member,Cut,x [m],LoadCase,Fx [kN],Fy [kN],Fz [kN],Mx [kNm],My [kNm],Mz [kNm],Description",
                lines.get(1));
        int read = 0;
        int skipped = 0;
        for (String line : lines.subList(2, lines.size())) {
            // the quoted Description (which holds commas) is the last column: the first ten split plainly
            String[] f = line.split(",", 11);
            if (!p.stations().containsKey(f[1])) {
                assertTrue(f[0].startsWith("BR"), "only the bracing is left out: " + line);
                skipped++;
                continue;
            }
            // columns N:Fx, Vx:Fy, Vy:Fz, Mx:My (scale -1), My:Mz, T:Mx; kN → N × 1e3, kN·m → N·mm × 1e6, each a
            // single multiplication in the reader as here, so equality is exact
            // (and a zero is always +0, as the reader writes it)
            InternalForces expected = new InternalForces(kN(f[4]), kN(f[5]), kN(f[6]), -kNm(f[8]) + 0.0, kNm(f[9]),
                    kNm(f[7]));
            assertEquals(expected, p.station(f[1]).cases().get(f[3]), line);
            read++;
        }
        assertEquals(44 * 6, read);
        assertEquals(96, skipped);
        assertTrue(read + skipped >= 300, "a few hundred rows");
    }

    @Test
    void casesCombinationsAndLimits() throws IOException, ProjectFormatException {
        Project p = ProjectReader.read(DIR.resolve("mezzanine.tensio.json"));
        assertEquals(List.of("Ad", "G", "Q", "Qp", "W1", "W2", "N1"), List.copyOf(p.station("C1_B").cases().keySet()));
        assertEquals(List.of("G", "Q", "Qp", "W1", "W2", "N1"), List.copyOf(p.station("MB2_M").cases().keySet()));
        // gravity sags the main beam: with y up that is a negative Mx (file-format.md §9)
        InternalForces uls = p.forces("MB2_M", "ULS_1");
        assertTrue(uls.mx() < 0, uls.toString());
        // σ = M / Wel with Wel ≈ 904 cm³ for the IPE 360 dimensions (rolled-section tables; from memory):
        // a realistic utilisation band of S355, between 100 and 355 MPa
        double sigma = -uls.mx() / 904e3;
        assertTrue(sigma > 100 && sigma < 355, "bending stress " + sigma + " MPa");
        assertEquals(355, p.limits().get("S355J2H").capacity(Criterion.vonMises), 0);
        assertEquals(177.5, p.limits().get("S355").capacity(Criterion.maxShear), 0);
    }

    private static double kN(String cell) {
        return Double.parseDouble(cell) * 1e3 + 0.0;
    }

    private static double kNm(String cell) {
        return Double.parseDouble(cell) * 1e6 + 0.0;
    }
}
