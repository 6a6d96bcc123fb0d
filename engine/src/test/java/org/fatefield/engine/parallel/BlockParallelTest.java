package org.fatefield.engine.parallel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicIntegerArray;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

/**
 * The spinning worker pool: every index is run exactly once by a worker of a valid number, over
 * many consecutive loops (the hand-over between loops is where a lost wake-up or a stale task
 * would show), after long idle gaps (the threads have parked), and a failure in any worker
 * reaches the caller and leaves the pool usable.
 */
class BlockParallelTest {

    @Test
    void everyIndexRunsExactlyOnceOverManyConsecutiveLoops() {
        try (BlockParallel pool = new BlockParallel(3)) {
            for (int loop = 0; loop < 20_000; loop++) {
                int n = 7 + loop % 300;
                AtomicIntegerArray hits = new AtomicIntegerArray(n);
                AtomicLong sum = new AtomicLong();
                int[] badWorker = new int[1];
                pool.forEach(n, (from, to, worker) -> {
                    if (worker < 0 || worker >= 3) {
                        badWorker[0] = 1;
                    }
                    for (int i = from; i < to; i++) {
                        hits.incrementAndGet(i);
                        sum.addAndGet(i);
                    }
                });
                // Arithmetic series: 0 + 1 + ... + (n - 1) = n (n - 1) / 2, exactly.
                int at = loop;
                assertEquals((long) n * (n - 1) / 2, sum.get(), () -> "loop " + at);
                for (int i = 0; i < n; i++) {
                    int index = i;
                    assertEquals(1, hits.get(i), () -> "index " + index + " of loop " + at);
                }
                assertEquals(0, badWorker[0]);
            }
        }
    }

    @Test
    void parkedThreadsWakeForTheNextLoop() throws InterruptedException {
        try (BlockParallel pool = new BlockParallel(2)) {
            for (int round = 0; round < 5; round++) {
                // Longer than the spin, so the pool thread has parked.
                Thread.sleep(5 + BlockParallel.SPIN_NANOS / 1_000_000);
                assertEquals(1000L * 999 / 2, indexSum(pool, 1000));
            }
        }
    }

    @Test
    void aFailureInAnyWorkerReachesTheCallerAndThePoolGoesOn() {
        try (BlockParallel pool = new BlockParallel(2)) {
            for (int round = 0; round < 200; round++) {
                int bad = round % 100;
                IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                        () -> pool.forEach(100, (from, to, worker) -> {
                            if (bad >= from && bad < to) {
                                throw new IllegalArgumentException("cell " + bad);
                            }
                        }));
                assertEquals("cell " + bad, e.getMessage());
                assertEquals(64L * 63 / 2, indexSum(pool, 64));
            }
        }
    }

    @Test
    void aClosedPoolRefusesWorkAndItsThreadsEnd() throws InterruptedException {
        BlockParallel pool = new BlockParallel(2);
        pool.forEach(10, (from, to, worker) -> { });
        pool.close();
        assertThrows(IllegalStateException.class, () -> pool.forEach(10, (from, to, worker) -> { }));
        long deadline = System.currentTimeMillis() + 5000;
        while (pool.anyThreadAlive() && System.currentTimeMillis() < deadline) {
            Thread.sleep(10);
        }
        assertTrue(!pool.anyThreadAlive(), "the pool threads should end after close");
    }

    /** The sum of the indices {@code [0, n)} as the pool runs them. */
    private static long indexSum(BlockParallel pool, int n) {
        AtomicLong sum = new AtomicLong();
        pool.forEach(n, (from, to, worker) -> {
            for (int i = from; i < to; i++) {
                sum.addAndGet(i);
            }
        });
        return sum.get();
    }
}
