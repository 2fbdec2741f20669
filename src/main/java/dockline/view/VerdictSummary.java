package dockline.view;

import dockline.model.Worded;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * What the window says about a solved mission: the outcome, the verdict in words, the status of
 * the independent certificate check, and the two figures users ask for first.
 *
 * @param outcome               guaranteed, not guaranteed, or not checked yet
 * @param words                 the verdict as a sentence for people
 * @param certificate           the certificate status in words (checked, failed, not available...)
 * @param worstCaseMinimumUnits the lowest battery level (units) any disturbance can drive the robot to
 *                              while it follows the policy; empty when not guaranteed or not known
 * @param highestReserveUnits   the highest reserve floor (units) that can be guaranteed; empty when none or not known
 */
public record VerdictSummary(Outcome outcome, String words, String certificate, OptionalInt worstCaseMinimumUnits,
                      OptionalInt highestReserveUnits) {

    /** The three states a verdict can be in; the first two have the words of the core's verdict. */
    public enum Outcome implements Worded {
        GUARANTEED,
        NOT_GUARANTEED,
        NOT_CHECKED;

        /** A short heading for the verdict label: the word as a capitalised phrase, e.g. {@code Not guaranteed}. */
        public String title() {
            String w = word().replace('-', ' ');
            return Character.toUpperCase(w.charAt(0)) + w.substring(1);
        }
    }

    public VerdictSummary {
        Objects.requireNonNull(outcome, "outcome");
        Objects.requireNonNull(words, "words");
        Objects.requireNonNull(certificate, "certificate");
        Objects.requireNonNull(worstCaseMinimumUnits, "worstCaseMinimumUnits");
        Objects.requireNonNull(highestReserveUnits, "highestReserveUnits");
    }

    /** The verdict of a mission nobody solved yet. */
    public static VerdictSummary notChecked(String why) {
        return new VerdictSummary(Outcome.NOT_CHECKED, why, "no certificate", OptionalInt.empty(), OptionalInt.empty());
    }

    /** Heading and words on one line, e.g. {@code Guaranteed — the robot ...}. */
    public String headline() {
        return outcome.title() + " \u2014 " + words;
    }
}
