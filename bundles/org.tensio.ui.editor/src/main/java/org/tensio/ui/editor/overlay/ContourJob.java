package org.tensio.ui.editor.overlay;

import java.time.Duration;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.osgi.util.NLS;
import org.tensio.engine.linalg.ProgressMonitor;
import org.tensio.engine.service.SectionAnalysisService;
import org.tensio.ui.services.AnalysisServiceTracker;

/**
 * Computes an overlay ({@link ContourOp}) in a background job with progress and cancel; the result goes to a
 * callback (the editor page moves it to the UI thread). The UI thread never waits for it.
 */
public final class ContourJob extends Job {

    /** Job family of contour jobs. */
    public static final Object FAMILY = ContourJob.class;
    private static final Duration SERVICE_TIMEOUT = Duration.ofSeconds(30);
    private static final int WORK = 1000;

    private final ContourRequest request;
    private final AnalysisServiceTracker services;
    private final Consumer<ContourResult> done;
    private final Consumer<String> failed;

    /** @param done called from the job's thread with the result; {@code failed} with a message */
    public ContourJob(ContourRequest request, AnalysisServiceTracker services, Consumer<ContourResult> done,
            Consumer<String> failed) {
        super(NLS.bind(Messages.ContourJob_name, request.sectionId()));
        this.request = request;
        this.services = services;
        this.done = done;
        this.failed = failed;
        setUser(false);
        setPriority(Job.LONG);
    }

    /** @return what this job computes */
    public ContourRequest request() {
        return request;
    }

    @Override
    public boolean belongsTo(Object family) {
        return family == FAMILY;
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        monitor.beginTask(getName(), WORK);
        try {
            Optional<SectionAnalysisService> service = services.await(SERVICE_TIMEOUT);
            if (service.isEmpty()) {
                failed.accept(Messages.ContourJob_noService);
                return Status.OK_STATUS;
            }
            ProgressMonitor engineMonitor = new ProgressMonitor() {
                private int reported;

                @Override
                public void worked(double fraction) {
                    int now = (int) Math.round(fraction * WORK);
                    if (now > reported) {
                        monitor.worked(now - reported);
                        reported = now;
                    }
                }

                @Override
                public boolean isCancelled() {
                    return monitor.isCanceled();
                }
            };
            ContourResult result = ContourOp.compute(service.get(), request, engineMonitor);
            if (monitor.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            done.accept(result);
            return Status.OK_STATUS;
        } catch (CancellationException e) {
            return Status.CANCEL_STATUS;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return Status.CANCEL_STATUS;
        } catch (RuntimeException e) {
            failed.accept(e.getMessage() == null ? e.toString() : e.getMessage());
            return Status.OK_STATUS;
        } finally {
            monitor.done();
        }
    }
}
