package org.tensio.ui.testsupport;

import static org.junit.jupiter.api.Assertions.fail;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import java.util.function.Predicate;

import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;

/**
 * Helpers for UI tests: run the event loop until a condition holds (no sleeps), find widgets. Every method runs on
 * the UI thread of {@code display}.
 */
public final class UiConditions {

    /** Longest time (ms) the loop sleeps when no event is pending, before it checks the condition again. */
    private static final int WAKE_UP_MS = 50;

    private UiConditions() {
    }

    /**
     * Dispatches events until {@code condition} holds; fails the test with {@code what} once {@code timeout} has
     * passed and it still does not.
     */
    public static void waitUntil(Display display, Duration timeout, String what, BooleanSupplier condition) {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() - deadline > 0) {
                fail("timed out after " + timeout + " waiting for " + what);
            }
            dispatchOrSleep(display);
        }
    }

    /** Processes all pending events. */
    public static void flush(Display display) {
        while (display.readAndDispatch()) {
            // drain the queue
        }
    }

    /** Dispatches one event, or sleeps until the next one (at most {@value #WAKE_UP_MS} ms) when none is pending. */
    static void dispatchOrSleep(Display display) {
        if (!display.readAndDispatch()) {
            display.timerExec(WAKE_UP_MS, () -> { });
            display.sleep();
        }
    }

    /** @return every control of {@code type} under {@code root} (depth first) that satisfies {@code test} */
    public static <T extends Control> List<T> find(Control root, Class<T> type, Predicate<T> test) {
        List<T> found = new ArrayList<>();
        collect(root, type, test, found);
        return found;
    }

    private static <T extends Control> void collect(Control control, Class<T> type, Predicate<T> test,
            List<T> found) {
        if (control.isDisposed()) {
            return;
        }
        if (type.isInstance(control) && test.test(type.cast(control))) {
            found.add(type.cast(control));
        }
        if (control instanceof Composite composite) {
            for (Control child : composite.getChildren()) {
                collect(child, type, test, found);
            }
        }
    }
}
