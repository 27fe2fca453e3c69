package org.tensio.engine.fem;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.tensio.engine.mesh.Mesh;

/**
 * The closed boundary loops of a mesh (edges used by one element only), each oriented with the material on
 * its left, with its signed area: positive for an outer boundary, negative for a hole.
 */
final class BoundaryLoops {

    /** One loop: its nodes (corner and mid-side, in order) and its signed area. */
    record Loop(int[] nodes, double signedArea) {
    }

    private BoundaryLoops() {
    }

    static List<Loop> of(Mesh mesh) {
        Map<Long, int[]> edges = new HashMap<>();
        Map<Long, Integer> count = new HashMap<>();
        for (int e = 0; e < mesh.elementCount(); e++) {
            for (int k = 0; k < 3; k++) {
                int a = mesh.node(e, k), b = mesh.node(e, (k + 1) % 3), m = mesh.node(e, 3 + k);
                long key = a < b ? ((long) a << 32) | b : ((long) b << 32) | a;
                count.merge(key, 1, Integer::sum);
                edges.put(key, new int[] {a, m, b});
            }
        }
        Map<Integer, List<int[]>> outgoing = new HashMap<>();
        for (Map.Entry<Long, Integer> c : count.entrySet()) {
            if (c.getValue() == 1) {
                int[] ed = edges.get(c.getKey());
                outgoing.computeIfAbsent(ed[0], k -> new ArrayList<>(1)).add(ed);
            }
        }
        List<Loop> loops = new ArrayList<>();
        while (!outgoing.isEmpty()) {
            int start = outgoing.keySet().iterator().next();
            List<Integer> nodes = new ArrayList<>();
            double area = 0;
            int at = start;
            while (true) {
                List<int[]> out = outgoing.get(at);
                if (out == null) {
                    break;
                }
                int[] ed = out.remove(out.size() - 1);
                if (out.isEmpty()) {
                    outgoing.remove(at);
                }
                nodes.add(ed[0]);
                nodes.add(ed[1]);
                area += edgeArea(mesh, ed);
                at = ed[2];
                if (at == start) {
                    break;
                }
            }
            loops.add(new Loop(nodes.stream().mapToInt(Integer::intValue).toArray(), area));
        }
        return loops;
    }

    /** ∫ x dy along the quadratic edge a–m–b (two-point Gauss: the integrand is cubic in the parameter). */
    static double edgeArea(Mesh mesh, int[] ed) {
        double ax = mesh.x(ed[0]), ay = mesh.y(ed[0]), mx = mesh.x(ed[1]), my = mesh.y(ed[1]);
        double bx = mesh.x(ed[2]), by = mesh.y(ed[2]);
        double g = 0.5 / Math.sqrt(3);
        double sum = 0;
        for (double s : new double[] {0.5 - g, 0.5 + g}) {
            double n0 = (1 - s) * (1 - 2 * s), n1 = 4 * s * (1 - s), n2 = s * (2 * s - 1);
            double d0 = 4 * s - 3, d1 = 4 - 8 * s, d2 = 4 * s - 1;
            double x = n0 * ax + n1 * mx + n2 * bx;
            double dy = d0 * ay + d1 * my + d2 * by;
            sum += 0.5 * x * dy;
        }
        return sum;
    }
}
