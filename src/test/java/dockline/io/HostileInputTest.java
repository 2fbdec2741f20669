package dockline.io;

import static dockline.io.Fixtures.MAP;
import static dockline.io.Fixtures.MISSION;
import static dockline.io.Fixtures.edit;
import static dockline.io.Fixtures.mapProblems;
import static dockline.io.Fixtures.missionProblems;
import static dockline.io.Fixtures.write;
import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Hostile inputs (issue 15, bullet 1): only regular files are read, a mission's map must be a YAML
 * file, a file that is not a map is refused without quoting it, messages quote little and escape
 * what a terminal would hide, reading is linear, and strict UTF-8.
 */
class HostileInputTest {

    @TempDir
    Path dir;

    private static boolean mkfifo(Path p) throws InterruptedException {
        try {
            Process pr = new ProcessBuilder("mkfifo", p.toString()).redirectErrorStream(true).start();
            return pr.waitFor(10, TimeUnit.SECONDS) && pr.exitValue() == 0;
        } catch (IOException e) {
            return false;
        }
    }

    private static void allHaveHints(List<Problem> ps) {
        for (Problem p : ps) {
            assertThat(p.hint()).as(p.format()).isNotBlank();
        }
    }

    /** A FIFO opened for reading would wait for a writer for ever: it is refused before it is opened. */
    @Test
    void aNamedPipe_isRefusedAtOnce_asMapAndAsMission() throws Exception {
        Path fifo = dir.resolve("pipe.yaml");
        if (!mkfifo(fifo)) {
            System.out.println("SKIPPED aNamedPipe_isRefusedAtOnce_asMapAndAsMission: mkfifo is not available here");
            assumeTrue(false, "mkfifo is not available");
        }
        long t0 = System.nanoTime();
        List<Problem> ps = mapProblems(fifo);
        assertThat(ps).singleElement().satisfies(p -> assertThat(p.message()).contains("named pipe"));
        allHaveHints(ps);
        Path mission = write(dir, "m.yaml", edit(MISSION, "map: map.yaml", "map: pipe.yaml"));
        List<Problem> mp = missionProblems(mission);
        assertThat(mp).anySatisfy(p -> {
            assertThat(p.file()).isEqualTo(mission);
            assertThat(p.message()).contains("named pipe").doesNotContain("not found");
        });
        allHaveHints(mp);
        assertThat(Duration.ofNanos(System.nanoTime() - t0)).isLessThan(Duration.ofSeconds(5));
    }

    @Test
    void aDevice_aFolder_aLinkLoop_andADanglingLink_areRefusedWithTheReason() throws IOException {
        if (Files.exists(Path.of("/dev/zero"))) {
            assertThat(mapProblems(Path.of("/dev/zero"))).singleElement()
                    .satisfies(p -> assertThat(p.message()).contains("device"));
        }
        assertThat(mapProblems(dir)).singleElement().satisfies(p -> assertThat(p.message()).contains("directory"));
        Path a = dir.resolve("a.yaml");
        Path b = dir.resolve("b.yaml");
        try {
            Files.createSymbolicLink(a, b);
            Files.createSymbolicLink(b, a);
            Files.createSymbolicLink(dir.resolve("dangling.yaml"), dir.resolve("nowhere.yaml"));
        } catch (UnsupportedOperationException | IOException e) {
            assumeTrue(false, "no symbolic links here");
        }
        assertThat(mapProblems(a)).singleElement().satisfies(p -> assertThat(p.message()).contains("loop"));
        Path mission = write(dir, "m.yaml", edit(MISSION, "map: map.yaml", "map: a.yaml"));
        assertThat(missionProblems(mission)).anySatisfy(p -> assertThat(p.message()).contains("a.yaml").contains("loop"));
        Path m2 = write(dir, "m2.yaml", edit(MISSION, "map: map.yaml", "map: dangling.yaml"));
        List<Problem> ps = missionProblems(m2);
        assertThat(ps).anySatisfy(p -> assertThat(p.message()).contains("dangling.yaml"));
        // never "did you mean" the very name that was given
        assertThat(ps).noneSatisfy(p -> assertThat(String.valueOf(p.hint())).contains("did you mean 'dangling.yaml'"));
        allHaveHints(ps);
    }

