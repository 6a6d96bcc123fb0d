package org.fatefield.engine.parallel;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Runs a loop over {@code [0, n)} in contiguous chunks on the calling thread and a fixed set of
 * daemon threads. The chunks are fixed by index only (about {@value #CHUNKS_PER_WORKER} per
 * worker) and handed out to whichever worker is free, so a worker slowed by the garbage
 * collector or another process does not hold the others up; each worker has its own index (for
 * its own scratch buffers, which must not carry anything from one iteration to the next). A loop
 * whose iterations touch disjoint data and draw from per-item random streams therefore gives the
 * same result for any number of workers. (MASON 18's ParallelSequence is not used: it skips the
 * last {@code size % threads} agents.)
 */
public final class BlockParallel implements AutoCloseable {

    /** The body of a loop over one block. */
    @FunctionalInterface
    public interface Block {
        /** Runs iterations {@code [from, to)} as worker {@code worker}. */
        void run(int from, int to, int worker);
    }

    /** Chunks per worker: enough to even out uneven chunks, few enough that handing them out is cheap. */
    static final int CHUNKS_PER_WORKER = 8;

    private final int workers;
    private final ExecutorService executor;

    /** {@code workers} workers: the caller's thread and {@code workers - 1} pool threads. */
    public BlockParallel(int workers) {
        if (workers < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + workers);
        }
        this.workers = workers;
        this.executor = workers == 1 ? null : Executors.newFixedThreadPool(workers - 1, runnable -> {
            Thread thread = new Thread(runnable, "fatefield-worker");
            thread.setDaemon(true);
            return thread;
        });
    }

    /** Number of workers. */
    public int workers() {
        return workers;
    }

    /** Runs {@code block} over {@code [0, n)} in chunks spread over the workers, and waits for all. */
    public void forEach(int n, Block block) {
        if (executor == null || n < 2 * workers) {
            block.run(0, n, 0);
            return;
        }
        int chunks = Math.min(n, workers * CHUNKS_PER_WORKER);
        AtomicInteger next = new AtomicInteger();
        List<Future<?>> futures = new ArrayList<>(workers - 1);
        for (int w = 1; w < workers; w++) {
            int worker = w;
            futures.add(executor.submit(() -> drain(n, chunks, next, block, worker)));
        }
        RuntimeException failure = null;
        try {
            drain(n, chunks, next, block, 0);
        } catch (RuntimeException e) {
            failure = e;
            next.set(chunks);
        }
        for (Future<?> future : futures) {
            try {
                future.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while stepping cells", e);
            } catch (ExecutionException e) {
                Throwable cause = e.getCause();
                if (failure == null) {
                    failure = cause instanceof RuntimeException runtime ? runtime : new IllegalStateException(cause);
                }
            }
        }
        if (failure != null) {
            throw failure;
        }
    }

    /** Takes chunks until none is left. */
    private static void drain(int n, int chunks, AtomicInteger next, Block block, int worker) {
        for (int c = next.getAndIncrement(); c < chunks; c = next.getAndIncrement()) {
            int from = (int) ((long) n * c / chunks);
            int to = (int) ((long) n * (c + 1) / chunks);
            block.run(from, to, worker);
        }
    }

    @Override
    public void close() {
        if (executor != null) {
            executor.shutdownNow();
        }
    }
}
