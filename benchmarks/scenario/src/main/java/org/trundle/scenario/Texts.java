package org.trundle.scenario;

/**
 * Limits on what a scenario may contain, and the shortening of user text echoed in messages, so
 * that a hostile or mistaken file is rejected quickly and its message stays one readable line.
 *
 * <ul>
 *   <li>{@link #MAX_FILE_BYTES}: 1 MiB. The largest scenario of our own (a spline centreline of some
 *       thousand points) is a few tens of kilobytes; a mebibyte leaves room for 20,000-point
 *       centrelines while a whole file still parses in well under a second.</li>
 *   <li>{@link #MAX_KEY_CHARS} (100) and {@link #MAX_STRING_CHARS} (4,096): the longest key and the
 *       longest string value (a description of a page).</li>
 *   <li>{@link #MAX_DEPTH} (32): the deepest nesting of objects and lists (a scenario needs 4).</li>
 *   <li>A value echoed in a message is cut to {@link #ECHO_CHARS} characters, with the count of
 *       the characters left out.</li>
 * </ul>
 */
public final class Texts {
    /** Largest scenario file (bytes). */
    public static final int MAX_FILE_BYTES = 1 << 20;
    /** Longest key (characters). */
    public static final int MAX_KEY_CHARS = 100;
    /** Longest string value (characters). */
    public static final int MAX_STRING_CHARS = 4096;
    /** Deepest nesting of objects and lists. */
    public static final int MAX_DEPTH = 32;
    /** Longest piece of user text echoed in a message (characters). */
    public static final int ECHO_CHARS = 60;

    private Texts() {
    }

    /**
     * @param s user text (may be null)
     * @return the text, cut to {@link #ECHO_CHARS} characters with a note of how many were left out
     */
    public static String clip(String s) {
        if (s == null || s.length() <= ECHO_CHARS) {
            return s;
        }
        return s.substring(0, ECHO_CHARS) + "... (" + (s.length() - ECHO_CHARS) + " more characters)";
    }
}
