package org.fatefield.engine.parallel;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Runs a loop over {@code [0, n)} in contiguous blocks, one per worker, on a fixed set of
 * daemon threads. Work is split by index only, never by timing, and each worker has its own index
 * (for its own scratch buffers), so a loop whose iterations touch disjoint data and draw from
 * per-item random streams gives the same result for any number of workers. (MASON 18's
 * ParallelSequence is not used: it skips the last {@code size % threads} agents.)
 */
public final class BlockParallel implements AutoCloseable {

    /** The body of a loop over one block. */
    @FunctionalInterface
    public interface Block {
        /** Runs iterations {@code [from, to)} as worker {@code worker}. */
        void run(int from, int to, int worker);
    }

    private final int workers;
    private final ExecutorService executor;

    /** A pool of {@code workers} threads (1 runs everything on the caller's thread). */
    public BlockParallel(int workers) {
        if (workers < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + workers);
        }
        this.workers = workers;
        this.executor = workers == 1 ? null : Executors.newFixedThreadPool(workers, runnable -> {
            Thread thread = new Thread(runnable, "fatefield-worker");
            thread.setDaemon(true);
            return thread;
        });
    }

    /** Number of workers. */
    public int workers() {
        return workers;
    }

    /** Runs {@code block} over {@code [0, n)} split into at most {@link #workers()} blocks, and waits. */
    public void forEach(int n, Block block) {
        if (executor == null || n < 2 * workers) {
            block.run(0, n, 0);
            return;
        }
        List<Future<?>> futures = new ArrayList<>(workers);
        for (int w = 0; w < workers; w++) {
            int from = (int) ((long) n * w / workers);
            int to = (int) ((long) n * (w + 1) / workers);
            int worker = w;
            futures.add(executor.submit(() -> block.run(from, to, worker)));
        }
        for (Future<?> future : futures) {
            try {
                future.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while stepping cells", e);
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException runtime) {
                    throw runtime;
                }
                throw new IllegalStateException(cause);
            }
        }
    }

    @Override
    public void close() {
        if (executor != null) {
            executor.shutdownNow();
        }
    }
}
