package org.trundle.scenario;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.databind.JsonNode;
import org.trundle.core.sweep.Axis;
import org.trundle.core.sweep.Grid;
import org.trundle.core.sweep.ParameterPoint;
import org.trundle.core.sweep.ParameterSpace;
import org.trundle.core.sweep.RandomSample;

/**
 * The {@code sweep} section of a scenario: which values vary and how.
 *
 * <pre>{@code
 * "sweep": {
 *   "start.speed":         {"from": 0.2, "to": 1.6, "count": 30},
 *   "start.elevation_deg": [-70, -50, -30, -10],
 *   "random": {"samples": 500, "seed": 7},
 *   "labels": {"exit_to": "comes back out (top)"}
 * }
 * }</pre>
 * Every key with a dot is a parameter: the dotted path of a numeric value of the scenario
 * ({@link ScenarioPath}), given a range {@code {"from", "to", "count"}} (count ≥ 1 evenly spaced
 * values, both ends included) or a list of values. Without {@code random} the parameters span a
 * grid (the first one varies slowest); with {@code random} ({@code samples} ≥ 1, integer
 * {@code seed}) each run draws every parameter uniformly from its {@code {"from", "to"}} range.
 * {@code labels} (optional) names outcomes in the regime map's legend: each key must be an outcome
 * of the scenario ({@link #outcomes}), old camelCase edge spellings included.
 *
 * @param paths the parameter paths, in file order
 * @param space the points
 * @param random whether the points are a random sample
 * @param labels legend labels by outcome
 */
public record SweepSpec(List<ScenarioPath> paths, ParameterSpace space, boolean random, Map<String, String> labels) {

    /** Largest number of runs a sweep may ask for. */
    static final int MAX_RUNS = 10_000_000;

    /**
     * @param doc the scenario document
     * @return the sweep, checked against the document
     */
    public static SweepSpec parse(JsonNode doc) {
        Section root = Section.root(doc);
        if (!root.has("sweep")) {
            throw new ScenarioException("the scenario has no sweep section; add \"sweep\": {\"start.speed\":"
                + " {\"from\": 0.1, \"to\": 1.0, \"count\": 10}} or use the run command");
        }
        Section s = root.section("sweep");
        List<ScenarioPath> paths = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (String k : s.keys()) {
            if (k.contains(".")) {
                ScenarioPath p = ScenarioPath.parse(k);
                p.check(doc);
                paths.add(p);
                names.add(k);
            } else if (!k.equals("random") && !k.equals("labels")) {
                throw new ScenarioException("unknown key sweep." + k + "; valid keys in sweep: a dotted parameter path"
                    + " (like start.velocity[2]), random, labels");
            }
        }
        if (paths.isEmpty()) {
            throw new ScenarioException("the sweep section names no parameter; add one like \"start.velocity[2]\":"
                + " {\"from\": -1.0, \"to\": 0.0, \"count\": 40}");
        }
        Map<String, String> labels = new LinkedHashMap<>();
        s.optionalSection("labels").ifPresent(l -> labels.putAll(labels(l, outcomes(root))));
        ParameterSpace space;
        boolean random = s.has("random");
        if (random) {
            Section r = s.section("random");
            r.allow("samples", "seed");
            int samples = integer(r, "samples", 1, MAX_RUNS);
            long seed = (long) integerValue(r, "seed");
            List<RandomSample.Range> ranges = new ArrayList<>();
            for (String k : names) {
                Section p = s.section(k);
                p.allow("from", "to");
                double from = p.number("from", "");
                double to = p.number("to", "");
                if (!(from <= to)) {
                    throw new ScenarioException(p.where("from") + " must not exceed " + p.where("to") + ", got from = "
                        + from + ", to = " + to);
                }
                finiteWidth(p, from, to);
                ranges.add(new RandomSample.Range(k, from, to));
            }
            space = RandomSample.of(seed, samples, ranges);
        } else {
            List<Axis> axes = new ArrayList<>();
            long total = 1;
            for (String k : names) {
                JsonNode n = s.raw(k);
                Axis a;
                if (n.isArray()) {
                    if (n.size() == 0) {
                        throw new ScenarioException("sweep." + k + " must list at least one value, got an empty list");
                    }
                    double[] v = new double[n.size()];
                    for (int i = 0; i < v.length; i++) {
                        if (!n.get(i).isNumber()) {
                            throw new ScenarioException("sweep." + k + "[" + i + "] must be a number, got "
                                + Section.kind(n.get(i)));
                        }
                        v[i] = n.get(i).doubleValue();
                    }
                    a = Axis.of(k, v);
                } else if (n.isObject()) {
                    Section p = s.section(k);
                    p.allow("from", "to", "count");
                    double from = p.number("from", "");
                    double to = p.number("to", "");
                    finiteWidth(p, from, to);
                    a = Axis.linear(k, from, to, integer(p, "count", 1, MAX_RUNS));
                } else {
                    throw new ScenarioException("sweep." + k + " must be a range {\"from\": .., \"to\": .., \"count\": ..}"
                        + " or a list of values, got " + Section.kind(n));
                }
                total *= a.size();
                if (total > MAX_RUNS) {
                    throw new ScenarioException("the sweep grid has more than " + MAX_RUNS + " runs");
                }
                axes.add(a);
            }
            space = Grid.of(axes);
        }
        return new SweepSpec(List.copyOf(paths), space, random, Map.copyOf(labels));
    }

