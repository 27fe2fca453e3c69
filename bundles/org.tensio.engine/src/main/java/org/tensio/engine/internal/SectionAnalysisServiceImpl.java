package org.tensio.engine.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;
import org.tensio.engine.fem.FiniteElementSolution;
import org.tensio.engine.fem.SectionSolver;
import org.tensio.engine.geometry.Point2;
import org.tensio.engine.io.ProjectFormatException;
import org.tensio.engine.io.ProjectReader;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.loads.InternalForces;
import org.tensio.engine.mesh.Mesh;
import org.tensio.engine.mesh.MeshGenerator;
import org.tensio.engine.mesh.MeshOptions;
import org.tensio.engine.project.Project;
import org.tensio.engine.project.Station;
import org.tensio.engine.properties.SectionProperties;
import org.tensio.engine.properties.SectionPropertiesOp;
import org.tensio.engine.section.Section;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.engine.spi.CheckCriterion;
import org.tensio.engine.spi.Extensions;
import org.tensio.engine.spi.ProfileType;
import org.tensio.engine.stress.PointStress;
import org.tensio.engine.stress.PointStressOp;
import org.tensio.engine.stress.ShearMethod;

/**
 * The engine service. Thread-safe: its state is a small LRU cache of finite-element solutions keyed by
 * section instance (identity), so a project read once is solved once, and the contributions DS binds, guarded by
 * their own lock. Binding or unbinding a contribution validates that one only; the {@link Extensions} in force
 * are rebuilt once, on the next use after a change, not on every bind.
 */
@Component(service = SectionAnalysisService.class)
public final class SectionAnalysisServiceImpl implements SectionAnalysisService {

    /** Solutions kept; each holds its mesh and fields (a few MB for the default mesh). */
    private static final int CACHE_SIZE = 32;

    /** Torsion source when the finite-element solution failed. */
    public static final String FAILED = "finiteElementFailed";

    private final Map<Section, FiniteElementSolution> cache = new LinkedHashMap<>(16, 0.75f, true) {
        private static final long serialVersionUID = 1L;

        @Override
        protected boolean removeEldestEntry(Map.Entry<Section, FiniteElementSolution> eldest) {
            return size() > CACHE_SIZE;
        }
    };

    /** Guards the bound contributions; DS may bind and unbind from several threads. */
    private final Object lock = new Object();
    private final System.Logger log = System.getLogger(getClass().getName());
    private final BoundContributions<CheckCriterion> boundCriteria = new BoundContributions<>(CheckCriterion::id,
            c -> Extensions.of(c, List.of()), log);
    private final BoundContributions<ProfileType> boundProfileTypes = new BoundContributions<>(ProfileType::type,
            p -> Extensions.of(List.of(), p), log);
    /** The extensions in force; null after a bind or unbind until the next use rebuilds them (under the lock). */
    private volatile Extensions extensions;

    /** The DS component (contributions arrive through the references below) or an engine without any. */
    public SectionAnalysisServiceImpl() {
        this(Extensions.none());
    }

    /** @param extensions contributions found outside OSGi */
    public SectionAnalysisServiceImpl(Extensions extensions) {
        this.extensions = extensions == null ? Extensions.none() : extensions;
    }

    /**
     * DS: a contributed criterion service (registered by org.tensio.extensions from the extension registry). A
     * malformed or built-in id, or an id already bound, is refused and logged; of clashing contributions the first
     * bound is in force.
     */
    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    void addCriterion(CheckCriterion criterion) {
        synchronized (lock) {
            boundCriteria.add(criterion);
            extensions = null;
        }
    }

    void removeCriterion(CheckCriterion criterion) {
        synchronized (lock) {
            boundCriteria.remove(criterion);
            extensions = null;
        }
    }

    /** DS: a contributed profile type service; refused and logged like {@link #addCriterion}. */
    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY)
    void addProfileType(ProfileType type) {
        synchronized (lock) {
            boundProfileTypes.add(type);
            extensions = null;
        }
    }

    void removeProfileType(ProfileType type) {
        synchronized (lock) {
            boundProfileTypes.remove(type);
            extensions = null;
        }
    }

    /**
     * The contributions in force. After binds or unbinds the first call rebuilds them once from the bound
     * contributions (each was validated when bound, so this build does not throw); later calls return that
     * instance.
     */
    @Override
    public Extensions extensions() {
        Extensions e = extensions;
        if (e == null) {
            synchronized (lock) {
                e = extensions;
                if (e == null) {
                    e = Extensions.of(boundCriteria.inForce(), boundProfileTypes.inForce());
                    extensions = e;
                }
            }
        }
        return e;
    }

    @Override
    public Project readProject(Path file) throws ProjectFormatException, IOException {
        return ProjectReader.read(file, extensions());
    }

    @Override
    public Project parseProject(String json, String sourceName) throws ProjectFormatException {
        return parseProject(json, sourceName, null);
    }

    @Override
    public Project parseProject(String json, String sourceName, Path baseDir) throws ProjectFormatException {
        return ProjectReader.parse(json, sourceName, baseDir, extensions());
    }

    @Override
    public SectionProperties properties(Section section) {
        SectionProperties p = SectionPropertiesOp.compute(section);
        if (p.torsionClosedForm()) {
            return p;
        }
        try {
            FiniteElementSolution f = solution(section);
            return p.withTorsion(f.jWarping(), f.shearCentre(), f.cw(), SectionProperties.FINITE_ELEMENT);
        } catch (RuntimeException e) {
            return p.withTorsion(null, null, null, FAILED);
        }
    }

    @Override
    public FiniteElementSolution solution(Section section) {
        synchronized (cache) {
            for (Map.Entry<Section, FiniteElementSolution> e : cache.entrySet()) {
                if (e.getKey() == section) {
                    return cache.get(e.getKey());
                }
            }
        }
        FiniteElementSolution f = solution(section, MeshOptions.defaults(), null);
        synchronized (cache) {
            cache.put(section, f);
        }
        return f;
    }

    @Override
    public FiniteElementSolution solution(Section section, MeshOptions options, ProgressMonitor monitor) {
        Mesh mesh = MeshGenerator.generate(section, options, monitor);
        return SectionSolver.solve(section, mesh, monitor);
    }

    @Override
    public PointStress stressAt(Project project, String stationId, String caseId, Point2 point) {
        return stressAt(project, stationId, caseId, point, ShearMethod.finiteElement);
    }

    @Override
    public PointStress stressAt(Project project, String stationId, String caseId, Point2 point, ShearMethod shearMethod) {
        Station st = project.station(stationId);
        InternalForces f = project.forces(stationId, caseId);
        Section s = project.section(st.sectionId());
        SectionProperties props = properties(s);
        FiniteElementSolution fe = props.torsionSource() != null && props.torsionSource().equals(FAILED) ? null
                : needsFields(props, f, shearMethod) ? solution(s) : null;
        return PointStressOp.evaluate(s, props, fe, shearMethod, f, point, stationId, caseId);
    }

    private static boolean needsFields(SectionProperties p, InternalForces f, ShearMethod m) {
        boolean shear = m == ShearMethod.finiteElement && (f.vx() != 0 || f.vy() != 0);
        boolean torsion = !p.torsionClosedForm() && f.t() != 0;
        return shear || torsion;
    }
}
