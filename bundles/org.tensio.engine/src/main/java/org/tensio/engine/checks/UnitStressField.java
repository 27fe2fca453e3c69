package org.tensio.engine.checks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.fem.UnitShear;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.Singularity;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.section.Section;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;
import org.tensio.engine.stress.StressComponents;

/**
 * The stress field of a section per unit internal force, sampled at every node of its finite-element mesh:
 * the stresses of any load case or combination are the linear combination of these nine coefficients per
 * point with the six force components. Immutable; built once per section and shared by every case.
 * <p>
 * <b>Sample points.</b> Every node of {@link FiniteElementSolution#mesh()}, in node order; a node shared by
 * parts of different materials (different material ids) is sampled once per such part, in part order, because
 * σz (through n = E_part/E_ref) and the torsion stress (through G_part) jump there. Nothing else is sampled:
 * no point is guessed.
 * <p>
 * <b>Coefficients</b> (stored as nine flat arrays, structure of arrays), stress unit per force or per
 * force·length, section frame:
 * <ul>
 * <li>σz per unit N, Mx, My from the exact section properties, X = x − xc, Y = y − yc from the (E-weighted)
 * centroid, D = Ixx·Iyy − Ixy²: n/A, n(Iyy·Y − Ixy·X)/D, n(Ixy·Y − Ixx·X)/D;</li>
 * <li>τzx, τzy per unit T: the exact closed form τ = T·r/J about the centre for circles and tubes
 * ({@link SectionProperties#torsionClosedForm()}), otherwise the smoothed finite-element warping field
 * ({@link FiniteElementSolution#unitStresses(Point2, boolean)} at the node);</li>
 * <li>τzx, τzy per unit Vx and Vy: the finite-element shear functions when the solution has them (homogeneous
 * sections); otherwise (composite sections) the elementary shear flow on straight cuts as
 * {@link PointStressOp} computes it, each cut computed once per distinct y (and x) of the nodes (a warning says
 * so).</li>
 * </ul>
 * These are the methods {@link PointStressOp#evaluate(Section, SectionProperties, FiniteElementSolution,
 * ShearMethod, InternalForces, Point2, String, String)} uses with {@link ShearMethod#finiteElement}, which is
 * the reference: at a node the superposed stresses equal its result to round-off (PointStressOp reports
 * contributions below 1e-12 of the largest at the point as zero). At a node shared by parts of different
 * materials, the finite-element shear of each part is evaluated a distance 1e-10 × (node to element centroid)
 * inside an element of that part, so that the one-sided value of that part is taken; the change this makes is
 * of relative order 1e-10.
 * <p>
 * A sample is {@link #singular(int) singular} when it lies within {@link PointStressOp#SINGULAR_RADIUS} × the
 * section's bounding-box diagonal of a sharp re-entrant corner ({@link Mesh#singularities()}): the elastic
 * shear stress there grows with mesh refinement.
 *
 * @since 0.1
 */
public final class UnitStressField {

    /** Relative step from a node towards an element's centroid used to take one part's one-sided value. */
    static final double ONE_SIDED_STEP = 1e-10;

    private final String section;
    private final int size;
    private final double[] x;
    private final double[] y;
    private final int[] node;
    private final int[] part;
    private final boolean[] singular;
    private final String[] partMaterial;
    // coefficients, structure of arrays
    private final double[] sN;
    private final double[] sMx;
    private final double[] sMy;
    private final double[] tTx;
    private final double[] tTy;
    private final double[] tVxX;
    private final double[] tVxY;
    private final double[] tVyX;
    private final double[] tVyY;
    private final String shearMethod;
    private final String torsionMethod;
    private final List<String> warnings;

