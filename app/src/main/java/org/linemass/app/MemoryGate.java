package org.linemass.app;

/**
 * Lets drawings start side by side only while their estimated peak heap fits in a budget, so that
 * a drawing too big to run beside others waits for the others to finish instead of running out of
 * memory. Drawings are admitted strictly in ticket order (input order), so a big one is never
 * overtaken indefinitely by small ones; a drawing is always admitted when nothing else runs, however
 * big its estimate (it then has the whole heap, as when run alone). {@link #acquireAlone} admits a
 * drawing only when nothing else runs and holds back every other admission while it waits.
 *
 * <p>The estimate is {@value #HEAP_PER_FILE_BYTE} bytes of heap per byte of file: the piece stage
 * needs roughly 0.5 to 1 KB per segment at its peak (contributor guide, benchmarks), and an ASCII
 * DXF spends about 40 to 100 bytes of text per segment (the measured 39 and 22 bytes of model per
 * segment at 0.42 and 0.59 times the file size), so 10 to 25 bytes of heap per byte of file; the
 * upper end is taken. Thread-safe.
 */
final class MemoryGate {

    /** Heap a drawing may need per byte of its file (derivation in the class comment). */
    static final long HEAP_PER_FILE_BYTE = 25;
    /** Share of the maximum heap that running drawings may take together; the rest is for the reports kept. */
    static final double BUDGET_SHARE = 0.75;

    private final long budgetBytes;
    private long inUse;
    private int running;
    private long nextTicket;
    private int aloneWaiting;

    MemoryGate(long budgetBytes) {
        if (budgetBytes <= 0) {
            throw new IllegalArgumentException("memory budget must be positive, got " + budgetBytes);
        }
        this.budgetBytes = budgetBytes;
    }

    /** A gate for this JVM's maximum heap. */
    static MemoryGate forThisHeap() {
        return new MemoryGate((long) (Runtime.getRuntime().maxMemory() * BUDGET_SHARE));
    }

    /** The estimated peak heap for a file of {@code fileBytes} bytes (saturating). */
    static long estimate(long fileBytes) {
        return fileBytes > Long.MAX_VALUE / HEAP_PER_FILE_BYTE ? Long.MAX_VALUE : fileBytes * HEAP_PER_FILE_BYTE;
    }

    /**
     * Waits until ticket {@code ticket} (0, 1, 2... each used once) is next and {@code needBytes} fits
     * beside what runs, then admits it. Returns whether other drawings were running at admission.
     */
    synchronized boolean acquire(long ticket, long needBytes) throws InterruptedException {
        while (ticket != nextTicket || aloneWaiting > 0 || (running > 0 && needBytes > budgetBytes - inUse)) {
            wait();
        }
        boolean beside = running > 0;
        running++;
        inUse += needBytes;
        nextTicket++;
        notifyAll();
        return beside;
    }

    /** Waits until nothing runs, then admits one drawing that takes the whole budget. */
    synchronized void acquireAlone() throws InterruptedException {
        aloneWaiting++;
        try {
            while (running > 0) {
                wait();
            }
        } finally {
            aloneWaiting--;
        }
        running++;
        inUse += budgetBytes;
    }

    /** The drawing admitted with {@code needBytes} (the budget, for {@link #acquireAlone}) is done. */
    synchronized void release(long needBytes) {
        running--;
        inUse -= needBytes;
        notifyAll();
    }

    long budgetBytes() {
        return budgetBytes;
    }
}
