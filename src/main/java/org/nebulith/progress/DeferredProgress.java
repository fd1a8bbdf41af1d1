package org.nebulith.progress;

/**
 * Progress of work begun before its display exists (a sequence's cooler half, solved while the
 * command still checks the start): steps are counted until {@link #attach} and then passed on, the
 * counted ones first. Thread-safe.
 */
public final class DeferredProgress implements Progress {
    private long pending;
    private Progress target;

    @Override
    public synchronized void advance(final long steps) {
        if (target == null) {
            pending += steps;
        } else {
            target.advance(steps);
        }
    }

    /**
     * @param to where the steps go from now on (the steps counted so far go there at once)
     */
    public synchronized void attach(final Progress to) {
        target = to;
        if (pending > 0) {
            to.advance(pending);
            pending = 0;
        }
    }

    /** Does nothing: the display it is attached to is closed by its owner. */
    @Override
    public void close() {
        // the attached display belongs to its owner
    }
}