    private UnitStressField(Builder b) {
        this.section = b.section.name();
        this.size = b.count;
        this.x = Arrays.copyOf(b.x, size);
        this.y = Arrays.copyOf(b.y, size);
        this.node = Arrays.copyOf(b.node, size);
        this.part = Arrays.copyOf(b.part, size);
        this.singular = Arrays.copyOf(b.singular, size);
        this.sN = Arrays.copyOf(b.c[0], size);
        this.sMx = Arrays.copyOf(b.c[1], size);
        this.sMy = Arrays.copyOf(b.c[2], size);
        this.tTx = Arrays.copyOf(b.c[3], size);
        this.tTy = Arrays.copyOf(b.c[4], size);
        this.tVxX = Arrays.copyOf(b.c[5], size);
        this.tVxY = Arrays.copyOf(b.c[6], size);
        this.tVyX = Arrays.copyOf(b.c[7], size);
        this.tVyY = Arrays.copyOf(b.c[8], size);
        this.partMaterial = b.section.parts().stream().map(p -> p.material().name()).toArray(String[]::new);
        this.shearMethod = b.shearMethod;
        this.torsionMethod = b.torsionMethod;
        this.warnings = List.copyOf(b.warnings);
    }

    /**
     * Samples the unit fields of {@code section}.
     *
     * @param section the section
     * @param props   its properties with torsion ({@code SectionAnalysisService.properties}); the exact σz
     *                coefficients and the closed-form torsion of circles and tubes come from here
     * @param fe      its finite-element solution ({@code SectionAnalysisService.solution}); the sample points
     *                are its mesh nodes
     * @throws IllegalArgumentException when an argument is null or {@code fe} was solved for another section
     */
    public static UnitStressField of(Section section, SectionProperties props, FiniteElementSolution fe) {
        if (section == null || props == null || fe == null) {
            throw new IllegalArgumentException("section, props and fe must not be null (got " + section + ", "
                    + (props == null ? null : props.section()) + ", " + fe + ")");
        }
        if (!section.name().equals(props.section())) {
            throw new IllegalArgumentException("props: properties of section '" + props.section()
                    + "' given for section '" + section.name() + "'");
        }
        return new Builder(section, props, fe).build();
    }

    /** @return the section id */
    public String section() {
        return section;
    }

    /** @return number of sample points */
    public int size() {
        return size;
    }

    /** @return x of sample i, section frame, length unit */
    public double x(int i) {
        return x[i];
    }

    /** @return y of sample i, section frame, length unit */
    public double y(int i) {
        return y[i];
    }

    /** @return sample i as a point */
    public Point2 point(int i) {
        return new Point2(x[i], y[i]);
    }

    /** @return the mesh node of sample i */
    public int node(int i) {
        return node[i];
    }

    /** @return the section part (index) sample i belongs to */
    public int part(int i) {
        return part[i];
    }

    /** @return the material id of sample i */
    public String material(int i) {
        return partMaterial[part[i]];
    }

    /** @return true when sample i is within the singular radius of a sharp re-entrant corner */
    public boolean singular(int i) {
        return singular[i];
    }

    /** @return how τ from Vx, Vy was obtained: {@link PointStressOp#SHEAR_FINITE_ELEMENT} or {@code SHEAR_ELEMENTARY} */
    public String shearMethod() {
        return shearMethod;
    }

    /** @return how τ from T was obtained: {@link PointStressOp#TORSION_EXACT_CIRCULAR} or {@code TORSION_FINITE_ELEMENT} */
    public String torsionMethod() {
        return torsionMethod;
    }

    /** @return notes on the methods (e.g. elementary shear for a composite section); empty when none */
    public List<String> warnings() {
        return warnings;
    }

    /** @return σz at sample i under {@code f}, stress unit */
    public double sigmaZ(int i, InternalForces f) {
        return sN[i] * f.n() + sMx[i] * f.mx() + sMy[i] * f.my();
    }

    /** @return τzx at sample i under {@code f}, stress unit */
    public double tauZX(int i, InternalForces f) {
        return tTx[i] * f.t() + tVxX[i] * f.vx() + tVyX[i] * f.vy();
    }

    /** @return τzy at sample i under {@code f}, stress unit */
    public double tauZY(int i, InternalForces f) {
        return tTy[i] * f.t() + tVxY[i] * f.vx() + tVyY[i] * f.vy();
    }

    /** @return the stress state at sample i under {@code f} */
    public StressComponents stress(int i, InternalForces f) {
        return new StressComponents(sigmaZ(i, f), tauZX(i, f), tauZY(i, f));
    }

