package org.trundle.report;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.EnergyBudget;
import org.trundle.core.EventKind;
import org.trundle.core.Phase;
import org.trundle.core.PhaseSpan;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Patch;
import org.trundle.core.Simulation;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceCoordinate;

/**
 * The HTML report of a run ({@code report.html}): one self-contained file that works offline. It
 * holds the page ({@code report-page.html}), the run's data as JSON (a thinned copy of the
 * recorder's bounded {@link SampleDigest}, the surface's mesh, the events, the summary and the
 * energy budget) and the view script ({@code report-view.js}: our view code bundled with three.js
 * at build time from the npm package pinned in {@code package-lock.json}). The view shows the patch
 * and the path in 3-D (orbit, pan, zoom), a time slider and play button that move the ball (with a
 * band and a pole mark so its spin shows), linked plots, the summary and the energy budget.
 */
public final class HtmlReport {
    /** Most sample rows embedded in a run report. */
    static final int MAX_ROWS = 2500;
    /** Most events embedded in a run report. */
    static final int MAX_EVENTS = 500;

    static final ObjectMapper JSON = new ObjectMapper();

    private HtmlReport() {
    }

    /**
     * Writes a run's report.
     *
     * @param file the HTML file to write
     * @param title the title (scenario headline)
     * @param outcome the outcome line
     * @param rec the recorded run
     * @param result the result, or null when the run failed
     * @param surface the surface
     * @param up unit up direction
     * @param ballRadius ball radius (m)
     * @throws IOException when the file cannot be written
     */
    public static void writeRun(Path file, String title, String outcome, RunRecorder rec, RunResult result,
                                Surface surface, Vector3D up, double ballRadius) throws IOException {
        writeRun(file, title, outcome, rec, result, List.of(Patch.of(Simulation.SINGLE_PATCH, surface)), up, ballRadius);
    }

    /**
     * Writes a scene's run report: every patch is drawn (a moving one at its pose at the first sample).
     *
     * @param file the HTML file to write
     * @param title the title (scenario headline)
     * @param outcome the outcome line
     * @param rec the recorded run
     * @param result the result, or null when the run failed
     * @param patches the scene's patches
     * @param up unit up direction
     * @param ballRadius ball radius (m)
     * @throws IOException when the file cannot be written
     */
    public static void writeRun(Path file, String title, String outcome, RunRecorder rec, RunResult result,
                                List<Patch> patches, Vector3D up, double ballRadius) throws IOException {
        ObjectNode data = JSON.createObjectNode();
        data.put("kind", "run");
        data.put("title", title);
        data.put("outcome", outcome);
        data.put("ball_radius", ballRadius);
        data.putArray("up").add(up.getX()).add(up.getY()).add(up.getZ());
        data.set("palette", palette());
        SampleDigest d = rec.digest();
        data.set("samples", samples(d));
        PatchMeshes pm = PatchMeshes.of(patches, d, ballRadius, PatchMeshes.VIEW_RESOLUTION);
        ObjectNode mesh = data.putObject("mesh");
        floats(mesh.putArray("vertices"), pm.mesh().vertices());
        ArrayNode tri = mesh.putArray("triangles");
        for (int i : pm.mesh().triangles()) {
            tri.add(i);
        }
        ArrayNode coords = data.putArray("coordinates");
        for (SurfaceCoordinate c : rec.coordinates()) {
            coords.addObject().put("name", c.name()).put("unit", c.unit()).put("meaning", c.meaning());
        }
        List<RunEvent> events = rec.events();
        ArrayNode ev = data.putArray("events");
        for (int i = 0; i < Math.min(events.size(), MAX_EVENTS); i++) {
            RunEvent e = events.get(i);
            Vector3D c = e.before().centre();
            ObjectNode o = ev.addObject().put("kind", e.kind().label()).put("t", e.time()).put("x", c.getX())
                .put("y", c.getY()).put("z", c.getZ()).put("speed", e.before().velocity().getNorm());
            String detail = "then " + e.phaseAfter().label();
            if (e.edge() != null) {
                detail += ", edge " + e.edge();
            }
            if (e.impulse() != null && e.impulse().getNorm() > 0) {
                detail += String.format(Locale.ROOT, ", impulse %.4g N·s", e.impulse().getNorm());
            }
            o.put("detail", detail);
        }
        data.put("events_left_out", Math.max(0, events.size() - MAX_EVENTS));
        data.set("summary", summary(result, rec, patches, pm));
        data.set("energy", energy(result == null ? null : result.energy()));
        write(file, title, data);
    }

