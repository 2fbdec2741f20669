package dockline.report;

import java.util.List;

/**
 * The safety caveats every human-facing output carries (CLI summary, view, rendered picture,
 * report). One text, kept in one place, so no output can drift from it.
 */
public final class Caveats {

    private Caveats() {
    }

    /** The caveats, one sentence a line. */
    public static final List<String> LINES = List.of(
            "A guarantee is only as good as the map, the energy figures and the disturbance model it was computed from.",
            "Keep the robot's hardware low-battery cut-off and return-to-dock behaviour enabled; this tool does not replace them.",
            "Follow the robot maker's guidance on batteries, charging and operation.",
            "Follow local codes for charging areas and fire doors; never prop fire doors open to make a plan work.",
            "Trial every mission under supervision before it runs unattended, and have the plan reviewed by qualified staff.");

    /** The caveats as one block with a heading, for text output. */
    public static String block() {
        StringBuilder sb = new StringBuilder("Safety: ");
        sb.append(LINES.get(0));
        for (int i = 1; i < LINES.size(); i++) {
            sb.append(System.lineSeparator()).append("        ").append(LINES.get(i));
        }
        return sb.toString();
    }

    /** A one-line short form for small spaces (picture footers). */
    public static String shortLine() {
        return "Only as good as the map, energy figures and disturbance model. Keep the hardware low-battery cut-off;"
                + " follow the robot maker's guidance and local codes for charging areas and fire doors.";
    }
}
