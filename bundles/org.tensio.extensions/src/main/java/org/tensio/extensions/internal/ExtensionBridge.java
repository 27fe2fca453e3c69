package org.tensio.extensions.internal;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.IConfigurationElement;
import org.eclipse.core.runtime.IExtension;
import org.eclipse.core.runtime.IExtensionPoint;
import org.eclipse.core.runtime.IExtensionRegistry;
import org.eclipse.core.runtime.IRegistryEventListener;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.tensio.engine.spi.CheckCriterion;
import org.tensio.engine.spi.ProfileType;

/**
 * Turns the contributions to the extension points {@code org.tensio.extensions.criteria}, {@code .profileTypes}
 * and {@code .reportSections} into OSGi services under the interfaces they implement, so that the engine's DS
 * component (and the report writer's users) find them the OSGi way. Follows the registry: extensions added or
 * removed while running are registered or withdrawn. A contribution whose class cannot be created or does not
 * implement the point's interface is logged, naming the contributing bundle and class, and left out.
 */
@Component(immediate = true)
public final class ExtensionBridge implements IRegistryEventListener {

    static final String NAMESPACE = "org.tensio.extensions";
    static final String CRITERIA = NAMESPACE + ".criteria";
    static final String PROFILE_TYPES = NAMESPACE + ".profileTypes";
    static final String REPORT_SECTIONS = NAMESPACE + ".reportSections";

    private final List<ServiceRegistration<?>> registrations = new ArrayList<>();
    private IExtensionRegistry registry;
    private BundleContext context;

    /** DS: the Equinox extension registry. */
    @Reference
    void setRegistry(IExtensionRegistry r) {
        this.registry = r;
    }

    @Activate
    void activate(BundleContext bundleContext) {
        this.context = bundleContext;
        registry.addListener(this, NAMESPACE);
        sync();
    }

    @Deactivate
    void deactivate() {
        registry.removeListener(this);
        unregisterAll();
        context = null;
    }

    /** Registers every current contribution, after withdrawing the earlier registrations. */
    private synchronized void sync() {
        unregisterAll();
        if (context == null) {
            return;
        }
        register(CRITERIA, CheckCriterion.class);
        register(PROFILE_TYPES, ProfileType.class);
        try {
            register(REPORT_SECTIONS, ReportSections.type());
        } catch (LinkageError e) {
            log("report sections are not available (bundle org.tensio.cli missing): " + e);
        }
    }

    private void register(String pointId, Class<?> type) {
        IExtensionPoint point = registry.getExtensionPoint(pointId);
        if (point == null) {
            return;
        }
        for (IConfigurationElement e : point.getConfigurationElements()) {
            String contributor = e.getContributor().getName();
            String className = e.getAttribute("class");
            try {
                Object o = e.createExecutableExtension("class");
                if (!type.isInstance(o)) {
                    log(contributor + ": " + className + " contributed to " + pointId + " does not implement "
                            + type.getName());
                    continue;
                }
                registrations.add(context.registerService(type.getName(), o, null));
            } catch (CoreException | RuntimeException | LinkageError ex) {
                log(contributor + ": cannot create " + className + " contributed to " + pointId + ": " + ex);
            }
        }
    }

    private void unregisterAll() {
        for (ServiceRegistration<?> r : registrations) {
            try {
                r.unregister();
            } catch (IllegalStateException alreadyGone) {
                // the framework is stopping
            }
        }
        registrations.clear();
    }

    private static void log(String message) {
        System.getLogger(ExtensionBridge.class.getName()).log(System.Logger.Level.WARNING, message);
    }

    @Override
    public void added(IExtension[] extensions) {
        sync();
    }

    @Override
    public void removed(IExtension[] extensions) {
        sync();
    }

    @Override
    public void added(IExtensionPoint[] extensionPoints) {
        sync();
    }

    @Override
    public void removed(IExtensionPoint[] extensionPoints) {
        sync();
    }

    /** Kept apart so that a runtime without org.tensio.cli fails here only, with a LinkageError. */
    private static final class ReportSections {
        static Class<?> type() {
            return org.tensio.cli.report.spi.ReportSection.class;
        }
    }
}
