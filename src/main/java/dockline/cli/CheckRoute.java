package dockline.cli;

import dockline.plan.PolicyChoice;
import dockline.plan.Route;
import java.io.PrintWriter;
import java.util.Locale;
import picocli.CommandLine.Option;

/**
 * Which route {@code check} takes for the reserve objective (a picocli mixin): the options
 * {@code --method} and {@code --verdict-only}, turned into a {@link Route} of the core.
 */
final class CheckRoute {

    @Option(names = "--method", paramLabel = "ROUTE", defaultValue = "auto",
            description = "auto (default: the fast path when the robot cannot charge before the end, else the charging"
                    + " route, or the product game with its moves generated on demand for --fewest-moves), fast,"
                    + " charging (least charge per position, every floor in one pass, threshold policy), product,"
                    + " or stored (the product game stored in arrays: the reference route, far more memory)")
    String method;

    @Option(names = "--verdict-only",
            description = "the verdict alone, stopping as soon as it is known: no policy, no certificate, no margins")
    boolean verdictOnly;

    /** Whether the options ask for anything but the default route. */
    boolean nonDefault() {
        return verdictOnly || !"auto".equalsIgnoreCase(method == null ? "auto" : method.trim());
    }

    /** The route of the options, or null after printing the problem. */
    Route route(PolicyOption policy, PrintWriter err) {
        String m = method == null ? "auto" : method.trim().toLowerCase(Locale.ROOT);
        if (!m.equals("auto") && !m.equals("fast") && !m.equals("charging") && !m.equals("product")
                && !m.equals("stored")) {
            err.println("dockline: --method must be auto, fast, charging, product or stored, not '" + method + "'");
            return null;
        }
        PolicyChoice choice = policy.choice();
        if (verdictOnly) {
            if (m.equals("stored") || m.equals("charging")) {
                err.println("dockline: --verdict-only decides on the product game without storing it; drop --method"
                        + " stored");
                return null;
            }
            if (policy.given()) {
                err.println("dockline: " + policy.name() + " needs a policy; --verdict-only gives none");
                return null;
            }
            return new Route.VerdictOnly(m.equals("fast") ? Route.VerdictOnly.Where.FAST
                    : m.equals("product") ? Route.VerdictOnly.Where.PRODUCT : Route.VerdictOnly.Where.AUTO);
        }
        switch (m) {
            case "fast":
                return onePolicy(policy, Route.Fast.defaults(), "the fast path has one policy, that of least energy"
                        + " needed", err);
            case "charging":
                return onePolicy(policy, Route.Charging.defaults(), "the charging route has one policy, the threshold"
                        + " policy at the highest floor", err);
            case "product":
                return Route.Product.of(choice);
            case "stored":
                return new Route.Stored(choice, null);
            default:
                return new Route.Auto(choice);
        }
    }

    /** {@code route}, whose one policy ({@code which}) is the safest; null after the refusal when --fewest-moves asks another. */
    private static Route onePolicy(PolicyOption policy, Route route, String which, PrintWriter err) {
        if (policy.fewestMoves) {
            err.println("dockline: --fewest-moves applies to the product routes; " + which + ", which is the safest");
            return null;
        }
        return route;
    }
}
