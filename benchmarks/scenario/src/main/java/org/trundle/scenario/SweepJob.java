package org.trundle.scenario;

import java.io.Serializable;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;
import java.util.function.BooleanSupplier;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import org.trundle.core.sweep.ParameterPoint;
import org.trundle.core.sweep.ParameterSpace;
import org.trundle.core.sweep.PointTask;
import org.trundle.core.sweep.Sweep;

/**
 * A scenario's sweep as data: the scenario document as JSON text (the only state that is
 * serialized), re-parsed where the job runs into its {@link SweepSpec} and parameter space. As a
 * {@link PointTask} it turns point {@code i} into its {@link SweepRow}: the point's values are set
 * into the document, the scenario is parsed and run, and the run is reduced to the row on the
 * spot. Any executor — {@link org.trundle.core.sweep.ThreadedExecutor} or the Spark module — calls
 * the same code, so the rows are the same by construction. A point whose scenario is invalid, or
 * whose run fails, is a row with outcome {@code failed} and the reason in {@code message}.
 *
 * <p>Immutable and thread-safe; serializable (the parsed parts are rebuilt on first use after
 * deserialization).
 */
public final class SweepJob implements PointTask<SweepRow>, Serializable {
    private static final long serialVersionUID = 1L;

    private final String text;
    private transient volatile Parsed parsed;

    /** The re-parsed parts. */
    private record Parsed(JsonNode doc, SweepSpec spec) {
    }

    private SweepJob(String text, Parsed parsed) {
        this.text = text;
        this.parsed = parsed;
    }


    /**
     * @param doc a scenario document with a sweep section (after any command-line overrides)
     * @return the job
     * @throws ScenarioException when the scenario or its sweep section is invalid
     */
    public static SweepJob of(JsonNode doc) {
        Scenario.parse(doc);
        SweepSpec spec = SweepSpec.parse(doc);
        String text;
        try {
            text = ScenarioFiles.JSON.writeValueAsString(doc);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException("cannot write the scenario document as JSON", e);
        }
        SweepJob job = new SweepJob(text, null); // every executor works from the text, re-parsed
        if (job.size() != spec.space().size()) {
            throw new IllegalStateException("the scenario does not survive a JSON round trip");
        }
        return job;
    }

    /**
     * @param text a scenario as JSON text
     * @return the job
     * @throws ScenarioException when the text, the scenario or its sweep section is invalid
     */
    public static SweepJob ofJson(String text) {
        return of(ScenarioFiles.parse(text));
    }

    private Parsed parsed() {
        Parsed p = parsed;
        if (p == null) {
            JsonNode doc = ScenarioFiles.parse(text);
            p = new Parsed(doc, SweepSpec.parse(doc));
            parsed = p;
        }
        return p;
    }

    /** @return the scenario document as JSON text */
    public String json() {
        return text;
    }

    /** @return the scenario document */
    public JsonNode document() {
        return parsed().doc();
    }

    /** @return the sweep section */
    public SweepSpec spec() {
        return parsed().spec();
    }

    /** @return the points (a grid, or a random sample drawn point by point from its seed) */
    public ParameterSpace space() {
        return parsed().spec().space();
    }

    /** @return the parameter names */
    public List<String> names() {
        return space().names();
    }

    /** @return number of runs */
    public int size() {
        return space().size();
    }

    /** @return legend labels by outcome */
    public Map<String, String> labels() {
        return parsed().spec().labels();
    }

    /**
     * The scenario of point {@code i}, checked (for a check before anything is run).
     *
     * @param i point index
     * @return the scenario
     * @throws ScenarioException naming the point when it is invalid
     */
    public Scenario scenario(int i) {
        Parsed p = parsed();
        return p.spec().scenario(p.doc(), p.spec().space().point(i));
    }

    /**
     * @param i point index
     * @return the row of point i, computed on the calling thread
     */
    public SweepRow row(int i) {
        return run(space().point(i), () -> false);
    }

    @Override
    public SweepRow run(ParameterPoint point, BooleanSupplier abandoned) {
        Parsed p = parsed();
        var run = Sweep.runPoint(q -> p.spec().scenario(p.doc(), q).runSpec(), point, abandoned);
        return run == null ? null : SweepRow.of(run);
    }

    @Override
    public boolean failed(SweepRow row) {
        return row.failed();
    }
}
