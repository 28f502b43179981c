package org.trundle.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

import javax.imageio.ImageIO;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.trundle.contact.HertzContact;
import org.trundle.core.Ball;
import org.trundle.core.EventKind;
import org.trundle.core.Material;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.scenario.Scenario;
import org.trundle.scenario.ScenarioFiles;

/**
 * The worked example of the README section "Why a ball stops travelling along a horizontal tube":
 * runs the invented feed-tube scenario ({@code benchmarks/scenarios/feed-tube-travel.json}) with four
 * contact sections (pure rolling, rolling resistance, Coulomb pivoting, spin creep), draws the axial
 * speed {@code X = v·e_axis} against time, one panel per law with its derived envelope (black), and
 * prints the measured figures beside the derived ones.
 *
 * <p>Derived laws (no-gravity reduced tube equations, derivation in {@code TubeSpinTest}; gravity is
 * {@code g/(ρΩ²)} ≈ 3 % of the centripetal load here): with {@code ρ = R − r}, circling speed
 * {@code V₀}, {@code Ω = V₀/ρ}, {@code F_n = m ρ Ω²}, {@code λ² = k/(1+k)}, {@code I = k m r²}:
 * pure rolling, constant amplitude {@code A₀}; rolling resistance δ,
 * {@code A = A₀ (1 + β V₀ t)^(−1/2)}, {@code β = δ/((1+k) r ρ)}; Coulomb pivoting δp, extremes fall by
 * {@code 2 δp ρ Ω/(k r)} per half cycle until {@code |X| < μ/Ω}, {@code μ = δp F_n/(k m r)}, then the
 * ball locks into a helix; spin creep, {@code A = A₀ exp(−γ t/2)}, {@code γ = c_v/I},
 * {@code c_v = G c⁴ C₃₃/V}.
 *
 * <p>Usage (after {@code mvn package}):
 * {@code java -cp benchmarks/runner/target/trundle.jar org.trundle.report.TubeTravelFigure [SCENARIO] [PNG]}.
 */
public final class TubeTravelFigure {
    private static final int W = 1100;
    private static final int H = 250;

    private TubeTravelFigure() {
    }

    /** One contact section of the comparison, with its derived envelope and law text. */
    private record Variant(String title, String law, String keys, DoubleUnaryOperator envelope, Color color) {
    }

    /** The samples of one run. */
    private record Trace(double[] t, double[] x, RunResult result) {
    }

