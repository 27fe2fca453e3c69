package org.tensio.cli;

import java.util.Map;

import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.loads.ForceComponent;
import org.tensio.engine.mesh.Singularity;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PrincipalStresses;
import org.tensio.engine.stress.StressComponents;
import org.tensio.engine.units.UnitSystem;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;

/**
 * JSON views of engine results. The keys named in the project's issues are stable: other tools read them.
 * Extra keys may be added, never renamed. Absent values are JSON {@code null}.
 */
final class Json {

    static final Gson GSON = new GsonBuilder().serializeNulls().setPrettyPrinting().disableHtmlEscaping().create();

    private Json() {
    }

    static JsonObject units(UnitSystem u) {
        JsonObject o = new JsonObject();
        o.addProperty("length", u.length());
        o.addProperty("force", u.force());
        o.addProperty("stress", u.stressUnit());
        o.addProperty("moment", u.momentUnit());
        return o;
    }

    static JsonObject point(Point2 p) {
        JsonObject o = new JsonObject();
        o.addProperty("x", p.x());
        o.addProperty("y", p.y());
        return o;
    }

    static JsonObject properties(SectionProperties p, TorsionReport t, UnitSystem u) {
        JsonObject o = properties(p, u);
        o.add("finiteElement", finiteElement(t));
        return o;
    }

    /** The finite-element block: J bracket, shear coefficients, mesh, singular corners, residuals, convergence. */
    static JsonObject finiteElement(TorsionReport t) {
        JsonObject o = new JsonObject();
        if (t.solution() == null) {
            o.addProperty("error", t.error());
            return o;
        }
        FiniteElementSolution f = t.solution();
        o.addProperty("JWarping", f.jWarping());
        o.addProperty("JStressFunction", f.jPrandtl());
        o.addProperty("JBracket", f.jBracket());
        o.add("shearCentre", point(f.shearCentre()));
        o.addProperty("Cw", f.cw());
        var k = t.shearCoefficients();
        if (k != null) {
            JsonObject sc = new JsonObject();
            sc.addProperty("kx", k.get(0));
            sc.addProperty("ky", k.get(1));
            sc.addProperty("coupling", f.shearAreas()[2]);
            sc.addProperty("method", "energy");
            o.add("shearCoefficients", sc);
        } else {
            o.add("shearCoefficients", JsonNull.INSTANCE);
        }
        o.addProperty("peakTorsionStressPerUnitTorque", f.peakUnitTorsionStress());
        o.add("peakTorsionStressAt", point(f.peakUnitTorsionAt()));
        JsonObject m = new JsonObject();
        m.addProperty("elements", f.mesh().elementCount());
        m.addProperty("nodes", f.mesh().nodeCount());
        m.addProperty("elementType", "6-node triangle");
        m.addProperty("minAngleDeg", f.mesh().minAngleDeg());
        o.add("mesh", m);
        JsonArray sing = new JsonArray();
        for (Singularity s : f.mesh().singularities()) {
            JsonObject so = new JsonObject();
            so.addProperty("x", s.x());
            so.addProperty("y", s.y());
            so.addProperty("interiorAngleDeg", s.interiorAngleDeg());
            so.addProperty("note", "sharp re-entrant corner: peak shear stress here is singular; model the fillet");
            sing.add(so);
        }
        o.add("singularCorners", sing);
        JsonArray eq = new JsonArray();
        for (double d : f.equilibriumErrors()) {
            eq.add(d);
        }
        o.add("equilibriumResiduals", eq);
        if (t.refined() != null) {
            FiniteElementSolution r = t.refined();
            JsonObject c = new JsonObject();
            c.addProperty("elementsRefined", r.mesh().elementCount());
            c.addProperty("JWarpingRefined", r.jWarping());
            c.addProperty("peakTorsionStressPerUnitTorqueRefined", r.peakUnitTorsionStress());
            c.addProperty("JChange", (r.jWarping() - f.jWarping()) / r.jWarping());
            c.addProperty("peakChange", (r.peakUnitTorsionStress() - f.peakUnitTorsionStress()) / r.peakUnitTorsionStress());
            o.add("convergence", c);
        }
        return o;
    }

