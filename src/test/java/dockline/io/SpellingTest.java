package dockline.io;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class SpellingTest {

    @Test
    void distances_of_textbook_pairs() {
        // kitten -> sitting needs 3 edits: the standard Levenshtein example (common practice)
        assertThat(Spelling.distance("kitten", "sitting")).isEqualTo(3);
        assertThat(Spelling.distance("", "abc")).isEqualTo(3);
        assertThat(Spelling.distance("same", "same")).isZero();
        // one neighbour swap counts as one edit (Damerau 1964)
        assertThat(Spelling.distance("gaet", "gate")).isEqualTo(1);
        // optimal string alignment: "ca" -> "abc" is 3 (the restricted form cannot edit a swapped pair again)
        assertThat(Spelling.distance("ca", "abc")).isEqualTo(3);
    }

    @Test
    void suggestions() {
        List<String> keys = List.of("name", "map", "robot", "start", "reserve", "tasks", "objective");
        assertThat(Spelling.closest("resrve", keys)).isEqualTo("reserve");
        assertThat(Spelling.closest("Robot", keys)).isEqualTo("robot");
        assertThat(Spelling.closest("objetcive", keys)).isEqualTo("objective");
        assertThat(Spelling.closest("battery", keys)).isNull();
        assertThat(Spelling.closest("x", keys)).isNull();
    }
}
