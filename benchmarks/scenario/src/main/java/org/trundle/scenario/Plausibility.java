package org.trundle.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.fasterxml.jackson.databind.JsonNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;

/**
 * Warnings for values that are legal but unlikely to be what the author meant, above all values
 * written in other units than SI (millimetres, grams, percent). A scenario with warnings still
 * runs; the runner prints them on standard error and lists them in {@code summary.json}.
 *
 * <p>Thresholds (common practice, from memory; each is far outside what ball-handling hardware
 * meets, so that a warning means a slip, not an unusual design):
 * <ul>
 *   <li>mean density of the ball {@code m / (4/3 π r³)} below {@value #MIN_DENSITY} kg/m³ (air is
 *       1.2 kg/m³; an inflated beach ball is about 1.5) or above {@value #MAX_DENSITY} kg/m³ (osmium,
 *       the densest element, is 22,590 kg/m³; steel 7,850, tungsten carbide about 15,600). A ball
 *       written in millimetres and grams as metres and kilograms is 10⁶ to 10⁹ times off;</li>
 *   <li>a friction coefficient above {@value #MAX_FRICTION} (soft rubber on dry rough surfaces
 *       reaches about 1–2; μ = 40 is friction written in percent);</li>
 *   <li>a rolling- or pivoting-resistance length above {@value #MAX_RESISTANCE_FRACTION} of the
 *       ball radius (a ball on cloth or felt has δ/r of a few hundredths);</li>
 *   <li>a radius of the surface (radius, minor or major radius, profile radius) more than {@value #MAX_SCALE_RATIO} times the ball radius (lengths in two units: a tube in
 *       millimetres for a ball in metres);</li>
 *   <li>gravity between 0 and {@value #MIN_GRAVITY} m/s² or above {@value #MAX_GRAVITY} m/s² (the
 *       Moon 1.62, Jupiter 24.8; 9,810 is Earth's gravity in mm/s²); zero gravity is not warned.</li>
 * </ul>
 */
public final class Plausibility {
    /** Smallest plausible mean ball density (kg/m³). */
    public static final double MIN_DENSITY = 1.0;
    /** Largest plausible mean ball density (kg/m³). */
    public static final double MAX_DENSITY = 23_000.0;
    /** Largest plausible friction coefficient. */
    public static final double MAX_FRICTION = 2.0;
    /** Largest plausible resistance length, as a fraction of the ball radius. */
    public static final double MAX_RESISTANCE_FRACTION = 0.5;
    /** Largest plausible ratio of a surface length to the ball radius. */
    public static final double MAX_SCALE_RATIO = 1000.0;
    /** Smallest plausible non-zero gravity (m/s²). */
    public static final double MIN_GRAVITY = 0.5;
    /** Largest plausible gravity (m/s²). */
    public static final double MAX_GRAVITY = 100.0;

    /** Appended to every warning. */
    static final String SI = " (all values are read in SI units: m, kg, s)";

    private Plausibility() {
    }

    /**
     * @param doc a scenario document that parsed
     * @param radius the ball radius (m)
     * @param mass the ball mass (kg)
     * @param gravity gravity (m/s²)
     * @return the warnings, one line each, in key order
     */
    static List<String> warnings(JsonNode doc, double radius, double mass, Vector3D gravity) {
        List<String> out = new ArrayList<>();
        double density = mass / (4.0 / 3.0 * Math.PI * radius * radius * radius);
        if (density < MIN_DENSITY || density > MAX_DENSITY) {
            out.add(String.format(Locale.ROOT, "ball: mass %s kg and radius %s m give a mean density of %.3g kg/m^3,"
                + " outside what any ball is made of (%s to %s kg/m^3)%s", mass, radius, density, fmt(MIN_DENSITY),
                fmt(MAX_DENSITY), SI));
        }
        JsonNode contact = doc.path("contact");
        for (String k : List.of("static_friction", "kinetic_friction")) {
            double mu = contact.path(k).asDouble(0);
            if (mu > MAX_FRICTION) {
                out.add(String.format(Locale.ROOT, "contact.%s = %s is above %s, more than any dry pair gives (is it"
                    + " in percent?)%s", k, mu, fmt(MAX_FRICTION), SI));
            }
        }
        for (String k : List.of("rolling_resistance", "pivoting_resistance")) {
            double d = contact.path(k).asDouble(0);
            if (d > MAX_RESISTANCE_FRACTION * radius) {
                out.add(String.format(Locale.ROOT, "contact.%s = %s m is %.3g ball radii; resistance lengths are"
                    + " usually a few hundredths of the radius at most%s", k, d, d / radius, SI));
            }
        }
        double longest = longestSurfaceLength(doc.path("surface"));
        if (longest > MAX_SCALE_RATIO * radius) {
            out.add(String.format(Locale.ROOT, "surface: a length of %s m is %.3g times the ball radius %s m; are"
                + " the lengths in one unit?%s", longest, longest / radius, radius, SI));
        }
        double g = gravity.getNorm();
        if (g > 0 && (g < MIN_GRAVITY || g > MAX_GRAVITY)) {
            out.add(String.format(Locale.ROOT, "gravity: |g| = %s m/s^2 is outside %s to %s m/s^2 (Earth 9.81)%s", g,
                fmt(MIN_GRAVITY), fmt(MAX_GRAVITY), SI));
        }
        return out;
    }

    /** The largest radius-like length of a surface section (m); lengths along a tube are not compared. */
    private static double longestSurfaceLength(JsonNode s) {
        double longest = 0;
        for (String k : List.of("radius", "major_radius", "minor_radius")) {
            JsonNode n = s.path(k);
            if (n.isNumber()) {
                longest = Math.max(longest, Math.abs(n.doubleValue()));
            } else if (n.isArray()) {
                for (JsonNode e : n) {
                    longest = Math.max(longest, Math.abs(e.asDouble(0)));
                }
            }
        }
        for (JsonNode p : s.path("profile")) {
            longest = Math.max(longest, Math.abs(p.path(1).asDouble(0)));
        }
        return longest;
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.format(Locale.ROOT, "%,d", (long) v) : Double.toString(v);
    }
}