    /**
     * Writes a page: the template with the title, the data and the view script filled in.
     *
     * @param file the HTML file
     * @param title page title
     * @param data the page's data
     * @throws IOException when the file cannot be written
     */
    static void write(Path file, String title, ObjectNode data) throws IOException {
        String page = resource("report-page.html").replace("@@TITLE@@", escape(title));
        String script = resource("report-view.js").replace("</script", "<\\/script");
        int a = page.indexOf("@@DATA@@");
        int b = page.lastIndexOf("@@SCRIPT@@");
        if (a < 0 || b < a) {
            throw new IllegalStateException("report-page.html must hold @@DATA@@ before @@SCRIPT@@");
        }
        // streamed into the file: the data (a sweep's thousands of rows) is never one string
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(page, 0, a);
            JSON.writeValue(new ScriptSafeWriter(w), data);
            w.write(page, a + "@@DATA@@".length(), b - a - "@@DATA@@".length());
            w.write(script);
            w.write(page, b + "@@SCRIPT@@".length(), page.length() - b - "@@SCRIPT@@".length());
        }
    }

    /**
     * Passes JSON text on with every {@code <} written as its six-character JSON escape (backslash, {@code u003c};
     * JSON has {@code <} only inside strings, where the escape reads the same), so no {@code </script} can end
     * the data's element; its {@code close} only flushes, leaving the file open for the rest of the page.
     */
    private static final class ScriptSafeWriter extends FilterWriter {
        ScriptSafeWriter(Writer out) {
            super(out);
        }

        @Override
        public void write(int c) throws IOException {
            if (c == '<') {
                out.write("\\u003c");
            } else {
                out.write(c);
            }
        }

        @Override
        public void write(char[] buf, int off, int len) throws IOException {
            int start = off;
            for (int i = off; i < off + len; i++) {
                if (buf[i] == '<') {
                    out.write(buf, start, i - start);
                    out.write("\\u003c");
                    start = i + 1;
                }
            }
            out.write(buf, start, off + len - start);
        }

        @Override
        public void write(String str, int off, int len) throws IOException {
            int start = off;
            for (int i = off; i < off + len; i++) {
                if (str.charAt(i) == '<') {
                    out.write(str, start, i - start);
                    out.write("\\u003c");
                    start = i + 1;
                }
            }
            out.write(str, start, off + len - start);
        }

        @Override
        public void close() throws IOException {
            out.flush();
        }
    }

    /** @return a resource of this package as text */
    static String resource(String name) {
        try (InputStream in = HtmlReport.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("resource " + name + " is missing from the report jar (the build's"
                    + " npm step makes report-view.js: see README, what the build needs)");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    static ObjectNode palette() {
        ObjectNode p = JSON.createObjectNode();
        ArrayNode phases = p.putArray("phases");
        ArrayNode names = p.putArray("phase_names");
        for (Phase ph : Phase.values()) {
            phases.add(Palette.rgb(Palette.phase(ph)));
            names.add(ph.label());
        }
        ObjectNode ev = p.putObject("events");
        for (EventKind k : EventKind.values()) {
            ev.put(k.label(), Palette.rgb(Palette.eventColor(k)));
        }
        ArrayNode axes = p.putArray("axes");
        for (int a = 0; a < 3; a++) {
            axes.add(Palette.rgb(Palette.axis(a)));
        }
        return p;
    }

    /** The digest's rows, every k-th (and the last) so at most {@link #MAX_ROWS} remain. */
    private static ObjectNode samples(SampleDigest d) {
        int n = d.size();
        int step = Math.max(1, (n + MAX_ROWS - 1) / MAX_ROWS);
        int m = n == 0 ? 0 : (n - 1) / step + 1 + ((n - 1) % step == 0 ? 0 : 1);
        int[] rows = new int[m];
        for (int k = 0, i = 0; i < n; i += step) {
            rows[k++] = i;
        }
        if (m > 0) {
            rows[m - 1] = n - 1;
        }
        ObjectNode s = JSON.createObjectNode();
        String[][] names = {{"t", "T"}, {"x", "X"}, {"y", "Y"}, {"z", "Z"}, {"speed", "SPEED"}, {"height", "HEIGHT"},
            {"normal", "NORMAL"}, {"friction", "FRICTION"}, {"qw", "QW"}, {"qx", "QX"}, {"qy", "QY"}, {"qz", "QZ"},
            {"u", "U"}, {"v", "V"}};
        for (String[] nm : names) {
            SampleDigest.Column c = SampleDigest.Column.valueOf(nm[1]);
            ArrayNode a = s.putArray(nm[0]);
            for (int r : rows) {
                double v = d.get(r, c);
                if (Double.isFinite(v)) {
                    if (c == SampleDigest.Column.T) {
                        a.add(v);
                    } else {
                        a.add((float) v);
                    }
                } else {
                    a.addNull();
                }
            }
        }
        ArrayNode ph = s.putArray("phase");
        for (int r : rows) {
            ph.add((int) d.get(r, SampleDigest.Column.PHASE));
        }
        return s;
    }

    private static void floats(ArrayNode a, double[] v) {
        for (double x : v) {
            a.add((float) x);
        }
    }

    private static ArrayNode summary(RunResult r, RunRecorder rec, List<Patch> patches, PatchMeshes pm) {
        ArrayNode rows = JSON.createArrayNode();
        if (patches.size() == 1) {
            row(rows, "surface", patches.get(0).surface().name());
        } else {
            StringBuilder b = new StringBuilder();
            for (Patch p : patches) {
                b.append(b.length() == 0 ? "" : ", ").append(p.id()).append(" (").append(p.surface().name()).append(')');
            }
            row(rows, "patches", b.toString());
        }
        if (r != null) {
            row(rows, "end", r.endReason().name().toLowerCase(Locale.ROOT) + (r.message() == null || r.message().isEmpty()
                ? "" : ": " + r.message()));
            row(rows, "end time", String.format(Locale.ROOT, "%.6g s", r.endState().time()));
            Vector3D c = r.endState().centre();
            Vector3D v = r.endState().velocity();
            row(rows, "end position", String.format(Locale.ROOT, "(%.5g, %.5g, %.5g) m", c.getX(), c.getY(), c.getZ()));
            row(rows, "end velocity", String.format(Locale.ROOT, "(%.5g, %.5g, %.5g) m/s, speed %.5g m/s", v.getX(),
                v.getY(), v.getZ(), v.getNorm()));
            StringBuilder ph = new StringBuilder();
            for (PhaseSpan p : r.phases()) {
                ph.append(ph.length() == 0 ? "" : "; ").append(String.format(Locale.ROOT, "%s %.4g–%.4g s",
                    p.phase().label(), p.start(), p.end()));
                if (ph.length() > 600) {
                    ph.append("; …");
                    break;
                }
            }
            row(rows, "phases", ph.toString());
            row(rows, "events", Integer.toString(r.events().size()));
            row(rows, "largest normal force", String.format(Locale.ROOT, "%.4g N", r.maxNormalForce()));
            row(rows, "largest distance error", String.format(Locale.ROOT, "%.3g m", r.maxDistanceError()));
        } else {
            row(rows, "end", "the run failed (see the outcome line)");
        }
        SampleDigest d = rec.digest();
        row(rows, "samples", d.count() + (d.stride() > 1 ? " (shown: " + d.size() + " buckets of " + d.stride() + ")" : ""));
        row(rows, "surface mesh", pm.note() != null ? pm.note() : pm.mesh().triangleCount() + " triangles");
        return rows;
    }

    private static void row(ArrayNode rows, String k, String v) {
        rows.addArray().add(k).add(v);
    }

    private static ObjectNode energy(EnergyBudget e) {
        ObjectNode o = JSON.createObjectNode();
        if (e == null) {
            return o;
        }
        o.put("initial", e.initial()).put("final", e.fin()).put("sliding_friction", e.slidingFrictionLoss())
            .put("rolling_resistance", e.rollingResistanceLoss()).put("pivoting_resistance", e.pivotingResistanceLoss())
            .put("other_couples", e.otherCoupleLoss()).put("impact", e.impactLoss()).put("applied_work", e.appliedWork())
            .put("residual", e.residual()).put("relative_residual", e.relativeResidual());
        return o;
    }
}
