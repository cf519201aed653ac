package org.linemass.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import org.junit.jupiter.api.Test;

/** Admission by estimated heap; budgets are plain byte counts chosen for the scenario. */
class MemoryGateTest {

    /** Long enough for a started thread to reach the gate on a loaded machine. */
    private static final long SETTLE_MS = 300;

    @Test
    void acquire_tooBigBesideOthers_waitsUntilTheyAreDone() throws Exception {
        MemoryGate gate = new MemoryGate(100);
        assertFalse(gate.acquire(0, 60), "nothing ran before the first drawing");
        AtomicBoolean admitted = new AtomicBoolean();
        CountDownLatch in = new CountDownLatch(1);
        Thread t = new Thread(() -> {
            try {
                assertFalse(gate.acquire(1, 60), "admitted only once the first was done");
                admitted.set(true);
                in.countDown();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
        t.start();
        Thread.sleep(SETTLE_MS);
        assertFalse(admitted.get(), "60 + 60 bytes do not fit in 100");
        gate.release(60);
        assertTrue(in.await(10, TimeUnit.SECONDS));
        t.join();
    }

    @Test
    void acquire_fitsBeside_runsAtOnce_andHugeRunsWhenAlone() throws Exception {
        MemoryGate gate = new MemoryGate(100);
        assertFalse(gate.acquire(0, 40));
        assertTrue(gate.acquire(1, 40), "40 + 40 fit in 100");
        gate.release(40);
        gate.release(40);
        // far over the budget, but alone it gets the whole heap as a one-at-a-time run would
        assertFalse(gate.acquire(2, MemoryGate.estimate(Long.MAX_VALUE)));
        gate.release(MemoryGate.estimate(Long.MAX_VALUE));
    }

    @Test
    void acquireAlone_holdsBackLaterTickets() throws Exception {
        MemoryGate gate = new MemoryGate(100);
        gate.acquire(0, 10);
        CountDownLatch alone = new CountDownLatch(1);
        AtomicBoolean laterIn = new AtomicBoolean();
        Thread a = new Thread(() -> {
            try {
                gate.acquireAlone();
                alone.countDown();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
        a.start();
        Thread.sleep(SETTLE_MS);
        Thread b = new Thread(() -> {
            try {
                gate.acquire(1, 10);
                laterIn.set(true);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
        b.start();
        Thread.sleep(SETTLE_MS);
        assertFalse(laterIn.get(), "a drawing waiting to run alone goes first");
        gate.release(10);
        assertTrue(alone.await(10, TimeUnit.SECONDS));
        Thread.sleep(SETTLE_MS);
        assertFalse(laterIn.get(), "nothing runs beside the one running alone");
        gate.release(gate.budgetBytes());
        b.join(10_000);
        assertTrue(laterIn.get());
    }

    @Test
    void estimate_scalesWithFileSizeAndSaturates() {
        assertEquals(25 * 1000, MemoryGate.estimate(1000));
        assertEquals(Long.MAX_VALUE, MemoryGate.estimate(Long.MAX_VALUE / 2));
        assertThrows(IllegalArgumentException.class, () -> new MemoryGate(0));
    }
}
