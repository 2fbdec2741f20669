package dockline.model;

/**
 * A computation would pass a resource limit (memory, an array's index range, a checker's state
 * limit). The message states the real size and the limit that applied; {@link #advice()} says what
 * would help for this very cause (more memory helps a memory budget, not an index range). The CLI
 * maps this type, and only this type, to exit code 3.
 */
public class ResourceLimitException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    private final String advice;

    public ResourceLimitException(String message, String advice) {
        super(message);
        this.advice = advice;
    }

    /** What to change so that the computation fits, in plain words. */
    public String advice() {
        return advice;
    }

    /** The JVM's maximum heap in MB ({@link Runtime#maxMemory()}, set by -Xmx). */
    public static long maxHeapMb() {
        return Runtime.getRuntime().maxMemory() >> 20;
    }
}
