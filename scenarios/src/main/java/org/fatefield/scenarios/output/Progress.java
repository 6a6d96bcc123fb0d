package org.fatefield.scenarios.output;

import java.io.PrintStream;
import java.util.Locale;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * Reports how far a run has got: a progress bar with ETA on a terminal, plain log lines every
 * tenth of the run otherwise (cluster logs), or nothing.
 */
public interface Progress extends AutoCloseable {

    /** Called after each step with the steps done and the total. */
    void update(long done, long total);

    @Override
    void close();

    /** Reports nothing. */
    static Progress silent() {
        return new Progress() {
            @Override
            public void update(long done, long total) {
            }

            @Override
            public void close() {
            }
        };
    }

    /** A bar when a console is attached, else log lines, both on {@code err}. */
    static Progress forConsole(String task, long total, PrintStream err) {
        if (System.console() != null) {
            ProgressBar bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(total)
                    .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(250).setUnit(" k steps", 1000)
                    .setConsumer(new ConsoleProgressBarConsumer(err)).build();
            return new Progress() {
                @Override
                public void update(long done, long max) {
                    bar.stepTo(done);
                }

                @Override
                public void close() {
                    bar.close();
                }
            };
        }
        return new Progress() {
            private long nextTenth = 1;
            private final long startNanos = System.nanoTime();

            @Override
            public void update(long done, long max) {
                if (done * 10 >= nextTenth * max) {
                    double elapsed = (System.nanoTime() - startNanos) / 1e9;
                    err.printf(Locale.ROOT, "%s: %d%% (%d/%d steps, %.1f s)%n", task, nextTenth * 10, done, max, elapsed);
                    nextTenth++;
                }
            }

            @Override
            public void close() {
                err.flush();
            }
        };
    }
}
