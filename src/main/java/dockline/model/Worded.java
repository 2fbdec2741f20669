package dockline.model;

import java.util.Locale;

/**
 * An enum whose constants are written in files, JSON and reports as one lower-case word: the
 * constant's name with {@code _} as {@code -} ({@code DOOR_SHUT} is {@code door-shut}). One rule for
 * every such enum, so a word and its constant cannot drift apart.
 */
public interface Worded {

    /** The constant's name (every enum has it). */
    String name();

    /** The word used in files and reports, e.g. {@code door-shut}. */
    default String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The constant of {@code type} spelled {@code w}, or {@code null}. Linear in the constants. */
    static <E extends Enum<E> & Worded> E ofWord(Class<E> type, String w) {
        for (E e : type.getEnumConstants()) {
            if (e.word().equals(w)) {
                return e;
            }
        }
        return null;
    }
}