    /** A range whose width {@code to − from} is a finite double. */
    private static void finiteWidth(Section p, double from, double to) {
        if (!Double.isFinite(to - from)) {
            throw new ScenarioException(p.path() + " spans from " + from + " to " + to + ", a width beyond the largest"
                + " double (about 1.8e308); give a narrower range");
        }
    }

    /** Largest legend label (characters): a legend line. */
    static final int MAX_LABEL_CHARS = 80;

    /**
     * The outcomes a run of this scenario can have: {@code exit_<edge>} for each edge its surface
     * names, then {@code duration}, {@code rest}, {@code budget}, {@code failed}.
     *
     * @param root the scenario's root
     * @return the outcome names, in that order
     */
    /**
     * The names of a surface's edges: indices 0 up until a name repeats or the surface refuses the index, and for
     * a {@link org.trundle.surfaces.Bounded} surface its own bounds (indices from
     * {@link org.trundle.surfaces.Bounded#FIRST_EDGE}) after the inner surface's.
     *
     * @param surface a surface
     * @return the edge names, none for a surface without edges
     */
    static List<String> edgeNames(org.trundle.core.Surface surface) {
        List<String> out = new ArrayList<>();
        if (surface instanceof org.trundle.surfaces.Bounded b) {
            out.addAll(edgeNames(b.inner()));
            addEdges(surface, org.trundle.surfaces.Bounded.FIRST_EDGE, out);
        } else if (surface.hasEdges()) {
            addEdges(surface, 0, out);
        }
        return out;
    }

    private static void addEdges(org.trundle.core.Surface surface, int first, List<String> out) {
        for (int i = 0; i < 16; i++) {
            String o;
            try {
                o = surface.edgeName(first + i);
            } catch (RuntimeException pastTheLastEdge) {
                break; // a surface may refuse an index past its last edge
            }
            if (out.contains(o) || o.equals("edge" + (first + i))) {
                break; // or repeat the last edge's name, or give the generic name
            }
            out.add(o);
        }
    }

    static List<String> outcomes(Section root) {
        List<String> out = new ArrayList<>();
        for (org.trundle.core.Patch p : SceneFactory.patches(root, java.util.Optional.empty())) {
            for (String e : edgeNames(p.surface())) {
                if (!out.contains("exit_" + e)) {
                    out.add("exit_" + e);
                }
            }
        }
        out.addAll(List.of("duration", "rest", "budget", "left_for_good", "failed"));
        return out;
    }

