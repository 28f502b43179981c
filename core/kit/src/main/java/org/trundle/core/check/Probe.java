package org.trundle.core.check;

/**
 * The classified outcome of one robustness case: the outcome, the case's one-line description and
 * a detail (the message of the rejection or stop, or what went wrong).
 *
 * @param outcome the outcome
 * @param description the case's description (seed, index, inputs)
 * @param detail the message or defect
 */
public record Probe(Outcome outcome, String description, String detail) {
    /** @return one line */
    public String describe() {
        return outcome.label() + ": " + description + " -> " + detail;
    }
}
