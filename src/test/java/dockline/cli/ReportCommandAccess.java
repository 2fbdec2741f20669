package dockline.cli;

/** Test access to the report command's package-private helpers. */
public final class ReportCommandAccess {

    private ReportCommandAccess() {
    }

    public static boolean stderrIsTerminal() {
        return ReportCommand.stderrIsTerminal();
    }
}
