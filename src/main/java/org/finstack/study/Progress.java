package org.finstack.study;

/**
 * How a long study reports its progress and learns it is to stop. Implementations must be safe
 * to call from a worker thread.
 */
public interface Progress {

    /** Reports nothing and never cancels. */
    Progress NONE = new Progress() {
        @Override
        public void step(int done, int total) {
            // nothing to report
        }

        @Override
        public boolean cancelled() {
            return false;
        }
    };

    /**
     * @param done  steps finished
     * @param total steps in all
     */
    void step(int done, int total);

    /** @return whether the caller wants the work stopped (checked between steps) */
    boolean cancelled();
}
