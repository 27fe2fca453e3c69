package org.tensio.engine.verification;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import java.util.stream.Stream;

import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.tensio.engine.profile.IShapeProfile;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;

/**
 * Rolled I- and H-sections with root fillets against the published section table, fixture
 * {@code verification/rolled-sections.txt} (source, units and tolerance rule are in its header: EN 10365
 * dimensions, ArcelorMittal table values quoted from memory, half a unit of the last printed digit).
 * <p>
 * A second check per row compares the production {@link IShapeProfile} outline with an independent
 * construction in {@link Shapes#iSection}: both are exact, so they must agree to 1e-12 relative.
 */
class RolledSectionsTest {

    /** One fixture row: a printed value and the tolerance its digits imply. */
    record Printed(double value, double tolerance) {
        static Printed parse(String s) {
            BigDecimal d = new BigDecimal(s);
            // half a unit in the last place as written: 1943 → 0.5, 28.48 → 0.005, 2.313e4 → 5
            return new Printed(d.doubleValue(), 0.5 * d.ulp().doubleValue());
        }
    }

    record Row(String name, double h, double b, double tw, double tf, double r, Printed a, Printed iy, Printed wely,
            Printed wply, Printed iyRadius, Printed iz, Printed welz, Printed wplz, Printed izRadius, String source) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<Row> rows() throws IOException {
        List<Row> rows = new ArrayList<>();
        try (InputStream in = RolledSectionsTest.class.getResourceAsStream("/verification/rolled-sections.txt")) {
            assertNotNull(in, "fixture verification/rolled-sections.txt on the test class path");
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                line = line.strip();
                if (line.isEmpty() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.split("\\s+");
                assertEquals(16, f.length, "16 columns in: " + line);
                rows.add(new Row(f[0], d(f[1]), d(f[2]), d(f[3]), d(f[4]), d(f[5]), Printed.parse(f[6]),
                        Printed.parse(f[7]), Printed.parse(f[8]), Printed.parse(f[9]), Printed.parse(f[10]),
                        Printed.parse(f[11]), Printed.parse(f[12]), Printed.parse(f[13]), Printed.parse(f[14]), f[15]));
            }
        }
        return rows.stream();
    }

    private static double d(String s) {
        return Double.parseDouble(s);
    }

    @ParameterizedTest(name = "{0} against the section table")
    @MethodSource("rows")
    void propertiesMatchThePrintedTable(Row row) {
        IShapeProfile profile = new IShapeProfile(row.b(), row.h(), row.tw(), row.tf(), row.r());
        SectionProperties p = SectionPropertiesOp.compute(Shapes.section(profile));
        String at = row.name() + " (" + row.source() + "): ";
        assertAll(
                printed(row.a(), p.area() / 1e2, at + "A cm²"),
                printed(row.iy(), p.ixx() / 1e4, at + "Iy cm⁴"),
                printed(row.wely(), p.sxTop() / 1e3, at + "Wel,y cm³ (top fibre)"),
                printed(row.wely(), p.sxBottom() / 1e3, at + "Wel,y cm³ (bottom fibre)"),
                printed(row.wply(), p.zx() / 1e3, at + "Wpl,y cm³"),
                printed(row.iyRadius(), p.rx() / 10, at + "iy cm"),
                printed(row.iz(), p.iyy() / 1e4, at + "Iz cm⁴"),
                printed(row.welz(), p.syRight() / 1e3, at + "Wel,z cm³"),
                printed(row.wplz(), p.zy() / 1e3, at + "Wpl,z cm³"),
                printed(row.izRadius(), p.ry() / 10, at + "iz cm"));
    }

    @ParameterizedTest(name = "{0}: IShapeProfile outline equals an independent construction")
    @MethodSource("rows")
    void profileOutlineEqualsIndependentConstruction(Row row) {
        SectionProperties p = SectionPropertiesOp.compute(
                Shapes.section(new IShapeProfile(row.b(), row.h(), row.tw(), row.tf(), row.r())));
        SectionProperties q = SectionPropertiesOp.compute(
                Shapes.section(Shapes.iSection(row.h(), row.b(), row.tw(), row.tf(), row.r())));
        double rel = 1e-12;
        List<ToDoubleFunction<SectionProperties>> fields = List.of(SectionProperties::area, SectionProperties::ixx,
                SectionProperties::iyy, SectionProperties::zx, SectionProperties::zy, SectionProperties::sxTop,
                SectionProperties::syRight);
        List<Executable> checks = new ArrayList<>();
        for (int i = 0; i < fields.size(); i++) {
            double e = fields.get(i).applyAsDouble(q), a = fields.get(i).applyAsDouble(p);
            String what = row.name() + " property #" + i;
            checks.add(() -> Verify.close(e, a, rel, what));
        }
        checks.add(() -> Verify.closeAbs(0.0, p.ixy(), rel * p.ixx(), row.name() + " Ixy = 0"));
        assertAll(checks.stream());
    }

    private static Executable printed(Printed expected, double actual, String what) {
        return () -> Verify.closeAbs(expected.value(), actual, expected.tolerance(), what);
    }
}