    /**
     * Fills the stresses of every sample under {@code f} (no allocation: callers reuse the arrays across cases).
     *
     * @throws IllegalArgumentException when an array is shorter than {@link #size()}
     */
    public void evaluate(InternalForces f, double[] sigmaZ, double[] tauZX, double[] tauZY) {
        if (sigmaZ.length < size || tauZX.length < size || tauZY.length < size) {
            throw new IllegalArgumentException("evaluate: arrays must hold " + size + " values, got " + sigmaZ.length
                    + ", " + tauZX.length + ", " + tauZY.length);
        }
        double n = f.n(), mx = f.mx(), my = f.my(), t = f.t(), vx = f.vx(), vy = f.vy();
        for (int i = 0; i < size; i++) {
            sigmaZ[i] = sN[i] * n + sMx[i] * mx + sMy[i] * my;
            tauZX[i] = tTx[i] * t + tVxX[i] * vx + tVyX[i] * vy;
            tauZY[i] = tTy[i] * t + tVxY[i] * vx + tVyY[i] * vy;
        }
    }

    /**
     * The envelope kernel over these samples ({@link EnvelopeKernel}: many cases at machine speed), reading this
     * field's nine coefficient arrays in place: no copy is made and the kernel never writes them. Kernel point i
     * is sample i; a1..a3 are σz per unit N, Mx, My, b1..b3 τzx and c1..c3 τzy per unit T, Vx, Vy.
     *
     * @return a new kernel (cheap: one pass over the arrays to check they are finite)
     */
    public EnvelopeKernel envelopeKernel() {
        return new EnvelopeKernel(sN, sMx, sMy, tTx, tVxX, tVyX, tTy, tVxY, tVyY);
    }

    /** Collects the samples. */
    private static final class Builder {
        final Section section;
        final SectionProperties props;
        final FiniteElementSolution fe;
        final List<String> warnings = new ArrayList<>();
        int count;
        double[] x;
        double[] y;
        int[] node;
        int[] part;
        boolean[] singular;
        final double[][] c = new double[9][];
        String shearMethod;
        String torsionMethod;

        Builder(Section section, SectionProperties props, FiniteElementSolution fe) {
            this.section = section;
            this.props = props;
            this.fe = fe;
        }

