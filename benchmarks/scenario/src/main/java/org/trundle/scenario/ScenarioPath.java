package org.trundle.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * A dotted path to one numeric value of a scenario document, such as {@code start.velocity[2]} or
 * {@code contact.static_friction}: keys separated by dots, each key optionally followed by array
 * indices {@code [i]} (from 0). Setting a value writes into a copy of the document; the key's object
 * (or the indexed array element) must exist, a missing last key of an existing object is added (the
 * scenario check then tells whether it is a valid key there).
 */
public final class ScenarioPath {
    private static final Pattern SEGMENT = Pattern.compile("([A-Za-z_][A-Za-z0-9_]*)((?:\\[\\d+\\])*)");
    private static final Pattern INDEX = Pattern.compile("\\[(\\d+)\\]");

    private final String text;
    /** Steps: a String is an object key, an Integer an array index. */
    private final List<Object> steps;

    private ScenarioPath(String text, List<Object> steps) {
        this.text = text;
        this.steps = steps;
    }

    /**
     * @param text the dotted path
     * @return the path
     * @throws ScenarioException for a malformed path
     */
    public static ScenarioPath parse(String text) {
        List<Object> steps = new ArrayList<>();
        String[] parts = text.split("\\.", -1);
        for (String p : parts) {
            Matcher m = SEGMENT.matcher(p);
            if (!m.matches()) {
                throw new ScenarioException("sweep parameter \"" + Texts.clip(text) + "\" is not a dotted key path like"
                    + " start.velocity[2] or contact.static_friction");
            }
            steps.add(m.group(1));
            Matcher i = INDEX.matcher(m.group(2));
            while (i.find()) {
                String digits = i.group(1);
                if (digits.length() > 9) {
                    throw new ScenarioException("sweep parameter \"" + Texts.clip(text) + "\": index [" + Texts.clip(digits)
                        + "] is too large (no list in a scenario has more than " + Texts.MAX_FILE_BYTES + " elements)");
                }
                steps.add(Integer.parseInt(digits));
            }
        }
        if (steps.size() < 2 || steps.get(0).equals("sweep") || steps.get(0).equals("description")) {
            throw new ScenarioException("sweep parameter \"" + Texts.clip(text) + "\" must name a numeric value inside a section,"
                + " like start.velocity[2] or contact.static_friction");
        }
        return new ScenarioPath(text, steps);
    }

    @Override
    public String toString() {
        return text;
    }

    /**
     * Checks that the path leads to a number (or to a missing key of an existing object) in doc.
     *
     * @param doc the document
     */
    void check(JsonNode doc) {
        JsonNode parent = parentOf(doc);
        Object last = steps.get(steps.size() - 1);
        JsonNode leaf = last instanceof String ? parent.get((String) last) : parent.get((Integer) last);
        if (leaf != null && !leaf.isNumber()) {
            throw new ScenarioException("sweep parameter " + text + " must name a number in the scenario, but it is "
                + Section.kind(leaf));
        }
    }

    /**
     * @param doc the document (not modified)
     * @param value the value to set
     * @return a copy with the value at this path
     */
    public JsonNode set(JsonNode doc, double value) {
        JsonNode copy = doc.deepCopy();
        JsonNode parent = parentOf(copy);
        Object last = steps.get(steps.size() - 1);
        if (last instanceof String) {
            ((ObjectNode) parent).put((String) last, value);
        } else {
            ((ArrayNode) parent).set((Integer) last, ScenarioFiles.JSON.getNodeFactory().numberNode(value));
        }
        return copy;
    }

    private JsonNode parentOf(JsonNode doc) {
        JsonNode n = doc;
        StringBuilder at = new StringBuilder();
        for (int i = 0; i < steps.size(); i++) {
            Object s = steps.get(i);
            boolean isLast = i == steps.size() - 1;
            if (s instanceof String) {
                if (!n.isObject()) {
                    throw new ScenarioException("sweep parameter " + text + ": " + (at.length() == 0 ? "the document"
                        : at.toString()) + " is not an object");
                }
                if (isLast) {
                    return n;
                }
                JsonNode next = n.get((String) s);
                at.append(at.length() == 0 ? "" : ".").append(s);
                if (next == null) {
                    throw new ScenarioException("sweep parameter " + text + ": the scenario has no " + at);
                }
                n = next;
            } else {
                int idx = (Integer) s;
                if (!n.isArray() || idx >= n.size()) {
                    throw new ScenarioException("sweep parameter " + text + ": " + at + " has no element [" + idx + "]"
                        + (n.isArray() ? " (it has " + n.size() + ")" : " (it is not an array)"));
                }
                if (isLast) {
                    return n;
                }
                at.append('[').append(idx).append(']');
                n = n.get(idx);
            }
        }
        return n;
    }
}
