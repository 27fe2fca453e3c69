package org.tensio.ui.results.markers;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.resources.WorkspaceJob;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.osgi.util.NLS;
import org.tensio.engine.checks.CheckResult;
import org.tensio.ui.results.model.ResultsText;
import org.tensio.ui.results.model.ResultsTree;
import org.tensio.ui.results.preferences.ResultsPreferences;

/**
 * Problems markers ({@value #TYPE}, a problem marker, not persistent) of the checks of one project file: one
 * marker per check result with utilisation &gt; 1 (error) or above the warning threshold
 * ({@link ResultsPreferences#warningThreshold()}, warning); one error marker when the file cannot be read or
 * checked. Each update replaces every marker of this type on the file, so markers clear when results improve.
 * Files outside the workspace get their markers on a link ({@link ExternalFiles}). Updates run as workspace jobs
 * with the file's scheduling rule, in request order.
 */
public final class CheckMarkers {

    /** Marker type declared in plugin.xml. */
    public static final String TYPE = "org.tensio.ui.results.checkProblem"; //$NON-NLS-1$
    /** Marker attributes: the check's station, case, criterion and material ids, and its utilisation. */
    public static final String STATION = "station"; //$NON-NLS-1$
    /** Case or combination id attribute. */
    public static final String CASE = "case"; //$NON-NLS-1$
    /** Criterion attribute. */
    public static final String CRITERION = "criterion"; //$NON-NLS-1$
    /** Material attribute. */
    public static final String MATERIAL = "material"; //$NON-NLS-1$
    /** Utilisation attribute (a string: the double's shortest decimal form). */
    public static final String UTILISATION = "utilisation"; //$NON-NLS-1$

    /** Job family of the marker updates. */
    public static final Object JOB_FAMILY = CheckMarkers.class;

    private CheckMarkers() {
    }

    /** Schedules the update of the markers of {@code tree}'s file to its results (no-op without a file). */
    public static void update(ResultsTree tree) {
        if (tree.file().isEmpty()) {
            return;
        }
        double threshold = ResultsPreferences.warningThreshold();
        Path file = tree.file().get();
        Job job = new Job(file, tree, threshold);
        job.setRule(ResourcesPlugin.getWorkspace().getRoot());
        job.setSystem(true);
        job.schedule();
    }

    /** @return the markers of this type on {@code file}'s workspace file (none when it has none) */
    public static IMarker[] markers(Path file) throws CoreException {
        Optional<IFile> f = ExternalFiles.find(file);
        return f.isPresent() && f.get().exists() ? f.get().findMarkers(TYPE, false, IResource.DEPTH_ZERO)
                : new IMarker[0];
    }

    private static final class Job extends WorkspaceJob {
        private final Path file;
        private final ResultsTree tree;
        private final double threshold;

        Job(Path file, ResultsTree tree, double threshold) {
            super(NLS.bind(Messages.CheckMarkers_job, file.getFileName()));
            this.file = file;
            this.tree = tree;
            this.threshold = threshold;
        }

        @Override
        public boolean belongsTo(Object family) {
            return family == JOB_FAMILY;
        }

        @Override
        public IStatus runInWorkspace(IProgressMonitor monitor) throws CoreException {
            boolean any = tree.failed() || tree.report() != null
                    && tree.report().results().stream().anyMatch(r -> r.utilisation() > threshold);
            Optional<IFile> existing = ExternalFiles.find(file);
            if (!any && existing.isEmpty()) {
                return Status.OK_STATUS; // nothing to show, nothing to clear
            }
            IFile target = existing.isPresent() ? existing.get() : ExternalFiles.findOrLink(file, monitor);
            if (!target.exists()) {
                return Status.OK_STATUS;
            }
            target.deleteMarkers(TYPE, false, IResource.DEPTH_ZERO);
            if (tree.failed()) {
                Map<String, Object> a = new HashMap<>();
                a.put(IMarker.SEVERITY, IMarker.SEVERITY_ERROR);
                a.put(IMarker.MESSAGE, tree.message());
                a.put(IMarker.LOCATION, String.valueOf(file.getFileName()));
                target.createMarker(TYPE, a);
                return Status.OK_STATUS;
            }
            for (CheckResult r : tree.report().results()) {
                if (r.utilisation() <= threshold) {
                    continue;
                }
                Map<String, Object> a = new HashMap<>();
                boolean error = !r.passed();
                a.put(IMarker.SEVERITY, error ? IMarker.SEVERITY_ERROR : IMarker.SEVERITY_WARNING);
                a.put(IMarker.MESSAGE, NLS.bind(error ? Messages.CheckMarkers_failed : Messages.CheckMarkers_close,
                        new Object[] { r.station(), r.caseId(), r.criterion(), r.material(),
                                ResultsText.number(r.utilisation()), ResultsText.number(threshold),
                                String.format(Locale.ROOT, "(%s, %s)", ResultsText.number(r.point().x()), //$NON-NLS-1$
                                        ResultsText.number(r.point().y())) }));
                a.put(IMarker.LOCATION, r.station() + " / " + r.caseId()); //$NON-NLS-1$
                a.put(STATION, r.station());
                a.put(CASE, r.caseId());
                a.put(CRITERION, r.criterion());
                a.put(MATERIAL, r.material());
                a.put(UTILISATION, Double.toString(r.utilisation()));
                target.createMarker(TYPE, a);
            }
            return Status.OK_STATUS;
        }
    }
}