    /**
     * @param args optional scenario path and PNG path
     * @throws IOException when the picture cannot be written
     */
    public static void main(String[] args) throws IOException {
        Path scenarioFile = Path.of(args.length > 0 ? args[0] : "benchmarks/scenarios/feed-tube-travel.json");
        Path png = Path.of(args.length > 1 ? args[1] : "benchmarks/docs/tube-travel.png");
        JsonNode base = ScenarioFiles.read(scenarioFile);
        Scenario ref = Scenario.parse(base);
        Simulation sim = ref.simulation();
        Ball ball = sim.ball();
        double r = ball.radius();
        double m = ball.mass();
        double k = ball.inertiaFactor();
        double inertia = ball.momentOfInertia();
        JsonNode surf = base.get("surface");
        double bigR = surf.get("radius").doubleValue();
        Vector3D axis = new Vector3D(surf.get("axis").get(0).doubleValue(), surf.get("axis").get(1).doubleValue(),
            surf.get("axis").get(2).doubleValue()).normalize();
        Vector3D v0 = ref.start().velocity();
        double a0 = Math.abs(v0.dotProduct(axis));
        double rho = bigR - r;
        // the rms circling speed over a turn: ½(1+k)V² + g⊥ ρ(1 − cos θ) is constant while rolling
        Vector3D grav = sim.gravity();
        double gPerp = grav.subtract(grav.dotProduct(axis), axis).getNorm();
        double bottom = v0.subtract(v0.dotProduct(axis), axis).getNorm();
        double circling = Math.sqrt(bottom * bottom - 2 * gPerp * rho / (1 + k));
        double omega = circling / rho;
        double fn = m * rho * omega * omega;
        double lambda = Math.sqrt(k / (1 + k));
        JsonNode contact = base.get("contact");
        double dp = contact.get("pivoting_resistance").doubleValue();
        double delta = 2.5e-5;
        Material ballMat = material(base.get("ball").get("material"));
        Material wallMat = material(surf.get("material"));
        double c = HertzContact.meanRadius(fn, r, 1 / bigR, 0, ballMat.contactModulus(wallMat));
        double rollSpeed = circling * bigR / rho;
        double cv = ballMat.combinedShearModulus(wallMat) * Math.pow(c, 4) * 1.0 / rollSpeed;
        double gamma = cv / inertia;
        double beta = delta / ((1 + k) * r * rho);
        double step = 2 * dp * rho * omega / (k * r);
        double halfPeriod = Math.PI / (lambda * omega);
        double lockSpeed = dp * fn / (k * m * r) / omega;
        List<Variant> variants = List.of(
            new Variant("pure rolling", "A = A0: X^2 + lambda^2 u^2 is conserved", "", t -> a0,
                new Color(0x30, 0x30, 0x30)),
            new Variant("rolling resistance, delta = " + delta * 1e6 + " um",
                "A = A0 (1 + beta V0 t)^-1/2, beta = delta/((1+k) r rho)", ", \"rolling_resistance\": " + delta,
                t -> a0 / Math.sqrt(1 + beta * circling * t), new Color(0xd9, 0x6a, 0x10)),
            new Variant("Coulomb pivoting, delta_p = " + dp * 1e6 + " um",
                "extremes fall by 2 delta_p rho Omega/(k r) per half cycle, then lock below mu/Omega",
                ", \"pivoting_resistance\": " + dp,
                t -> Math.max(a0 - step * t / halfPeriod, lockSpeed), new Color(0x1f, 0x5f, 0xb4)),
            new Variant("spin creep (steel in acrylic), saturating at delta_p",
                "A = A0 exp(-gamma t/2), gamma = c_v/I, c_v = G c^4 C33/V",
                ", \"spin_creep\": true, \"pivoting_resistance\": " + dp,
                t -> a0 * Math.exp(-gamma * t / 2), new Color(0x2f, 0x9e, 0x55)));
        System.out.printf(Locale.ROOT, "derived with the rms circling speed V0 = %.4g m/s: Omega %.4g rad/s, F_n %.4g N, axial period %.4g s, c %.4g m, c_v %.4g N m s%n",
            circling, omega, fn, 2 * halfPeriod, c, cv);
        List<BufferedImage> panels = new ArrayList<>();
        for (Variant v : variants) {
            Trace tr = run(base, v.keys, axis);
            panels.add(BitmapEncoder.getBufferedImage(chart(v, tr)));
            report(v, tr, a0, beta * circling, step, lockSpeed, gamma);
        }
        String[] title = {
            "Why a ball stops travelling along a horizontal tube (invented: 8 mm steel ball, 30 mm acrylic bore, "
                + bottom + " m/s circling)",
            "axial speed X against time, runs of benchmarks/scenarios/feed-tube-travel.json; black: the"
                + " derived envelope of each law"};
        int top = 64;
        BufferedImage img = new BufferedImage(W, top + H * panels.size(), BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, img.getWidth(), img.getHeight());
        g.setColor(new Color(0x20, 0x20, 0x20));
        for (int i = 0; i < title.length; i++) {
            g.setFont(new Font(Font.SANS_SERIF, i == 0 ? Font.BOLD : Font.PLAIN, i == 0 ? 15 : 14));
            g.drawString(title[i], 14, 24 + 24 * i);
        }
        for (int i = 0; i < panels.size(); i++) {
            g.drawImage(panels.get(i), 0, top + i * H, null);
        }
        g.dispose();
        if (png.getParent() != null) {
            Files.createDirectories(png.getParent());
        }
        ImageIO.write(img, "png", png.toFile());
        System.out.println("wrote " + png);
    }

    private static Material material(JsonNode n) {
        return Material.of(n.get("youngs_modulus").doubleValue(), n.get("poisson_ratio").doubleValue());
    }

    /** Runs the scenario with its contact section replaced by {@code {"law": "rolling"<keys>}}. */
    private static Trace run(JsonNode base, String keys, Vector3D axis) {
        JsonNode doc = base.deepCopy();
        ((ObjectNode) doc).set("contact", ScenarioFiles.parse("{\"law\": \"rolling\"" + keys + "}"));
        Scenario s = Scenario.parse(doc);
        List<double[]> rows = new ArrayList<>();
        RunResult res = s.simulation().run(s.start(), s.duration(),
            smp -> rows.add(new double[] {smp.time(), smp.state().velocity().dotProduct(axis)}));
        double[] t = new double[rows.size()];
        double[] x = new double[rows.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = rows.get(i)[0];
            x[i] = rows.get(i)[1];
        }
        return new Trace(t, x, res);
    }

