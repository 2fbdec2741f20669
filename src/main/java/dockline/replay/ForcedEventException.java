package dockline.replay;

/** A forced event that cannot happen where the user put it; the message says why in words. */
public final class ForcedEventException extends Exception {
    private static final long serialVersionUID = 1L;

    public ForcedEventException(String message) {
        super(message);
    }
}