    /**
     * The {@code labels} section: outcome name → legend text. A key must be an outcome of the
     * scenario; the camelCase edge spellings of earlier versions ({@code exit_angleFrom}) are
     * accepted for the snake_case ones ({@code exit_angle_from}) and the other way round.
     *
     * @param l the section
     * @param outcomes the scenario's outcomes
     * @return the labels, keyed by outcome name
     */
    static Map<String, String> labels(Section l, List<String> outcomes) {
        Map<String, String> labels = new LinkedHashMap<>();
        for (String k : l.keys()) {
            String outcome = null;
            for (String o : outcomes) {
                if (snakeEdge(o).equals(snakeEdge(k))) {
                    outcome = o;
                }
            }
            if (outcome == null) {
                throw new ScenarioException("unknown key " + Texts.clip(l.where(k)) + ": not an outcome of this scenario;"
                    + " outcomes: " + String.join(", ", outcomes));
            }
            String text = l.text(k, k);
            if (text.length() > MAX_LABEL_CHARS) {
                throw new ScenarioException(l.where(k) + " is a legend label of " + text.length() + " characters; labels"
                    + " may have at most " + MAX_LABEL_CHARS);
            }
            labels.put(outcome, text);
        }
        return labels;
    }

    /**
     * The outcome name for a {@code labels} key, accepting the camelCase edge names of earlier
     * versions as aliases (scenario keys are a contract): {@code exit_angleFrom} becomes
     * {@code exit_angle_from}, {@code exit_polarTo} {@code exit_polar_to}; other keys are unchanged.
     *
     * @param key a labels key
     * @return the outcome it names
     */
    static String snakeEdge(String key) {
        if (!key.startsWith("exit_")) {
            return key;
        }
        StringBuilder b = new StringBuilder(key.length() + 4);
        for (char c : key.toCharArray()) {
            if (Character.isUpperCase(c)) {
                b.append('_').append(Character.toLowerCase(c));
            } else {
                b.append(c);
            }
        }
        return b.toString();
    }

    private static double integerValue(Section s, String key) {
        double v = s.number(key, "");
        JsonNode n = s.raw(key);
        if (!n.canConvertToExactIntegral() || !n.canConvertToLong()) {
            throw new ScenarioException(s.where(key) + " must be a whole number, got " + n.asText());
        }
        return v;
    }

    private static int integer(Section s, String key, int lo, int hi) {
        double v = integerValue(s, key);
        if (v < lo || v > hi) {
            throw new ScenarioException(s.where(key) + " must lie in [" + lo + ", " + hi + "], got " + (long) v);
        }
        return (int) v;
    }

    /**
     * @param doc the base document
     * @param p a point of the space
     * @return the document with the point's values set
     */
    JsonNode apply(JsonNode doc, ParameterPoint p) {
        JsonNode d = doc;
        for (int i = 0; i < paths.size(); i++) {
            d = paths.get(i).set(d, p.value(i));
        }
        return d;
    }

    /**
     * The scenario of one point, or a {@link ScenarioException} naming the point.
     *
     * @param doc the base document
     * @param p the point
     * @return the scenario
     */
    public Scenario scenario(JsonNode doc, ParameterPoint p) {
        try {
            return Scenario.parse(apply(doc, p));
        } catch (ScenarioException e) {
            throw new ScenarioException("sweep point " + p.index() + " " + describe(p) + ": " + e.getMessage());
        }
    }

    static String describe(ParameterPoint p) {
        StringBuilder b = new StringBuilder("(");
        for (int i = 0; i < p.size(); i++) {
            b.append(i == 0 ? "" : ", ").append(p.names().get(i)).append(" = ").append(p.value(i));
        }
        return b.append(')').toString();
    }
}
