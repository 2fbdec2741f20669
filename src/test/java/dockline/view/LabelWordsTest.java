package dockline.view;

import static org.assertj.core.api.Assertions.assertThat;

import dockline.report.MissionResult;
import dockline.report.RuleOfThumb;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * The words and exit codes the report and the window show for their labels, which come from the constants'
 * names by one rule ({@code dockline.model.Worded}): the JSON words of DEVELOPERS.md's output vocabulary,
 * the exit codes of README's "Exit codes" paragraph, and the window's verdict headings.
 */
class LabelWordsTest {

    @Test
    void statusWordsAndExitCodesAreTheDocumentedOnes() {
        assertThat(Arrays.stream(MissionResult.Status.values()).map(MissionResult.Status::word))
                .containsExactly("guaranteed", "not-guaranteed", "bad-input", "over-resource-limit", "internal-error");
        // each status with its own code, whatever order the constants stand in
        assertThat(Arrays.stream(MissionResult.Status.values()).map(s -> s.word() + "=" + s.exitCode()))
                .containsExactlyInAnyOrder("guaranteed=0", "not-guaranteed=1", "bad-input=2", "over-resource-limit=3",
                        "internal-error=4");
    }

    @Test
    void ruleOfThumbFlagsAreTheJsonWords() {
        assertThat(Arrays.stream(RuleOfThumb.Flag.values()).map(RuleOfThumb.Flag::word))
                .containsExactly("agrees", "calls-unsafe-safe", "refuses-guaranteed");
    }

    @Test
    void verdictHeadingsAreCapitalisedPhrases() {
        assertThat(Arrays.stream(VerdictSummary.Outcome.values()).map(VerdictSummary.Outcome::title))
                .containsExactly("Guaranteed", "Not guaranteed", "Not checked");
    }
}
