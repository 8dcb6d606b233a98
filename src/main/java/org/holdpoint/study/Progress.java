package org.holdpoint.study;

/**
 * The toolkit-neutral progress and cancel port that every long use case reports to. Implementations
 * exist for no output, the console and the window; each says on which thread it may be called.
 */
public interface Progress {
    /** A progress that shows nothing and is never cancelled. */
    Progress NONE = new Progress() {
        @Override
        public void step(String what, double fraction) {
        }

        @Override
        public boolean cancelled() {
            return false;
        }
    };

    /**
     * Reports what is being done and how far along the whole job is. Called on the worker thread.
     *
     * @param what     a short description, e.g. "reading before.xlsx"
     * @param fraction 0..1, or a negative value when unknown
     */
    void step(String what, double fraction);

    /**
     * Whether the user asked to stop. Called on the worker thread, between steps.
     *
     * @return true to stop as soon as possible
     */
    boolean cancelled();

    /**
     * Throws {@link CancelledException} when the user asked to stop.
     */
    default void checkCancelled() {
        if (cancelled()) {
            throw new CancelledException();
        }
    }

    /** Thrown inside a use case when the user cancelled it; nothing has been written. */
    final class CancelledException extends RuntimeException {
        private static final long serialVersionUID = 1L;

        /** Creates the exception. */
        public CancelledException() {
            super("cancelled by the user");
        }
    }
}
