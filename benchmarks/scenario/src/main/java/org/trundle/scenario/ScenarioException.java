package org.trundle.scenario;

/**
 * A scenario (or command line) the runner cannot accept: malformed JSON, an unknown or missing key,
 * a value of the wrong type, out of range or physically impossible. Its message is one line, meant
 * for the user as is; the runner prints it and exits with code 2.
 */
public final class ScenarioException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param message what is wrong, where (the key's dotted path) and the value found
     */
    public ScenarioException(String message) {
        super(oneLine(message), null, false, false);
    }

    /** Longest message (characters); user values in it are cut before, this is the last guard. */
    static final int MAX_CHARS = 1000;

    private static String oneLine(String message) {
        String m = message.replace('\n', ' ').replace('\r', ' ');
        return m.length() <= MAX_CHARS ? m : m.substring(0, MAX_CHARS) + "... (message cut)";
    }
}
