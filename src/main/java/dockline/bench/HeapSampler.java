package dockline.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;

/**
 * Watches the used heap from a daemon thread (one sample a millisecond) and keeps the highest value
 * seen between {@link #start()} and {@link #stop()}. The figure includes garbage the collector has
 * not reclaimed yet, so it is an upper bound on the live data at the peak.
 */
final class HeapSampler implements AutoCloseable {

    private static final MemoryMXBean MEMORY = ManagementFactory.getMemoryMXBean();

    private final Thread thread;
    private volatile boolean running = true;
    private volatile boolean sampling;
    private volatile long peak;

    HeapSampler() {
        thread = new Thread(this::loop, "dockline-heap-sampler");
        thread.setDaemon(true);
        thread.start();
    }

    /** The used heap now, after asking for a full collection (the baseline of a measurement). */
    static long settledUsed() {
        for (int i = 0; i < 2; i++) {
            System.gc();
        }
        return MEMORY.getHeapMemoryUsage().getUsed();
    }

    void start() {
        peak = MEMORY.getHeapMemoryUsage().getUsed();
        sampling = true;
    }

    /** Stops sampling and returns the highest used heap seen since {@link #start()}. */
    long stop() {
        sampling = false;
        long now = MEMORY.getHeapMemoryUsage().getUsed();
        if (now > peak) {
            peak = now;
        }
        return peak;
    }

    private void loop() {
        while (running) {
            if (sampling) {
                long u = MEMORY.getHeapMemoryUsage().getUsed();
                if (u > peak) {
                    peak = u;
                }
            }
            try {
                Thread.sleep(1);
            } catch (InterruptedException e) {
                return;
            }
        }
    }

    @Override
    public void close() {
        running = false;
        thread.interrupt();
    }
}
