package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.Size;

/**
 * Feeds mutated copies of the demo files to the loaders: lines deleted, duplicated or swapped,
 * characters swapped or deleted, random bytes written or inserted, the file cut short. Every
 * mutant must either load or be rejected with an {@link InputException} whose problems all have a
 * line and column inside the file and a hint; no other exception may escape (HostileCorpusTest runs
 * a generated corpus of hostile cases through the commands).
 */
class LoaderMutationProperties {

    private static final List<String> MAPS = List.of("maps/clinic-wing.yaml", "maps/research-block.yaml");
    private static final List<String> MISSIONS = List.of("missions/night-round.yaml", "missions/supply-run.yaml",
            "missions/late-return.yaml");

    /** One edit; positions are fractions of the current length so that every edit applies. */
    record Mutation(int op, double where, double other, byte value) {

        byte[] apply(byte[] in) {
            if (in.length == 0) {
                return new byte[] {value};
            }
            int i = Math.min(in.length - 1, (int) (where * in.length));
            int j = Math.min(in.length - 1, (int) (other * in.length));
            List<byte[]> lines = lines(in);
            int li = Math.min(lines.size() - 1, (int) (where * lines.size()));
            int lj = Math.min(lines.size() - 1, (int) (other * lines.size()));
            switch (op) {
                case 0: // delete a line
                    lines.remove(li);
                    return join(lines);
                case 1: // duplicate a line
                    lines.add(li, lines.get(li));
                    return join(lines);
                case 2: { // swap two lines
                    byte[] t = lines.get(li);
                    lines.set(li, lines.get(lj));
                    lines.set(lj, t);
                    return join(lines);
                }
                case 3: { // swap two neighbouring characters
                    byte[] out = in.clone();
                    if (i + 1 < out.length) {
                        byte t = out[i];
                        out[i] = out[i + 1];
                        out[i + 1] = t;
                    }
                    return out;
                }
                case 4: { // overwrite a byte with a random one
                    byte[] out = in.clone();
                    out[i] = value;
                    return out;
                }
                case 5: { // insert a random byte
                    byte[] out = new byte[in.length + 1];
                    System.arraycopy(in, 0, out, 0, i);
                    out[i] = value;
                    System.arraycopy(in, i, out, i + 1, in.length - i);
                    return out;
                }
                case 6: { // delete a byte
                    byte[] out = new byte[in.length - 1];
                    System.arraycopy(in, 0, out, 0, i);
                    System.arraycopy(in, i + 1, out, i, in.length - i - 1);
                    return out;
                }
                case 7: // cut the file short
                    return Arrays.copyOf(in, i);
                default: { // overwrite a byte with a character YAML gives a meaning
                    byte[] out = in.clone();
                    String special = ":-[]{}#&*!|>'\"%@`,?\t \n";
                    out[i] = (byte) special.charAt(Math.floorMod(value, special.length()));
                    return out;
                }
            }
        }
    }

    @Provide
    Arbitrary<Mutation> mutation() {
        return Combinators.combine(Arbitraries.integers().between(0, 8), Arbitraries.doubles().between(0, 1),
                Arbitraries.doubles().between(0, 1), Arbitraries.bytes()).as(Mutation::new);
    }

    @Property(tries = 1500)
    void mutated_maps_load_or_fail_with_positions(@ForAll("mapFile") String file,
                                                  @ForAll @Size(min = 1, max = 4) List<@net.jqwik.api.From("mutation") Mutation> edits)
            throws IOException {
        byte[] bytes = mutate(Files.readAllBytes(Path.of(file)), edits);
        Path path = Path.of(file);
        try {
            MapLoader.load(path, bytes);
        } catch (InputException e) {
            checkProblems(e, path, bytes);
        }
    }

    @Property(tries = 1500)
    void mutated_missions_load_or_fail_with_positions(@ForAll("missionFile") String file,
                                                      @ForAll @Size(min = 1, max = 4) List<@net.jqwik.api.From("mutation") Mutation> edits)
            throws IOException {
        byte[] bytes = mutate(Files.readAllBytes(Path.of(file)), edits);
        Path path = Path.of(file);
        try {
            MissionLoader.load(path, bytes);
        } catch (InputException e) {
            checkProblems(e, path, bytes);
        }
    }

    @Provide
    Arbitrary<String> mapFile() {
        return Arbitraries.of(MAPS);
    }

    @Provide
    Arbitrary<String> missionFile() {
        return Arbitraries.of(MISSIONS);
    }

    private static byte[] mutate(byte[] bytes, List<Mutation> edits) {
        for (Mutation m : edits) {
            bytes = m.apply(bytes);
        }
        return bytes;
    }

    private static void checkProblems(InputException e, Path file, byte[] bytes) throws IOException {
        assertThat(e.problems()).isNotEmpty();
        int lines = countLines(bytes);
        for (Problem p : e.problems()) {
            assertThat(p.line()).as(p.format()).isGreaterThanOrEqualTo(1);
            assertThat(p.column()).as(p.format()).isGreaterThanOrEqualTo(1);
            assertThat(p.message()).as(p.format()).isNotBlank().doesNotContain(Problems.INTERNAL);
            assertThat(p.hint()).as("every problem has a hint: " + p.format()).isNotBlank();
            if (p.file().equals(file)) {
                assertThat(p.line()).as(p.format()).isLessThanOrEqualTo(lines + 1);
            } else {
                // a problem in the map a mutated mission names: the map on disk is intact, so
                // only "cannot read"-style problems at 1:1 are possible there
                assertThat(Files.exists(p.file()) ? countLines(Files.readAllBytes(p.file())) + 1 : 1)
                        .isGreaterThanOrEqualTo(p.line());
            }
            assertThat(p.format()).startsWith(p.file() + ":" + p.line() + ":" + p.column() + ": ");
        }
    }

    /** Lines as the YAML scanner counts them (CR LF, CR, LF, NEL, LS, PS), counted generously over bytes. */
    private static int countLines(byte[] bytes) {
        String s = new String(bytes, StandardCharsets.UTF_8);
        int n = 1;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\n' || c == '\r' || c == '\u0085' || c == '\u2028' || c == '\u2029') {
                n++;
            }
        }
        return n;
    }

    private static List<byte[]> lines(byte[] in) {
        List<byte[]> out = new ArrayList<>();
        int start = 0;
        for (int i = 0; i < in.length; i++) {
            if (in[i] == '\n') {
                out.add(Arrays.copyOfRange(in, start, i + 1));
                start = i + 1;
            }
        }
        if (start < in.length) {
            out.add(Arrays.copyOfRange(in, start, in.length));
        }
        if (out.isEmpty()) {
            out.add(new byte[0]);
        }
        return out;
    }

    private static byte[] join(List<byte[]> lines) {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        for (byte[] l : lines) {
            b.writeBytes(l);
        }
        return b.toByteArray();
    }
}
