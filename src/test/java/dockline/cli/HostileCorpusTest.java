package dockline.cli;

import static dockline.fixtures.CliRun.run;
import static org.assertj.core.api.Assertions.assertThat;

import dockline.fixtures.CliRun;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A mutation corpus of hostile map and mission files, generated here from the demo night round and
 * its clinic map: deleted keys, wrong types, huge and special numbers, duplicate keys, aliases and
 * alias bombs, deep nesting, long lines, encodings, plan and legend errors, and map paths naming a
 * device, a named pipe, a folder, a link loop, traversal to system files. Each case runs through
 * {@code validate} and {@code check} as a user would: no stack trace, never exit 4, every rejection
 * located and with a hint, each case under 5 seconds.
 */
class HostileCorpusTest {

    @TempDir
    Path dir;

    private static final Pattern LOCATED = Pattern.compile(".+?:\\d+:\\d+: .+ \\(hint: .+\\)");

    /** One case: the mission's bytes and the map's bytes (null: the demo map as it is). */
    record Case(String name, byte[] mission, byte[] map) {
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] concat(byte[]... parts) {
        int n = 0;
        for (byte[] p : parts) {
            n += p.length;
        }
        byte[] out = new byte[n];
        int at = 0;
        for (byte[] p : parts) {
            System.arraycopy(p, 0, out, at, p.length);
            at += p.length;
        }
        return out;
    }

