package org.nebulith.progress;

/** Shows nothing. */
final class SilentProgress implements Progress {

    static final SilentProgress INSTANCE = new SilentProgress();

    private SilentProgress() {
    }

    @Override
    public void advance(final long steps) {
        // nothing to show
    }

    @Override
    public void close() {
        // nothing to close
    }
}