        UnitStressField build() {
            Mesh m = fe.mesh();
            int nn = m.nodeCount(), np = section.parts().size();
            // first element of each part at each node
            int[] first = new int[np * nn];
            Arrays.fill(first, -1);
            for (int e = 0; e < m.elementCount(); e++) {
                int p = m.part(e);
                if (p < 0 || p >= np) {
                    throw new IllegalArgumentException("fe: mesh part index " + p + " does not exist in section '"
                            + section.name() + "' (" + np + " parts)");
                }
                for (int k = 0; k < 6; k++) {
                    int idx = p * nn + m.node(e, k);
                    if (first[idx] < 0) {
                        first[idx] = e;
                    }
                }
            }
            int cap = nn + nn / 8 + 8;
            alloc(cap);
            double eRef = section.referenceMaterial().e();
            double xc = props.centroid().x(), yc = props.centroid().y();
            double ixx = props.ixx(), iyy = props.iyy(), ixy = props.ixy();
            double d = ixx * iyy - ixy * ixy;
            double a = props.area();
            boolean closedTorsion = props.torsionClosedForm();
            boolean feShear = fe.hasShearFields();
            torsionMethod = closedTorsion ? PointStressOp.TORSION_EXACT_CIRCULAR : PointStressOp.TORSION_FINITE_ELEMENT;
            shearMethod = feShear ? PointStressOp.SHEAR_FINITE_ELEMENT : PointStressOp.SHEAR_ELEMENTARY;
            if (!feShear) {
                warnings.add("section '" + section.name() + "': composite section: shear stresses from Vx, Vy by the"
                        + " elementary method (shear flow VQ/(I·t) on straight cuts, an average across each cut), as"
                        + " the stress command gives them; the finite-element shear functions are computed for"
                        + " homogeneous sections only");
            }
            ElementaryShear elementary = feShear ? null : new ElementaryShear(section, props);
            double near = PointStressOp.SINGULAR_RADIUS * section.bounds().diagonal();
            List<Singularity> corners = m.singularities();
            List<Integer> partsHere = new ArrayList<>(np);
            for (int i = 0; i < nn; i++) {
                partsHere.clear();
                List<String> mats = new ArrayList<>(np);
                for (int p = 0; p < np; p++) {
                    if (first[p * nn + i] >= 0) {
                        String mat = section.parts().get(p).material().name();
                        if (!mats.contains(mat)) {
                            mats.add(mat);
                            partsHere.add(p);
                        }
                    }
                }
                if (partsHere.isEmpty()) {
                    continue; // a node no element uses: not part of the section
                }
                double px = m.x(i), py = m.y(i);
                Point2 at = new Point2(px, py);
                boolean sing = false;
                for (Singularity s : corners) {
                    if (Math.hypot(s.x() - px, s.y() - py) <= near) {
                        sing = true;
                        break;
                    }
                }
                double bx = px - xc, by = py - yc;
                // elementary shear does not depend on the part: the cut's flow is shared
                double[] elem = feShear ? null : elementary.at(px, py);
                UnitShear[] shared = null;
                for (int p : partsHere) {
                    double n = section.parts().get(p).material().e() / eRef;
                    if (count == x.length) {
                        alloc(2 * count);
                    }
                    int s = count++;
                    x[s] = px;
                    y[s] = py;
                    node[s] = i;
                    part[s] = p;
                    singular[s] = sing;
                    c[0][s] = n / a;
                    c[1][s] = n * (iyy * by - ixy * bx) / d;
                    c[2][s] = n * (ixy * by - ixx * bx) / d;
                    UnitShear[] u;
                    if (closedTorsion && !feShear) {
                        u = null;
                    } else if (partsHere.size() == 1) {
                        if (shared == null) {
                            shared = fe.unitStresses(at, false);
                        }
                        u = shared;
                    } else {
                        u = fe.unitStresses(oneSided(m, first[p * nn + i], px, py), false);
                    }
                    if (closedTorsion) {
                        double j = props.j();
                        double rx = px - props.shearCentre().x(), ry = py - props.shearCentre().y();
                        c[3][s] = -ry / j;
                        c[4][s] = rx / j;
                    } else {
                        c[3][s] = u[0].tauZX();
                        c[4][s] = u[0].tauZY();
                    }
                    if (feShear) {
                        c[5][s] = u[1].tauZX();
                        c[6][s] = u[1].tauZY();
                        c[7][s] = u[2].tauZX();
                        c[8][s] = u[2].tauZY();
                    } else {
                        c[5][s] = elem[0];
                        c[6][s] = elem[1];
                        c[7][s] = elem[2];
                        c[8][s] = elem[3];
                    }
                }
            }
            return new UnitStressField(this);
        }

        /** The node moved {@link #ONE_SIDED_STEP} of the way towards the centroid of element e. */
        private static Point2 oneSided(Mesh m, int e, double px, double py) {
            double cx = 0, cy = 0;
            for (int k = 0; k < 3; k++) {
                cx += m.x(m.node(e, k)) / 3;
                cy += m.y(m.node(e, k)) / 3;
            }
            return new Point2(px + ONE_SIDED_STEP * (cx - px), py + ONE_SIDED_STEP * (cy - py));
        }

        private void alloc(int cap) {
            x = x == null ? new double[cap] : Arrays.copyOf(x, cap);
            y = y == null ? new double[cap] : Arrays.copyOf(y, cap);
            node = node == null ? new int[cap] : Arrays.copyOf(node, cap);
            part = part == null ? new int[cap] : Arrays.copyOf(part, cap);
            singular = singular == null ? new boolean[cap] : Arrays.copyOf(singular, cap);
            for (int k = 0; k < 9; k++) {
                c[k] = c[k] == null ? new double[cap] : Arrays.copyOf(c[k], cap);
            }
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "UnitStressField[section=%s, samples=%d, shear=%s, torsion=%s]", section, size,
                shearMethod, torsionMethod);
    }
}
