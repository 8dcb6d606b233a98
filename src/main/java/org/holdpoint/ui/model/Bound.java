package org.holdpoint.ui.model;

import java.beans.PropertyChangeListener;
import java.beans.PropertyChangeSupport;
import java.util.EnumSet;
import java.util.Objects;

/**
 * Bound properties named by an enum: listeners per property, and a guard so that a listener that
 * sets the same property again (a view echoing the model) does not start a feedback loop.
 *
 * @param <P> the enum naming the properties
 */
public final class Bound<P extends Enum<P>> {
    private final PropertyChangeSupport support;
    private final EnumSet<P> firing;

    /**
     * @param source the bean reported as the event source
     * @param type   the property enum
     */
    public Bound(Object source, Class<P> type) {
        this.support = new PropertyChangeSupport(source);
        this.firing = EnumSet.noneOf(type);
    }

    /**
     * Adds a listener of one property. Listeners run on the thread that changes the model (the event thread).
     *
     * @param property the property
     * @param listener the listener
     */
    public void addListener(P property, PropertyChangeListener listener) {
        support.addPropertyChangeListener(property.name(), listener);
    }

    /**
     * Removes a listener of one property.
     *
     * @param property the property
     * @param listener the listener
     */
    public void removeListener(P property, PropertyChangeListener listener) {
        support.removePropertyChangeListener(property.name(), listener);
    }

    /**
     * Tells the listeners of a change, unless old and new are equal or the same property is already being fired.
     *
     * @param property the property
     * @param oldValue the old value
     * @param newValue the new value
     */
    public void fire(P property, Object oldValue, Object newValue) {
        if ((oldValue != null || newValue == null) && Objects.equals(oldValue, newValue) || firing.contains(property)) {
            return;
        }
        firing.add(property);
        try {
            support.firePropertyChange(property.name(), oldValue, newValue);
        } finally {
            firing.remove(property);
        }
    }

    /**
     * Tells the listeners that a property changed in a way equality cannot see (e.g. a list edited in place).
     *
     * @param property the property
     */
    public void fireChanged(P property) {
        if (firing.contains(property)) {
            return;
        }
        firing.add(property);
        try {
            support.firePropertyChange(property.name(), null, new Object());
        } finally {
            firing.remove(property);
        }
    }
}
