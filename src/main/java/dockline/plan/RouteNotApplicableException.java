package dockline.plan;

/** The route asked for does not apply to this mission (e.g. the fast path to a mission that charges). */
public final class RouteNotApplicableException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public RouteNotApplicableException(String message) {
        super(message);
    }
}
