package org.tensio.ui.editor.model;

import java.beans.PropertyChangeListener;
import java.beans.PropertyChangeSupport;

/**
 * Base of the editing model: property-change events for edit parts and pages. Plain Java, no SWT. Not
 * thread-safe: the model is changed on the UI thread only (by commands).
 */
public abstract class ModelElement {

    private final transient PropertyChangeSupport listeners = new PropertyChangeSupport(this);

    /** Adds a listener for every property of this element. */
    public void addPropertyChangeListener(PropertyChangeListener l) {
        listeners.addPropertyChangeListener(l);
    }

    /** Removes a listener added by {@link #addPropertyChangeListener}. */
    public void removePropertyChangeListener(PropertyChangeListener l) {
        listeners.removePropertyChangeListener(l);
    }

    /** Fires a change of {@code property} (always fired, even when old equals new). */
    protected void fire(String property, Object oldValue, Object newValue) {
        listeners.firePropertyChange(new java.beans.PropertyChangeEvent(this, property, oldValue, newValue) {
            private static final long serialVersionUID = 1L;
        });
    }
}