    static JsonObject properties(SectionProperties p, UnitSystem u) {
        JsonObject o = new JsonObject();
        o.addProperty("section", p.section());
        o.add("units", units(u));
        o.addProperty("area", p.area());
        o.add("centroid", point(p.centroid()));
        o.addProperty("Ixx", p.ixx());
        o.addProperty("Iyy", p.iyy());
        o.addProperty("Ixy", p.ixy());
        o.addProperty("I1", p.i1());
        o.addProperty("I2", p.i2());
        o.addProperty("principalAngleDeg", p.principalAngleDeg());
        o.addProperty("rx", p.rx());
        o.addProperty("ry", p.ry());
        o.addProperty("Zx", p.zx());
        o.addProperty("Zy", p.zy());
        o.addProperty("J", p.j());
        o.add("shearCentre", p.shearCentre() == null ? JsonNull.INSTANCE : point(p.shearCentre()));
        o.addProperty("Cw", p.cw());
        JsonObject el = new JsonObject();
        el.addProperty("SxTop", p.sxTop());
        el.addProperty("SxBottom", p.sxBottom());
        el.addProperty("SyRight", p.syRight());
        el.addProperty("SyLeft", p.syLeft());
        o.add("elasticModuli", el);
        JsonObject pna = new JsonObject();
        pna.addProperty("y", p.plasticAxisY());
        pna.addProperty("x", p.plasticAxisX());
        o.add("plasticNeutralAxes", pna);
        o.addProperty("torsionMethod", p.torsionSource());
        o.addProperty("referenceMaterial", p.referenceMaterial());
        o.addProperty("composite", p.composite());
        JsonObject b = new JsonObject();
        b.addProperty("minX", p.minX());
        b.addProperty("minY", p.minY());
        b.addProperty("maxX", p.maxX());
        b.addProperty("maxY", p.maxY());
        o.add("bounds", b);
        return o;
    }

    static JsonObject stress(PointStress s, String sectionId, UnitSystem u) {
        JsonObject o = new JsonObject();
        o.addProperty("station", s.station());
        o.addProperty("case", s.caseId());
        o.add("point", point(s.point()));
        StressComponents t = s.total();
        PrincipalStresses p = s.principal();
        o.addProperty("sigmaZ", s.sigmaZ());
        o.addProperty("tauZX", t == null ? null : t.tauZX());
        o.addProperty("tauZY", t == null ? null : t.tauZY());
        o.addProperty("sigma1", p == null ? null : p.sigma1());
        o.addProperty("sigma2", p == null ? null : p.sigma2());
        o.addProperty("sigma3", p == null ? null : p.sigma3());
        o.addProperty("tauMax", p == null ? null : p.tauMax());
        o.addProperty("vonMises", p == null ? null : p.vonMises());
        o.addProperty("tresca", p == null ? null : p.tresca());
        o.addProperty("shearMethod", s.shearMethod());
        o.addProperty("torsionMethod", s.torsionMethod());
        o.addProperty("section", sectionId);
        o.addProperty("material", s.material());
        o.add("units", units(u));
        JsonObject f = new JsonObject();
        for (ForceComponent c : ForceComponent.values()) {
            f.addProperty(c.key(), s.forces().get(c));
        }
        o.add("forces", f);
        JsonObject contrib = new JsonObject();
        for (Map.Entry<ForceComponent, StressComponents> e : s.contributions().entrySet()) {
            JsonObject c = new JsonObject();
            c.addProperty("sigmaZ", e.getValue().sigmaZ());
            c.addProperty("tauZX", e.getValue().tauZX());
            c.addProperty("tauZY", e.getValue().tauZY());
            contrib.add(e.getKey().key(), c);
        }
        o.add("contributions", contrib);
        if (p != null) {
            JsonObject d = new JsonObject();
            d.add("sigma1", vector(p.dir1()));
            d.add("sigma2", vector(p.dir2()));
            d.add("sigma3", vector(p.dir3()));
            o.add("principalDirections", d);
        }
        if (s.shearCuts() != null) {
            JsonObject cuts = new JsonObject();
            JsonObject h = new JsonObject();
            h.addProperty("Qx", s.shearCuts().qxHorizontal());
            h.addProperty("Qy", s.shearCuts().qyHorizontal());
            h.addProperty("width", s.shearCuts().widthHorizontal());
            JsonObject v = new JsonObject();
            v.addProperty("Qx", s.shearCuts().qxVertical());
            v.addProperty("Qy", s.shearCuts().qyVertical());
            v.addProperty("width", s.shearCuts().widthVertical());
            cuts.add("parallelToX", h);
            cuts.add("parallelToY", v);
            o.add("shearCuts", cuts);
        }
        JsonArray w = new JsonArray();
        s.warnings().forEach(w::add);
        o.add("warnings", w);
        o.addProperty("caution", Caution.TEXT);
        return o;
    }

    private static JsonArray vector(double[] v) {
        JsonArray a = new JsonArray();
        for (double d : v) {
            a.add(d);
        }
        return a;
    }
}
