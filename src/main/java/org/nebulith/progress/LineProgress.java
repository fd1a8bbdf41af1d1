package org.nebulith.progress;

import java.io.PrintStream;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.LongSupplier;

/**
 * Plain progress lines for logs: one line each time another tenth of the work is done, and a
 * final line. Each line reads {@code task: 40/100 (40%), elapsed 3 s, ETA 5 s}. The ETA assumes
 * the remaining steps take as long on average as the ones done.
 */
final class LineProgress implements Progress {

    private static final int REPORTS = 10;
    private static final double NANOS_PER_SECOND = 1e9;

    private final String task;
    private final long total;
    private final PrintStream sink;
    private final LongSupplier clock;
    private final long startNanos;
    private final AtomicLong done = new AtomicLong();
    private int lastReportedTenth;
    private boolean closed;

    LineProgress(final String task, final long total, final PrintStream sink, final LongSupplier clock) {
        if (total <= 0) {
            throw new IllegalArgumentException("total steps must be > 0, got " + total);
        }
        this.task = task;
        this.total = total;
        this.sink = sink;
        this.clock = clock;
        this.startNanos = clock.getAsLong();
    }

    @Override
    public void advance(final long steps) {
        long now = done.addAndGet(steps);
        int tenth = (int) Math.min(REPORTS, now * REPORTS / total);
        synchronized (this) {
            if (tenth > lastReportedTenth && tenth < REPORTS && !closed) {
                lastReportedTenth = tenth;
                sink.println(line(now));
            }
        }
    }

    @Override
    public synchronized void close() {
        if (!closed) {
            closed = true;
            sink.println(line(done.get()));
        }
    }

    /**
     * @param count steps done
     * @return the progress line for that count at the current clock
     */
    String line(final long count) {
        double elapsed = (clock.getAsLong() - startNanos) / NANOS_PER_SECOND;
        long percent = count * 100 / total;
        StringBuilder text = new StringBuilder(64);
        text.append(task).append(": ").append(count).append('/').append(total)
                .append(" (").append(percent).append("%), elapsed ").append(seconds(elapsed));
        if (count > 0 && count < total) {
            text.append(", ETA ").append(seconds(elapsed * (total - count) / count));
        }
        return text.toString();
    }

    private static String seconds(final double s) {
        if (s < 100) {
            return String.format(Locale.ROOT, "%.0f s", s);
        }
        return String.format(Locale.ROOT, "%d min %02d s", (long) s / 60, (long) s % 60);
    }
}