    /** A mission could name any file on the machine; only YAML files are read, and a non-map is not quoted. */
    @Test
    void aMissionsMap_mustBeYaml_andANonMapIsNotQuoted() throws IOException {
        Path secret = write(dir, "secret.txt", "topsecret:x:0:0:hidden-line\n");
        Path m = write(dir, "m.yaml", edit(MISSION, "map: map.yaml", "map: secret.txt"));
        List<Problem> ps = missionProblems(m);
        assertThat(ps).anySatisfy(p -> assertThat(p.message()).contains(".yaml or .yml"));
        assertThat(ps).noneSatisfy(p -> assertThat(p.format()).contains("hidden-line"));
        Files.copy(secret, dir.resolve("secret.yaml"));
        write(dir, "other.yaml", "user: someone\npassword: hunter2-hidden\n");
        for (String target : List.of("secret.yaml", "other.yaml", "../" + dir.getFileName() + "/other.yaml")) {
            Path m2 = write(dir, "m2.yaml", edit(MISSION, "map: map.yaml", "map: " + target));
            List<Problem> p2 = missionProblems(m2);
            assertThat(p2).as(target).anySatisfy(p -> assertThat(p.message()).isEqualTo(MapLoader.NOT_A_MAP));
            assertThat(p2).noneSatisfy(p -> assertThat(p.format()).contains("hidden").contains("hunter2").contains("topsecret"));
            allHaveHints(p2);
        }
        // a real map with a mistake still gets its own messages
        write(dir, "map.yaml", edit(MAP, "cell-size: 1", "cell-size: one"));
        Path m3 = write(dir, "m3.yaml", MISSION);
        assertThat(missionProblems(m3)).anySatisfy(p -> assertThat(p.message()).contains("cell-size"));
    }

    /** A 7.5 MB name was echoed whole; a right-to-left override could reorder the message on screen. */
    @Test
    void messagesQuoteAtMost80Characters_andEscapeHiddenCharacters() throws IOException {
        String longKey = "k".repeat(5000);
        Path f = write(dir, "map.yaml", edit(MAP, "budget: 1", "budget: " + longKey) + "evil\u202Ekey\u2066x: 2\n");
        List<Problem> ps = mapProblems(f);
        assertThat(ps).anySatisfy(p -> assertThat(p.message()).contains("k".repeat(80) + "...").doesNotContain("k".repeat(81)));
        assertThat(ps).anySatisfy(p -> assertThat(p.message()).contains("\\u202E").contains("\\u2066"));
        for (Problem p : ps) {
            assertThat(p.format()).doesNotContain("\u202E").doesNotContain("\u2066");
            assertThat(p.message().length()).as(p.message()).isLessThanOrEqualTo(Problems.LONGEST + 3);
        }
        // names that would reorder every report line, or fill it, are refused where they are written
        List<Problem> names = mapProblems(write(dir, "n.yaml", edit(MAP, "name: test floor", "name: a\u202Eb")));
        assertThat(names).singleElement().satisfies(p -> assertThat(p.message()).contains("U+202E").contains("a\\u202Eb"));
        List<Problem> longName = mapProblems(write(dir, "n.yaml", edit(MAP, "name: test floor", "name: " + "n".repeat(60_000))));
        assertThat(longName).singleElement().satisfies(p -> assertThat(p.message()).contains("60000 characters"));
        assertThat(Loading.shorten("a\u200Eb\u200Fc\u202Ad\u0007")).isEqualTo("a\\u200Eb\\u200Fc\\u202Ad\\u0007");
        assertThat(Problems.safe("x\u202Ey")).isEqualTo("x\\u202Ey");
    }

    /** Overlong and surrogate encodings are not UTF-8 (RFC 3629, section 3: C0, C1 and ED A0..BF never appear). */
    @Test
    void overlongAndSurrogateUtf8_areRejected() throws IOException {
        byte[] head = "name: a".getBytes(StandardCharsets.US_ASCII);
        for (byte[] bad : List.of(new byte[] {(byte) 0xC0, (byte) 0xAF}, new byte[] {(byte) 0xED, (byte) 0xA0, (byte) 0x80},
                new byte[] {(byte) 0xE0, (byte) 0x80, (byte) 0xAF}, new byte[] {(byte) 0xF4, (byte) 0x90, (byte) 0x80, (byte) 0x80})) {
            byte[] all = new byte[head.length + bad.length + MAP.length()];
            System.arraycopy(head, 0, all, 0, head.length);
            System.arraycopy(bad, 0, all, head.length, bad.length);
            byte[] rest = ("\n" + MAP.substring(MAP.indexOf('\n') + 1)).getBytes(StandardCharsets.UTF_8);
            byte[] file = java.util.Arrays.copyOf(all, head.length + bad.length + rest.length);
            System.arraycopy(rest, 0, file, head.length + bad.length, rest.length);
            Path f = write(dir, "map.yaml", file);
            List<Problem> ps = mapProblems(f);
            assertThat(ps).as(java.util.HexFormat.of().formatHex(bad))
                    .anySatisfy(p -> assertThat(p.message()).contains("not valid UTF-8"));
            allHaveHints(ps);
        }
    }