    List<Case> corpus(String mission, String map) {
        List<Case> cases = new ArrayList<>();
        String[] ml = mission.split("\n", -1);
        String[] pl = map.split("\n", -1);
        // deleted keys: every line of the mission and of the map, one at a time
        for (int i = 0; i < ml.length; i++) {
            if (ml[i].contains(":")) {
                cases.add(new Case("mission without line " + (i + 1), utf8(without(ml, i)), null));
            }
        }
        for (int i = 0; i < pl.length; i++) {
            if (pl[i].contains(":") && !pl[i].startsWith("#")) {
                cases.add(new Case("map without line " + (i + 1), null, utf8(without(pl, i))));
            }
        }
        // wrong types and huge or special numbers, in the mission and in the map
        String[] values = {"[1, 2]", "{a: 1}", "text", "true", "~", "\"\"", "1e400", ".inf", "-.inf", ".nan", "-0",
            "99999999999999999999999999", "0x10", "1_000", "-5", "0.0000000000000000000001", "9223372036854775808",
            "!!binary aGVsbG8=", "2 Wh Wh", "%", "20%%"};
        for (String key : new String[] {"capacity", "resolution", "tile", "wait-energy", "charge-rate", "neighbourhood",
            "cell", "charge", "reserve", "visit", "order", "finish-on-dock", "kind"}) {
            for (String v : values) {
                String m = replaceValue(mission, key, v);
                if (!m.equals(mission)) {
                    cases.add(new Case("mission " + key + ": " + v, utf8(m), null));
                }
            }
        }
        for (String key : new String[] {"cell-size", "budget", "extra", "where", "ward-a", "ward-a-entry"}) {
            for (String v : values) {
                String m = replaceValue(map, key, v);
                if (!m.equals(map)) {
                    cases.add(new Case("map " + key + ": " + v, null, utf8(m)));
                }
            }
        }
        // duplicate keys
        cases.add(new Case("duplicate robot", utf8(mission + "robot:\n  capacity: 1\n"), null));
        cases.add(new Case("duplicate name", utf8("name: a\n" + mission), null));
        cases.add(new Case("duplicate plan", null, utf8(map + "plan: |\n  ###\n")));
        // aliases and an alias bomb
        cases.add(new Case("alias", utf8(mission.replace("reserve: 20%", "reserve: &r 20%\nextra: *r")), null));
        StringBuilder bomb = new StringBuilder("a0: &a0 [x, x, x, x, x, x, x, x, x, x]\n");
        for (int i = 1; i < 12; i++) {
            bomb.append("a").append(i).append(": &a").append(i).append(" [");
            for (int j = 0; j < 10; j++) {
                bomb.append(j == 0 ? "" : ", ").append("*a").append(i - 1);
            }
            bomb.append("]\n");
        }
        cases.add(new Case("alias bomb in the mission", utf8(mission + bomb), null));
        cases.add(new Case("alias bomb as the map", null, utf8(bomb.toString())));
        cases.add(new Case("recursive alias", utf8(mission + "x: &x [*x]\n"), null));
        // deep nesting
        cases.add(new Case("deep flow nesting", utf8(mission + "x: " + "[".repeat(5000) + "]".repeat(5000) + "\n"), null));
        StringBuilder deep = new StringBuilder();
        for (int i = 0; i < 200; i++) {
            deep.append("  ".repeat(i)).append("k").append(i).append(":\n");
        }
        cases.add(new Case("deep block nesting", utf8(mission + deep), null));
        // long lines and large files
        cases.add(new Case("an 8 MiB name", utf8(mission.replace("name: Night round", "name: " + "n".repeat(8 << 19))), null));
        cases.add(new Case("a line over the limit", utf8(mission + "# " + "c".repeat(70_000) + "\n"), null));
        cases.add(new Case("a file over 8 MiB", utf8(mission + "#".repeat(9 << 20)), null));
        cases.add(new Case("a long plan row", null, utf8(map.replace("  ####################\n", "  " + "#".repeat(3000) + "\n"))));
        // encodings
        cases.add(new Case("overlong slash", concat(utf8("name: a"), new byte[] {(byte) 0xC0, (byte) 0xAF}, utf8(without(ml, 1))), null));
        cases.add(new Case("surrogate", concat(utf8("name: a"), new byte[] {(byte) 0xED, (byte) 0xA0, (byte) 0x80}, utf8("\n"),
                utf8(without(ml, 1))), null));
        cases.add(new Case("utf-16", concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, mission.getBytes(StandardCharsets.UTF_16LE)), null));
        cases.add(new Case("latin-1 name", concat(utf8("name: caf"), new byte[] {(byte) 0xE9}, utf8("\n" + without(ml, 1))), null));
        cases.add(new Case("NUL byte", utf8(mission.replace("robot:", "rob\0ot:")), null));
        cases.add(new Case("bidi override in the name", utf8(mission.replace("name: Night", "name: \u202Eevil\u2066")), null));
        cases.add(new Case("bidi override in a key", utf8(mission + "ke\u202Ey: 1\n"), null));
        cases.add(new Case("tabs", utf8(mission.replace("  capacity", "\tcapacity")), null));
        cases.add(new Case("byte order mark", concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, utf8(mission)), null));
        cases.add(new Case("empty mission", new byte[0], null));
        cases.add(new Case("empty map", null, new byte[0]));
        // plan and legend errors
        cases.add(new Case("ragged plan", null, utf8(map.replace("  #.....#......#,,,,,#\n", "  #.....#...\n"))));
        cases.add(new Case("unknown plan symbol", null, utf8(map.replace("#C...", "#C.?."))));
        cases.add(new Case("no dock", null, utf8(map.replace("#C...", "#....").replace("  \"C\": {surface: tile, dock: true}\n", ""))));
        cases.add(new Case("empty plan", null, utf8(map.replaceAll("(?s)plan: \\|.*?\n\n", "plan: |\n\n"))));
        cases.add(new Case("long legend key", null, utf8(map.replace("\"#\": wall", "\"##\": wall"))));
        cases.add(new Case("unknown surface", null, utf8(map.replace("\",\": carpet", "\",\": lava"))));
        cases.add(new Case("legend as a list", null, utf8(map.replace("  \"#\": wall\n", "  - wall\n"))));
        cases.add(new Case("plan as a number", null, utf8(map.replaceAll("(?s)plan: \\|.*?\n\n", "plan: 42\n\n"))));
        return cases;
    }

    /** References from a mission's map: to a device, a pipe, a folder, a loop, traversal and non-maps. */
    List<Case> references(String mission) throws IOException, InterruptedException {
        List<Case> cases = new ArrayList<>();
        Map<String, String> targets = new LinkedHashMap<>();
        targets.put("device", "/dev/zero");
        targets.put("device named .yaml", "zero.yaml");
        targets.put("folder", ".");
        targets.put("folder named .yaml", "folder.yaml");
        targets.put("link loop", "loop-a.yaml");
        targets.put("traversal to a system file", "../../../../../../../../etc/passwd");
        targets.put("traversal to a missing yaml", "../../../../../../../../etc/missing.yaml");
        targets.put("a non-map yaml", "not-a-map.yaml");
        targets.put("the mission itself", "mission.yaml");
        targets.put("empty path", "\"\"");
        targets.put("named pipe", "pipe.yaml");
        Files.createDirectories(dir.resolve("folder.yaml"));
        Files.writeString(dir.resolve("not-a-map.yaml"), "user: someone\nsecret: do-not-show-this\n");
        try {
            Files.createSymbolicLink(dir.resolve("loop-a.yaml"), dir.resolve("loop-b.yaml"));
            Files.createSymbolicLink(dir.resolve("loop-b.yaml"), dir.resolve("loop-a.yaml"));
            if (Files.exists(Path.of("/dev/zero"))) {
                Files.createSymbolicLink(dir.resolve("zero.yaml"), Path.of("/dev/zero"));
            }
        } catch (UnsupportedOperationException | IOException e) {
            System.out.println("HostileCorpusTest: no symbolic links here; the link cases read a missing file");
        }
        boolean fifo = false;
        try {
            Process p = new ProcessBuilder("mkfifo", dir.resolve("pipe.yaml").toString()).redirectErrorStream(true).start();
            fifo = p.waitFor(10, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            fifo = false;
        }
        if (!fifo) {
            System.out.println("HostileCorpusTest: SKIPPED the named-pipe case: mkfifo is not available here");
            targets.remove("named pipe");
        }
        for (Map.Entry<String, String> t : targets.entrySet()) {
            cases.add(new Case("map: " + t.getKey(), utf8(mission.replace("map: ../maps/clinic-wing.yaml", "map: " + t.getValue())), null));
        }
        return cases;
    }

    private static String without(String[] lines, int i) {
        List<String> l = new ArrayList<>(List.of(lines));
        l.remove(i);
        return String.join("\n", l);
    }

    private static String replaceValue(String text, String key, String value) {
        return text.replaceFirst("(?m)^(\\s*(?:- )?" + Pattern.quote(key) + ":)[^\\n#]*", "$1 " + Matcher.quoteReplacement(value));
    }

    private static final class Matcher {
        static String quoteReplacement(String s) {
            return java.util.regex.Matcher.quoteReplacement(s);
        }
    }

    @Test
    void everyHostileCase_isLocatedAndHinted_neverATraceOrExit4_andQuick() throws Exception {
        String mission = Files.readString(Path.of("missions/night-round.yaml"));
        String map = Files.readString(Path.of("maps/clinic-wing.yaml"));
        List<Case> cases = corpus(mission, map);
        cases.addAll(references(mission));
        assertThat(cases.size()).isGreaterThan(300);
        int rejected = 0;
        List<String> failures = new ArrayList<>();
        Path maps = Files.createDirectories(dir.resolve("maps"));
        Path missions = Files.createDirectories(dir.resolve("missions"));
        for (Case c : cases) {
            Files.write(maps.resolve("clinic-wing.yaml"), c.map() != null ? c.map() : utf8(map));
            Path mf = missions.resolve("mission.yaml");
            byte[] mb = c.mission() != null ? c.mission() : utf8(mission);
            if (c.name().startsWith("map: ")) {
                // references are resolved from the mission's folder: the link and pipe targets live in dir
                mf = dir.resolve("mission.yaml");
            }
            Files.write(mf, mb);
            for (String command : new String[] {"validate", "check"}) {
                CliRun r = command.equals("check") ? run(command, mf.toString(), "--verdict-only") : run(command, mf.toString());
                String tag = c.name() + " / " + command + " (exit " + r.code() + ", " + r.millis() + " ms)";
                if (r.code() == ExitCodes.INTERNAL || r.code() < 0 || r.code() > ExitCodes.RESOURCE_LIMIT) {
                    failures.add(tag + ": " + r.err());
                }
                if (r.err().contains("\tat ") || r.err().contains("Exception")) {
                    failures.add(tag + ": a stack trace or exception name: " + r.err());
                }
                if (r.millis() > 5000) {
                    failures.add(tag + ": took over 5 s");
                }
                if (r.code() == ExitCodes.BAD_INPUT) {
                    rejected++;
                    for (String line : r.err().split("\\R")) {
                        if (!line.isBlank() && !LOCATED.matcher(line).matches()) {
                            failures.add(tag + ": not located or without a hint: " + line);
                        }
                    }
                }
                if (r.err().contains("do-not-show-this") || r.err().contains("root:x:")) {
                    failures.add(tag + ": quotes another file's content: " + r.err());
                }
            }
        }
        System.out.println("HostileCorpusTest: " + cases.size() + " cases, " + rejected + " rejections by validate or check");
        assertThat(failures).isEmpty();
        // the corpus is hostile: most cases are rejected (a corpus that only passes would check nothing)
        assertThat(rejected).isGreaterThan(cases.size());
    }
}
