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
        super(message.replace('\n', ' ').replace('\r', ' '), null, false, false);
    }
}
