package org.finstack.testing;

import java.util.ArrayList;
import java.util.List;
import org.finstack.study.Progress;

/**
 * A progress sink for cancellation tests: it records the steps reported and asks to stop once
 * {@code stopAfter} of them are done. The tests that use it check an invariant of the
 * {@link Progress} contract: a study stops at the first check after it is asked to.
 */
public final class Stopper implements Progress {

    private final List<Integer> done = new ArrayList<>();
    private final int stopAfter;

    /**
     * @param stopAfter the steps after which it asks to stop ({@link Integer#MAX_VALUE}: never)
     */
    public Stopper(int stopAfter) {
        this.stopAfter = stopAfter;
    }

    @Override
    public synchronized void step(int d, int total) {
        done.add(d);
    }

    @Override
    public synchronized boolean cancelled() {
        return done.size() >= stopAfter;
    }

    /** @return the steps reported ({@code done} of each call), in order */
    public synchronized List<Integer> done() {
        return List.copyOf(done);
    }
}
