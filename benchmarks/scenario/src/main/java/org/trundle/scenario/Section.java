package org.trundle.scenario;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Checked, read-only access to one JSON object of a scenario, addressed by its dotted path
 * ({@code surface}, {@code contact}). Every reader names the key's full path, the unit expected
 * and the value found when it throws a {@link ScenarioException}.
 */
final class Section {
    private final String path;
    private final ObjectNode node;

    private Section(String path, ObjectNode node) {
        this.path = path;
        this.node = node;
    }

    /**
     * @param node the document root
     * @return the root section
     */
    static Section root(JsonNode node) {
        if (node == null || !node.isObject()) {
            throw new ScenarioException("the scenario must be a JSON object { ... }, got " + kind(node));
        }
        return new Section("", (ObjectNode) node);
    }

    /** @return the dotted path of this section ("" for the root) */
    String path() {
        return path;
    }

    /**
     * @param key a key of this section
     * @return its dotted path
     */
    String where(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /**
     * Rejects keys other than {@code valid}.
     *
     * @param valid the keys allowed here, in the order to list them
     */
    void allow(String... valid) {
        Set<String> ok = new LinkedHashSet<>(List.of(valid));
        Iterator<String> it = node.fieldNames();
        while (it.hasNext()) {
            String k = it.next();
            if (!ok.contains(k)) {
                throw new ScenarioException("unknown key " + Texts.clip(where(k)) + "; valid keys"
                    + (path.isEmpty() ? " at the top level" : " in " + path) + ": " + String.join(", ", ok));
            }
        }
    }

    boolean has(String key) {
        return node.has(key) && !node.get(key).isNull();
    }

    private JsonNode required(String key, String what) {
        if (!has(key)) {
            throw new ScenarioException("missing key " + where(key) + " (" + what + ")");
        }
        return node.get(key);
    }

    /**
     * @param key key of an object
     * @return the sub-section
     */
    Section section(String key) {
        JsonNode n = required(key, "an object { ... }");
        if (!n.isObject()) {
            throw new ScenarioException(where(key) + " must be an object { ... }, got " + kind(n));
        }
        return new Section(where(key), (ObjectNode) n);
    }

    /**
     * @param key a key to leave out
     * @return this section, at the same path, without {@code key} (a copy; this section is unchanged)
     */
    Section without(String key) {
        if (!node.has(key)) {
            return this;
        }
        ObjectNode copy = node.deepCopy();
        copy.remove(key);
        return new Section(path, copy);
    }

    /**
     * @param key key of a list of objects
     * @return one section per entry ({@code key[i]} in messages)
     */
    List<Section> sectionList(String key) {
        JsonNode n = required(key, "a list of objects [{ ... }, ...]");
        if (!n.isArray() || n.size() == 0) {
            throw new ScenarioException(where(key) + " must be a non-empty list of objects [{ ... }, ...], got " + kind(n));
        }
        List<Section> out = new java.util.ArrayList<>();
        for (int i = 0; i < n.size(); i++) {
            JsonNode e = n.get(i);
            if (!e.isObject()) {
                throw new ScenarioException(where(key) + "[" + i + "] must be an object { ... }, got " + kind(e));
            }
            out.add(new Section(where(key) + "[" + i + "]", (ObjectNode) e));
        }
        return out;
    }

    Optional<Section> optionalSection(String key) {
        return has(key) ? Optional.of(section(key)) : Optional.empty();
    }

    /**
     * @param key key
     * @param unit unit for messages, e.g. "m"
     * @return the number
     */
    double number(String key, String unit) {
        return toNumber(key, required(key, "a number" + unitText(unit)), unit);
    }

    OptionalDouble optionalNumber(String key, String unit) {
        return has(key) ? OptionalDouble.of(number(key, unit)) : OptionalDouble.empty();
    }

    double positive(String key, String unit) {
        double v = number(key, unit);
        if (!(v > 0)) {
            throw new ScenarioException(where(key) + " must be positive" + unitText(unit) + ", got " + v);
        }
        return v;
    }

    double nonNegative(String key, String unit, double dflt) {
        if (!has(key)) {
            return dflt;
        }
        double v = number(key, unit);
        if (!(v >= 0)) {
            throw new ScenarioException(where(key) + " must not be negative" + unitText(unit) + ", got " + v);
        }
        return v;
    }

    double inRange(String key, String unit, double lo, double hi, double dflt) {
        if (!has(key)) {
            return dflt;
        }
        double v = number(key, unit);
        if (!(v >= lo && v <= hi)) {
            throw new ScenarioException(where(key) + " must lie in [" + fmt(lo) + ", " + fmt(hi) + "]" + unitText(unit)
                + ", got " + v);
        }
        return v;
    }

    private double toNumber(String key, JsonNode n, String unit) {
        if (!n.isNumber()) {
            throw new ScenarioException(where(key) + " must be a number" + unitText(unit) + ", got " + kind(n));
        }
        double v = n.doubleValue();
        if (!Double.isFinite(v)) {
            throw new ScenarioException(where(key) + " must be a finite number" + unitText(unit) + ", got " + n);
        }
        return v;
    }

    /**
     * @param key key of a 3-vector
     * @param unit unit for messages
     * @return the vector
     */
    Vector3D vector(String key, String unit) {
        JsonNode n = required(key, "a vector [x, y, z]" + unitText(unit));
        return toVector(where(key), n, unit);
    }

    Vector3D vector(String key, String unit, Vector3D dflt) {
        return has(key) ? vector(key, unit) : dflt;
    }

    static Vector3D toVector(String where, JsonNode n, String unit) {
        if (!n.isArray() || n.size() != 3) {
            throw new ScenarioException(where + " must be a vector of 3 numbers [x, y, z]" + unitText(unit) + ", got "
                + kind(n));
        }
        double[] v = new double[3];
        for (int i = 0; i < 3; i++) {
            JsonNode c = n.get(i);
            if (!c.isNumber() || !Double.isFinite(c.doubleValue())) {
                throw new ScenarioException(where + "[" + i + "] must be a number" + unitText(unit) + ", got " + kind(c));
            }
            v[i] = c.doubleValue();
        }
        return new Vector3D(v[0], v[1], v[2]);
    }

    /**
     * A list of at least {@code min} vectors, e.g. the points of a spline centreline.
     *
     * @param key key of a list of [x, y, z] vectors
     * @param unit unit for messages
     * @param min smallest number of entries
     * @return the vectors
     */
    Vector3D[] vectorList(String key, String unit, int min) {
        JsonNode n = required(key, "a list of vectors [[x, y, z], ...]" + unitText(unit));
        if (!n.isArray() || n.size() < min) {
            throw new ScenarioException(where(key) + " must be a list of at least " + min + " vectors [x, y, z]"
                + unitText(unit) + ", got " + kind(n));
        }
        Vector3D[] out = new Vector3D[n.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = toVector(where(key) + "[" + i + "]", n.get(i), unit);
        }
        return out;
    }

    /**
     * A list of at least {@code min} pairs of numbers, e.g. a profile of [axial, radius] points.
     *
     * @param key key of a list of [a, b] pairs
     * @param unit unit for messages
     * @param min smallest number of entries
     * @return the pairs, as {first values, second values}
     */
    double[][] pairList(String key, String unit, int min) {
        JsonNode n = required(key, "a list of pairs [[a, b], ...]" + unitText(unit));
        if (!n.isArray() || n.size() < min) {
            throw new ScenarioException(where(key) + " must be a list of at least " + min + " pairs [a, b]"
                + unitText(unit) + ", got " + kind(n));
        }
        double[][] out = new double[2][n.size()];
        for (int i = 0; i < n.size(); i++) {
            JsonNode e = n.get(i);
            if (!e.isArray() || e.size() != 2 || !e.get(0).isNumber() || !e.get(1).isNumber()
                || !Double.isFinite(e.get(0).doubleValue()) || !Double.isFinite(e.get(1).doubleValue())) {
                throw new ScenarioException(where(key) + "[" + i + "] must be a pair of numbers [a, b]"
                    + unitText(unit) + ", got " + kind(e));
            }
            out[0][i] = e.get(0).doubleValue();
            out[1][i] = e.get(1).doubleValue();
        }
        return out;
    }

    /**
     * A number or a list of {@code count} numbers.
     *
     * @param key key
     * @param unit unit for messages
     * @param count length of the list form
     * @return the values, one per entry (a single number repeated)
     */
    double[] numberOrList(String key, String unit, int count) {
        JsonNode n = required(key, "a number or a list of " + count + " numbers" + unitText(unit));
        double[] out = new double[count];
        if (n.isNumber()) {
            java.util.Arrays.fill(out, toNumber(key, n, unit));
            return out;
        }
        if (!n.isArray() || n.size() != count) {
            throw new ScenarioException(where(key) + " must be a number or a list of " + count + " numbers"
                + unitText(unit) + ", got " + kind(n));
        }
        for (int i = 0; i < count; i++) {
            JsonNode c = n.get(i);
            if (!c.isNumber() || !Double.isFinite(c.doubleValue())) {
                throw new ScenarioException(where(key) + "[" + i + "] must be a number" + unitText(unit) + ", got "
                    + kind(c));
            }
            out[i] = c.doubleValue();
        }
        return out;
    }

    /**
     * A non-zero direction vector, returned as given (not normalised).
     *
     * @param key key
     * @return the vector
     */
    Vector3D direction(String key) {
        Vector3D v = vector(key, "");
        if (!(v.getNorm() > 0)) {
            throw new ScenarioException(where(key) + " must be a non-zero direction, got [0, 0, 0]");
        }
        return v;
    }

    /**
     * @param key key of a string with a fixed set of values
     * @param allowed the values
     * @return the value
     */
    String choice(String key, Iterable<String> allowed) {
        List<String> ok = new ArrayList<>();
        allowed.forEach(ok::add);
        JsonNode n = required(key, "one of " + String.join(", ", ok));
        if (!n.isTextual()) {
            throw new ScenarioException(where(key) + " must be one of " + quoteAll(ok) + ", got " + kind(n));
        }
        String s = n.textValue();
        if (!ok.contains(s)) {
            throw new ScenarioException(where(key) + " must be one of " + quoteAll(ok) + ", got \"" + Texts.clip(s) + "\"");
        }
        return s;
    }

    String text(String key, String dflt) {
        if (!has(key)) {
            return dflt;
        }
        JsonNode n = node.get(key);
        if (!n.isTextual()) {
            throw new ScenarioException(where(key) + " must be a string, got " + kind(n));
        }
        return n.textValue();
    }

    boolean bool(String key, boolean dflt) {
        if (!has(key)) {
            return dflt;
        }
        JsonNode n = node.get(key);
        if (!n.isBoolean()) {
            throw new ScenarioException(where(key) + " must be true or false, got " + kind(n));
        }
        return n.booleanValue();
    }

    Optional<Boolean> optionalBool(String key) {
        return has(key) ? Optional.of(bool(key, false)) : Optional.empty();
    }

    /**
     * @param key key
     * @return the raw node (required)
     */
    JsonNode raw(String key) {
        return required(key, "a value");
    }

    /** @return the keys of this section, in file order */
    List<String> keys() {
        List<String> k = new ArrayList<>();
        node.fieldNames().forEachRemaining(k::add);
        return k;
    }

    static String unitText(String unit) {
        return unit == null || unit.isEmpty() ? "" : " (" + unit + ")";
    }

    private static String quoteAll(List<String> ok) {
        List<String> q = new ArrayList<>();
        for (String s : ok) {
            q.add("\"" + s + "\"");
        }
        return String.join(", ", q);
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%s", v);
    }

    /**
     * @param n a JSON node
     * @return a short description of it for messages: {@code the string "abc"}, {@code an array of 2}
     */
    static String kind(JsonNode n) {
        if (n == null || n.isMissingNode()) {
            return "nothing";
        }
        if (n.isNull()) {
            return "null";
        }
        if (n.isTextual()) {
            String t = n.textValue();
            return "the string \"" + Texts.clip(t) + "\"";
        }
        if (n.isNumber()) {
            return "the number " + n.asText();
        }
        if (n.isBoolean()) {
            return "the boolean " + n.asText();
        }
        if (n.isArray()) {
            return "an array of " + n.size() + " element" + (n.size() == 1 ? "" : "s");
        }
        return "an object";
    }
}
