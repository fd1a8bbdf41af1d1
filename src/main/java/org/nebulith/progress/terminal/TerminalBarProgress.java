package org.nebulith.progress.terminal;

import java.io.PrintStream;

import org.nebulith.progress.Progress;

import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/** A redrawn terminal bar (me.tongfei progressbar) showing elapsed time and the ETA. */
final class TerminalBarProgress implements Progress {

    private static final int UPDATE_INTERVAL_MS = 250;

    private final ProgressBar bar;

    TerminalBarProgress(final String task, final long total, final PrintStream sink) {
        this.bar = new ProgressBarBuilder()
                .setTaskName(task)
                .setInitialMax(total)
                .setStyle(ProgressBarStyle.ASCII)
                .setUpdateIntervalMillis(UPDATE_INTERVAL_MS)
                .setConsumer(new ConsoleProgressBarConsumer(sink))
                .build();
    }

    @Override
    public void advance(final long steps) {
        bar.stepBy(steps);
    }

    @Override
    public void close() {
        bar.close();
    }
}
