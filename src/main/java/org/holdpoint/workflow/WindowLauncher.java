package org.holdpoint.workflow;

/**
 * Opens the desktop window. Implemented by the composition root (which may see the window classes)
 * and handed to the command line, so that {@code holdpoint gui} works without the command line
 * importing the window.
 */
@FunctionalInterface
public interface WindowLauncher {
    /** A launcher for builds or machines without a window: always refuses. */
    WindowLauncher NONE = () -> {
        throw new IllegalStateException("this build has no window");
    };

    /**
     * Opens the window and returns at once (the window runs on the event thread). Called on the main thread.
     *
     * @throws IllegalStateException with a plain-words message when no window can be shown (no display)
     */
    void open();
}