    private static XYChart chart(Variant v, Trace tr) {
        XYChart c = Palette.chart(W, H, v.title + ":  " + v.law, "time t (s)", "axial speed X (m/s)");
        c.getStyler().setLegendVisible(false);
        XYSeries s = c.addSeries(v.title, tr.t, tr.x);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(v.color);
        s.setLineStyle(new BasicStroke(1.0f));
        int n = 300;
        double end = tr.t[tr.t.length - 1];
        double[] et = new double[n];
        double[] up = new double[n];
        double[] down = new double[n];
        for (int i = 0; i < n; i++) {
            et[i] = end * i / (n - 1);
            up[i] = v.envelope.applyAsDouble(et[i]);
            down[i] = -up[i];
        }
        for (double[] e : new double[][] {up, down}) {
            XYSeries d = c.addSeries(v.title + (e == up ? " +" : " -"), et, e);
            d.setMarker(SeriesMarkers.NONE);
            d.setLineColor(Color.BLACK);
            d.setLineStyle(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {9f, 6f},
                0f));
        }
        return c;
    }

    /** Prints measured against derived figures for one run. */
    private static void report(Variant v, Trace tr, double a0, double rollRate, double step, double lockSpeed,
                               double gamma) {
        List<double[]> ext = new ArrayList<>();
        for (int i = 1; i + 1 < tr.t.length; i++) {
            double y0 = Math.abs(tr.x[i - 1]);
            double y1 = Math.abs(tr.x[i]);
            double y2 = Math.abs(tr.x[i + 1]);
            // a sample repeated at an event or at the end is no extreme
            boolean spaced = tr.t[i + 1] > tr.t[i] && tr.t[i] > tr.t[i - 1];
            if (spaced && y1 > y0 && y1 >= y2) {
                double den = y0 - 2 * y1 + y2;
                double off = den == 0 ? 0 : 0.5 * (y0 - y2) / den;
                ext.add(new double[] {tr.t[i] + off * (tr.t[i + 1] - tr.t[i]), y1 - 0.25 * (y0 - y2) * off});
            }
        }
        RunResult res = tr.result;
        String head = String.format(Locale.ROOT, "%s: end %s, budget residual %.2e, %d extremes", v.title,
            res.endReason(), res.energy().relativeResidual(), ext.size());
        System.out.println(head);
        if (ext.isEmpty()) {
            return;
        }
        double[] last = ext.get(ext.size() - 1);
        System.out.printf(Locale.ROOT, "  last extreme at t = %.4f s: %.6g m/s, envelope %.6g m/s%n", last[0], last[1],
            v.envelope.applyAsDouble(last[0]));
        if (v.keys.contains("rolling_resistance")) {
            System.out.printf(Locale.ROOT, "  A/A0 at the last extreme %.5f, derived (1 + beta V0 t)^-1/2 = %.5f%n",
                last[1] / a0, 1 / Math.sqrt(1 + rollRate * last[0]));
        } else if (v.keys.contains("spin_creep")) {
            double[] fit = logSlope(ext);
            System.out.printf(Locale.ROOT, "  decay rate of ln A %.5g 1/s, derived gamma/2 = %.5g 1/s%n", -fit[0],
                gamma / 2);
        } else if (v.keys.contains("pivoting_resistance")) {
            List<RunEvent> sticks = res.eventsOf(EventKind.PIVOT_STICK);
            double prev = a0;
            StringBuilder drops = new StringBuilder();
            for (double[] e : ext) {
                if (!sticks.isEmpty() && e[0] > sticks.get(0).time()) {
                    break;
                }
                drops.append(String.format(Locale.ROOT, " %.5f", (prev - e[1]) / step));
                prev = e[1];
            }
            System.out.printf(Locale.ROOT, "  drops per half cycle over the derived step %.5g m/s:%s%n", step, drops);
            if (!sticks.isEmpty()) {
                RunEvent st = sticks.get(0);
                double xl = st.after().velocity().getNorm() > 0 ? lockedSpeed(tr, st.time()) : 0;
                double worst = 0;
                for (int i = 0; i < tr.t.length; i++) {
                    if (tr.t[i] > st.time()) {
                        worst = Math.max(worst, Math.abs(tr.x[i] / xl - 1));
                    }
                }
                System.out.printf(Locale.ROOT, "  pivot stick at t = %.5f s, locked X = %.6g m/s (mu/Omega = %.5g),"
                    + " largest relative change after %.3e, releases %d%n", st.time(), xl, lockSpeed, worst,
                    res.eventsOf(EventKind.PIVOT_RELEASE).size());
            }
        } else {
            double worst = 0;
            for (double[] e : ext) {
                worst = Math.max(worst, Math.abs(e[1] / a0 - 1));
            }
            System.out.printf(Locale.ROOT, "  largest relative deviation of the extremes from A0 %.3e%n", worst);
        }
    }

    private static double lockedSpeed(Trace tr, double t0) {
        for (int i = 0; i < tr.t.length; i++) {
            if (tr.t[i] > t0) {
                return tr.x[i];
            }
        }
        return Double.NaN;
    }

    /** Least-squares slope and intercept of ln A against t over the extremes. */
    private static double[] logSlope(List<double[]> ext) {
        double n = ext.size();
        double st = 0;
        double sy = 0;
        double stt = 0;
        double sty = 0;
        for (double[] e : ext) {
            double y = Math.log(e[1]);
            st += e[0];
            sy += y;
            stt += e[0] * e[0];
            sty += e[0] * y;
        }
        double slope = (n * sty - st * sy) / (n * stt - st * st);
        return new double[] {slope, (sy - slope * st) / n};
    }
}
