package org.tensio.ui.services;

import java.time.Duration;
import java.util.Optional;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.FrameworkUtil;
import org.osgi.util.tracker.ServiceTracker;
import org.tensio.engine.service.SectionAnalysisService;

/**
 * Tracks the engine's {@link SectionAnalysisService} DS component for a UI part. Callers get an
 * {@link Optional}, never {@code null}; {@link #close()} when the part is disposed.
 */
public final class AnalysisServiceTracker implements AutoCloseable {

    private final ServiceTracker<SectionAnalysisService, SectionAnalysisService> tracker;

    /**
     * Opens a tracker in the bundle context of {@code owner}'s bundle.
     *
     * @throws IllegalStateException when that bundle is not started (no bundle context)
     */
    public AnalysisServiceTracker(Class<?> owner) {
        Bundle bundle = FrameworkUtil.getBundle(owner);
        BundleContext context = bundle == null ? null : bundle.getBundleContext();
        if (context == null) {
            throw new IllegalStateException("owner " + owner.getName() + ": bundle not started, no context"); //$NON-NLS-1$ //$NON-NLS-2$
        }
        tracker = new ServiceTracker<>(context, SectionAnalysisService.class, null);
        tracker.open();
    }

    /**
     * Waits up to {@code timeout} for the service; call off the UI thread.
     *
     * @return the service, or empty when none is registered in time
     */
    public Optional<SectionAnalysisService> await(Duration timeout) throws InterruptedException {
        return Optional.ofNullable(tracker.waitForService(timeout.toMillis()));
    }

    @Override
    public void close() {
        tracker.close();
    }
}