    /**
     * Reading is linear: an 8 MiB line is refused after one pass (the YAML scanner's time grows with the
     * square of a line's length), and 8 MiB of short lines with 100 000 keys (duplicates were found by a
     * scan of the keys before: quadratic) read in seconds.
     */
    @Test
    void longLinesAndManyKeys_readInLinearTime() throws IOException {
        byte[] one = ("name: " + "a".repeat((8 << 20) - 100) + "\n").getBytes(StandardCharsets.US_ASCII);
        long t0 = System.nanoTime();
        List<Problem> ps = catchProblems(() -> MapLoader.load(dir.resolve("one.yaml"), one));
        assertThat(ps).singleElement().satisfies(p -> assertThat(p.message()).contains("characters long"));
        assertThat(Duration.ofNanos(System.nanoTime() - t0)).isLessThan(Duration.ofSeconds(5));
        // 8 MiB of short lines against a quarter of it: linear time grows 4x, the old key scan 16x
        long small = timeManyKeys(25_000);
        long big = timeManyKeys(100_000);
        assertThat(big).as("ns for 100 000 keys against " + small + " for 25 000").isLessThan(8 * small + 2_000_000_000L);
        // a line just under the limit is parsed (and its value reported, shortened)
        byte[] under = (MAP + "x: " + "b".repeat(YamlReader.MAX_LINE - 10) + "\n").getBytes(StandardCharsets.US_ASCII);
        List<Problem> ps3 = catchProblems(() -> MapLoader.load(dir.resolve("under.yaml"), under));
        assertThat(ps3).anySatisfy(p -> assertThat(p.message()).contains("unknown key 'x'"))
                .noneSatisfy(p -> assertThat(p.message()).contains("characters long"));
    }

    /** Position lookups in increasing order are linear even on one long line (many tabs on one line). */
    @Test
    void manyTabsOnOneLine_areCountedInLinearTime() {
        String line = "name: x" + " \t".repeat(30_000) + "\n";
        Problems ps = new Problems(Path.of("t.yaml"));
        long t0 = System.nanoTime();
        SourceText.of(line, ps);
        assertThat(Duration.ofNanos(System.nanoTime() - t0)).isLessThan(Duration.ofSeconds(2));
        assertThat(ps.count()).isEqualTo(SourceTextShown.SHOWN + 1);
    }

    /** A discounted threshold near 2^63 was accepted by validate and refused only by check, with advice that did not help. */
    @Test
    void aDiscountedThresholdPastExactArithmetic_isRefusedAtLoad() throws IOException {
        String discounted = MISSION.replaceAll("(?s)objective:.*", "") + "objective:\n  kind: discounted\n  discount: 3\n"
                + "  threshold: \"9223372036854775000/7\"\n";
        Path m = Fixtures.missionFiles(dir, MAP, discounted);
        List<Problem> ps = missionProblems(m);
        assertThat(ps).singleElement().satisfies(p -> {
            assertThat(p.message()).contains("too large for exact arithmetic");
            assertThat(p.line()).isEqualTo(Fixtures.pos(discounted, "\"9223372036854775000/7\"")[0]);
            assertThat(p.hint()).contains("smaller numerator");
        });
        Path ok = Fixtures.missionFiles(dir, MAP, discounted.replace("9223372036854775000/7", "3/4"));
        assertThat(ok).exists();
        org.assertj.core.api.Assertions.assertThatCode(() -> MissionLoader.load(ok)).doesNotThrowAnyException();
    }

    private long timeManyKeys(int n) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < n; i++) {
            sb.append("k").append(i).append(": abcdefghijklmnopqrstuvwxyz0123456789abcdefghijklmnopqrstuvwxyz\n");
        }
        byte[] many = sb.toString().getBytes(StandardCharsets.US_ASCII);
        catchProblems(() -> MapLoader.load(dir.resolve("warm.yaml"), many)); // the parser's code compiled
        long t1 = System.nanoTime();
        List<Problem> ps = catchProblems(() -> MapLoader.load(dir.resolve("many.yaml"), many));
        assertThat(ps).isNotEmpty();
        return System.nanoTime() - t1;
    }

    private interface Load {
        Object run() throws InputException;
    }

    private static List<Problem> catchProblems(Load l) {
        try {
            l.run();
        } catch (InputException e) {
            return e.problems();
        }
        throw new AssertionError("expected the input to be rejected");
    }

    /** The number of problems of one kind shown one by one (the rest are counted in one line). */
    private static final class SourceTextShown {
        static final int SHOWN = 10;
    }
}
