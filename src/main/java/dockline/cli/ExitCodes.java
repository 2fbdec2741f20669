package dockline.cli;

/** Exit codes, as documented in README.md. */
public final class ExitCodes {
    public static final int OK = 0;
    public static final int NOT_GUARANTEED = 1;
    public static final int BAD_INPUT = 2;
    public static final int RESOURCE_LIMIT = 3;
    public static final int INTERNAL = 4;

    private ExitCodes() {
    }
}
