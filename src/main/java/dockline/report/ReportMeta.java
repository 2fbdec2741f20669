package dockline.report;

import java.time.Instant;
import java.util.Objects;

/**
 * What the traceability block says about the run itself.
 *
 * @param version   the dockline version that made the report
 * @param generated when the report was made
 */
public record ReportMeta(String version, Instant generated) {
    public ReportMeta {
        Objects.requireNonNull(version, "version");
        Objects.requireNonNull(generated, "generated");
    }
}
