package dockline.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.OperatingSystemMXBean;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/** What the figures were measured on: cores, heap, Java, operating system, load, date. */
final class MachineFacts {

    private MachineFacts() {
    }

    static Map<String, String> collect() {
        Map<String, String> m = new LinkedHashMap<>();
        Runtime rt = Runtime.getRuntime();
        OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        m.put("cores", Integer.toString(rt.availableProcessors()));
        m.put("maxHeap", (rt.maxMemory() >> 20) + " MB");
        m.put("java", System.getProperty("java.version") + " (" + System.getProperty("java.vm.name") + ", "
                + System.getProperty("java.vendor") + ")");
        m.put("os", os.getName() + " " + os.getVersion() + " " + os.getArch());
        double load = os.getSystemLoadAverage();
        m.put("loadAverage", load < 0 ? "unknown" : String.format(Locale.ROOT, "%.2f", load));
        m.put("date", Instant.now().truncatedTo(ChronoUnit.SECONDS).toString());
        return m;
    }

    /** The load average now (other processes share the cores), or -1 when unknown. */
    static double loadNow() {
        return ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
    }
}
