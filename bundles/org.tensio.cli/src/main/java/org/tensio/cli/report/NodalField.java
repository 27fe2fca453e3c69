package org.tensio.cli.report;

import java.util.ArrayList;
import java.util.List;

import org.tensio.engine.checks.UnitStressField;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Criterion;
import org.tensio.engine.section.MaterialLimits;
import org.tensio.engine.section.Section;

/**
 * A criterion's demand at the six nodes of every element of a section's mesh for one load case, from the check
 * engine's own samples ({@link UnitStressField}: every mesh node, once per material at a node shared by
 * materials), so the plot shows exactly the values the checks chose their governing point from. Values are per
 * element and node: an element takes the sample of its own part (or of its part's material) at each node, so a
 * node on a material interface carries each side's value.
 */
final class NodalField {

    final Mesh mesh;
    /** Value at element e, local node k, at [6e + k], stress unit. */
    final double[] values;
    final double min;
    final double max;

    private NodalField(Mesh mesh, double[] values) {
        this.mesh = mesh;
        this.values = values;
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        min = lo;
        max = hi;
    }

    /**
     * @param criterion the quantity: its demand ({@link MaterialLimits#demand}); von Mises when null
     */
    static NodalField of(Section section, SectionProperties props, FiniteElementSolution fe, InternalForces forces,
            Criterion criterion) {
        Mesh mesh = fe.mesh();
        Criterion c = criterion == null ? Criterion.vonMises : criterion;
        UnitStressField u = UnitStressField.of(section, props, fe);
        int n = u.size();
        double[] sz = new double[n], tx = new double[n], ty = new double[n];
        u.evaluate(forces, sz, tx, ty);
        List<List<Integer>> byNode = new ArrayList<>();
        for (int i = 0; i < mesh.nodeCount(); i++) {
            byNode.add(new ArrayList<>(1));
        }
        for (int i = 0; i < n; i++) {
            byNode.get(u.node(i)).add(i);
        }
        double[] v = new double[6 * mesh.elementCount()];
        for (int e = 0; e < mesh.elementCount(); e++) {
            int part = mesh.part(e);
            String material = section.parts().get(part).material().name();
            for (int k = 0; k < 6; k++) {
                List<Integer> samples = byNode.get(mesh.node(e, k));
                int pick = samples.get(0);
                for (int i : samples) {
                    if (u.part(i) == part) {
                        pick = i;
                        break;
                    }
                    if (u.material(i).equals(material)) {
                        pick = i;
                    }
                }
                v[6 * e + k] = MaterialLimits.demand(c, sz[pick], tx[pick], ty[pick]);
            }
        }
        return new NodalField(mesh, v);
    }
}
