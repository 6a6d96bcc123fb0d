package org.fatefield.engine.parallel;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.concurrent.locks.LockSupport;

/**
 * Runs a loop over {@code [0, n)} in contiguous chunks on the calling thread and a fixed set of
 * daemon threads. The chunks are fixed by index only (about {@value #CHUNKS_PER_WORKER} per
 * worker) and handed out to whichever worker is free, so a worker slowed by the garbage
 * collector or another process does not hold the others up; each worker has its own index (for
 * its own scratch buffers, which must not carry anything from one iteration to the next). A loop
 * whose iterations touch disjoint data and draw from per-item random streams therefore gives the
 * same result for any number of workers. (MASON 18's ParallelSequence is not used: it skips the
 * last {@code size % threads} agents.)
 *
 * <p>A tick hands out a dozen short loops; an executor's submit and wait cost tens of
 * microseconds each on a virtual machine, which made two threads slower than one on a small
 * tissue. So the pool threads wait for the next loop by spinning for {@value #SPIN_NANOS} ns
 * (the gap between two loops of a tick) and only then park, and the caller waits for them by
 * spinning. One caller at a time; a block must not call {@code forEach} itself.
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

    /** How long an idle pool thread spins for the next loop before it parks. */
    static final long SPIN_NANOS = 200_000;

    private final int workers;
    private final Thread[] threads;
    /** Per pool thread: parked, or about to park, waiting for a loop (cache-line apart). */
    private final AtomicInteger[] sleeping;
    /** Counts the loops handed out; a pool thread runs each new value once. */
    private volatile int generation;
    private volatile boolean closed;
    private Block task;
    private int taskSize;
    private int taskChunks;
    private final AtomicInteger nextChunk = new AtomicInteger();
    private final AtomicInteger running = new AtomicInteger();
    private final AtomicReference<Throwable> failure = new AtomicReference<>();

    /** {@code workers} workers: the caller's thread and {@code workers - 1} pool threads. */
    public BlockParallel(int workers) {
        if (workers < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + workers);
        }
        this.workers = workers;
        this.threads = new Thread[workers - 1];
        this.sleeping = new AtomicInteger[workers - 1];
        for (int w = 1; w < workers; w++) {
            int worker = w;
            sleeping[w - 1] = new AtomicInteger();
            threads[w - 1] = new Thread(() -> serve(worker), "fatefield-worker-" + w);
            threads[w - 1].setDaemon(true);
            threads[w - 1].start();
        }
    }

    /** Number of workers. */
    public int workers() {
        return workers;
    }

    /** Runs {@code block} over {@code [0, n)} in chunks spread over the workers, and waits for all. */
    public void forEach(int n, Block block) {
        if (workers == 1 || n < 2 * workers) {
            block.run(0, n, 0);
            return;
        }
        if (closed) {
            throw new IllegalStateException("this worker pool is closed");
        }
        task = block;
        taskSize = n;
        taskChunks = Math.min(n, workers * CHUNKS_PER_WORKER);
        failure.set(null);
        nextChunk.set(0);
        running.set(workers - 1);
        generation++;
        for (int w = 0; w < threads.length; w++) {
            if (sleeping[w].get() != 0) {
                LockSupport.unpark(threads[w]);
            }
        }
        try {
            drain(0);
        } catch (RuntimeException | Error e) {
            failure.compareAndSet(null, e);
            nextChunk.set(taskChunks);
        }
        while (running.get() != 0) {
            Thread.onSpinWait();
        }
        task = null;
        Throwable thrown = failure.getAndSet(null);
        if (thrown instanceof RuntimeException runtime) {
            throw runtime;
        }
        if (thrown instanceof Error error) {
            throw error;
        }
        if (thrown != null) {
            throw new IllegalStateException(thrown);
        }
    }

    /** Takes chunks of the current loop until none is left. */
    private void drain(int worker) {
        int n = taskSize;
        int chunks = taskChunks;
        Block block = task;
        for (int c = nextChunk.getAndIncrement(); c < chunks; c = nextChunk.getAndIncrement()) {
            int from = (int) ((long) n * c / chunks);
            int to = (int) ((long) n * (c + 1) / chunks);
            block.run(from, to, worker);
        }
    }

    /** A pool thread's life: wait for each new loop, take its share, report done. */
    private void serve(int worker) {
        int seen = 0;
        AtomicInteger asleep = sleeping[worker - 1];
        while (true) {
            long spinUntil = System.nanoTime() + SPIN_NANOS;
            while (generation == seen && !closed) {
                if (System.nanoTime() < spinUntil) {
                    Thread.onSpinWait();
                } else {
                    asleep.set(1);
                    if (generation == seen && !closed) {
                        LockSupport.park(this);
                    }
                    asleep.set(0);
                }
            }
            if (closed) {
                return;
            }
            seen = generation;
            try {
                drain(worker);
            } catch (RuntimeException | Error e) {
                failure.compareAndSet(null, e);
                nextChunk.set(taskChunks);
            } finally {
                running.decrementAndGet();
            }
        }
    }

    /** True while any pool thread is still running (for tests of {@link #close}). */
    boolean anyThreadAlive() {
        for (Thread thread : threads) {
            if (thread.isAlive()) {
                return true;
            }
        }
        return false;
    }

    @Override
    public void close() {
        closed = true;
        for (Thread thread : threads) {
            LockSupport.unpark(thread);
        }
    }
}
