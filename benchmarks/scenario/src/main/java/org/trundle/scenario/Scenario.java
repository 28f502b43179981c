package org.trundle.scenario;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import com.fasterxml.jackson.databind.JsonNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.contact.HertzStiffness;
import org.trundle.contact.WallLoads;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.Compliance;
import org.trundle.core.ContactLaw;
import org.trundle.core.Integrator;
import org.trundle.core.Material;
import org.trundle.core.Simulation;
import org.trundle.core.SolverSettings;
import org.trundle.core.StartPlacement;
import org.trundle.core.Patch;
import org.trundle.core.sweep.RunSpec;

/**
 * A parsed and checked scenario: everything needed for one run, built and validated (the ball fits
 * the surface, the start is consistent), plus the document it came from (sweeps vary it).
 *
 * <p>Top-level keys: {@code description} (free text), {@code ball}, {@code surface} (one patch, with
 * an optional {@code motion}) or {@code surfaces} (a scene: a list of patches, each with an
 * {@code id}, optional {@code motion} and {@code contact}; see {@link SceneFactory}),
 * {@code contact}, {@code gravity} (m/s², default {@code [0, 0, -9.81]}), {@code start},
 * {@code run}, {@code sweep} (read by {@link SweepSpec}).
 *
 * @param document the JSON document
 * @param description free text, may be empty
 * @param simulation the configured simulation
 * @param start the start state
 * @param duration simulated time (s)
 * @param warnings values that are legal but implausible ({@link Plausibility}), one line each
 * @param placement how {@code start.on_surface: true} moved the start centre, or null when it did
 *     not apply (the start state already holds the placed centre)
 */
public record Scenario(JsonNode document, String description, Simulation simulation, BallState start, double duration,
    List<String> warnings, StartPlacement placement) {
    /** Keys allowed at the top level. */
    static final List<String> TOP_KEYS = List.of("description", "ball", "surface", "surfaces", "contact", "gravity", "start", "run",
        "sweep", "solver");

    /** Default gravity (m/s²): standard gravity, downward along z. */
    static final Vector3D DEFAULT_GRAVITY = new Vector3D(0, 0, -9.81);

    /**
     * @param doc a parsed JSON document
     * @return the checked scenario
     * @throws ScenarioException naming the key and value of the first problem
     */
    public static Scenario parse(JsonNode doc) {
        try {
            return build(doc);
        } catch (IllegalArgumentException e) {
            // a value the checks here let through and the library refused: still bad input
            throw new ScenarioException("invalid scenario: " + e.getMessage());
        }
    }

    /** Shortest run duration (s): a thousand times the solver's event-time tolerance (1e-12 s). */
    public static final double MIN_DURATION = 1e-9;
    /** Smallest relative tolerance: about 50 times the double precision (2.2e-16). */
    public static final double MIN_TOLERANCE = 1e-14;

    private static Scenario build(JsonNode doc) {
        Section root = Section.root(doc);
        root.allow(TOP_KEYS.toArray(new String[0]));
        String description = root.text("description", "");
        Ball ball = ball(root.section("ball"));
        Optional<Material[]> materials = wallLoadMaterials(root);
        List<Patch> patches = SceneFactory.patches(root, materials);
        Section contactSection = root.section("contact");
        // patches that take the scenario's contact (before spin creep gives them laws of their own)
        java.util.Set<String> takeScenarioContact = new java.util.HashSet<>();
        patches.stream().filter(p -> p.law() == null).forEach(p -> takeScenarioContact.add(p.id()));
        if (root.has("surfaces") && contactSection.bool("spin_creep", false)) {
            // spin creep needs each wall's material: the scenario's contact becomes each patch's own law
            patches = spinCreepPerPatch(root, contactSection.without("compliant"), patches);
            materials = sceneMaterials(root).map(m -> new Material[] {m.getKey(), m.getValue().values().iterator().next()});
        }
        ContactLaw law = ContactFactory.create(contactSection.without("compliant"), materials);
        Compliance compliance = root.has("surfaces") ? null : compliance(root, contactSection, law);
        if (root.has("surfaces") && contactSection.bool("compliant", false)) {
            patches = compliantScene(root, law, patches, takeScenarioContact);
        }
        Vector3D gravity = root.vector("gravity", "m/s^2", DEFAULT_GRAVITY);
        StartSpec startSpec = StartSpec.parse(root.section("start"));
        Section run = root.section("run");
        run.allow("duration", "tolerance", "sample_interval", "stop_at_exit", "max_check_interval", "max_rows");
        if (run.has("max_rows")) {
            maxRows(run);
        }
        double duration = run.positive("duration", "s");
        if (duration < MIN_DURATION) {
            throw new ScenarioException("run.duration must be at least " + MIN_DURATION + " s (a thousand times the"
                + " event-time tolerance), got " + duration);
        }
        SolverSettings set = SolverSettings.defaults();
        if (run.has("tolerance")) {
            double tol = run.positive("tolerance", "");
            if (!(tol < 1e-2)) {
                throw new ScenarioException("run.tolerance must be below 1e-2, got " + tol);
            }
            if (tol < MIN_TOLERANCE) {
                throw new ScenarioException("run.tolerance must be at least " + MIN_TOLERANCE + " (finer than double"
                    + " precision allows), got " + tol);
            }
            set = set.withTolerance(tol);
        }
        set = set.withSampleInterval(run.nonNegative("sample_interval", "s", 0.0));
        set = set.withStopAtExit(run.bool("stop_at_exit", true));
        if (run.has("max_check_interval")) {
            set = set.withMaxCheckInterval(run.positive("max_check_interval", "s"));
        }
        if (root.has("solver")) {
            set = solver(root.section("solver"), set);
        }
        Simulation sim;
        try {
            Simulation.Builder b = Simulation.builder().ball(ball).law(law).gravity(gravity).settings(set)
                .compliance(compliance);
            if (root.has("surfaces") || patches.size() > 1) {
                patches.forEach(b::patch);
            } else {
                b.surface(patches.get(0).surface()).motion(patches.get(0).motion());
            }
            sim = b.build();
        } catch (IllegalArgumentException e) {
            String m = e.getMessage();
            throw new ScenarioException((m.contains("does not fit") ? "ball does not fit: " : "") + m);
        }
        StartPlacement placement = startSpec.placement(sim);
        BallState start = (placement == null ? startSpec : startSpec.at(placement.centre())).state(sim);
        List<String> warnings = Plausibility.warnings(doc, ball.radius(), ball.mass(), gravity);
        return new Scenario(doc, description, sim, start, duration, List.copyOf(warnings), placement);
    }

    /**
     * The integration method: {@code "solver": {"integrator": "symmetric", "step": 1e-3, "order": 4}} chooses
     * the symmetric projection method for long conservative runs ({@link Integrator#SYMMETRIC_PROJECTION})
     * with its fixed step (s) and order (2, 4 or 6); {@code "integrator": "dormand-prince"} is the default.
     */
    private static SolverSettings solver(Section s, SolverSettings set) {
        s.allow("integrator", "step", "order");
        String name = s.choice("integrator", List.of(Integrator.DORMAND_PRINCE.label(),
            Integrator.SYMMETRIC_PROJECTION.label()));
        SolverSettings out = set.withIntegrator(Integrator.ofLabel(name));
        if (s.has("step")) {
            out = out.withFixedStep(s.positive("step", "s"));
        }
        if (s.has("order")) {
            double order = s.number("order", "");
            if (order != 2 && order != 4 && order != 6) {
                throw new ScenarioException(s.where("order") + " must be 2, 4 or 6, got " + order);
            }
            out = out.withSymmetricOrder((int) order);
        }
        if (out.integrator() == Integrator.DORMAND_PRINCE && (s.has("step") || s.has("order"))) {
            throw new ScenarioException(s.where(s.has("step") ? "step" : "order") + " applies to the symmetric"
                + " integrator only; set " + s.where("integrator") + " to \"symmetric\" or leave it out");
        }
        return out;
    }

    private static Ball ball(Section s) {
        s.allow("radius", "mass", "inertia", "material");
        double r = s.positive("radius", "m");
        double m = s.positive("mass", "kg");
        double k = Ball.SOLID;
        if (s.has("inertia")) {
            JsonNode n = s.raw("inertia");
            if (n.isTextual()) {
                k = s.choice("inertia", List.of("solid", "hollow")).equals("solid") ? Ball.SOLID : Ball.THIN_SHELL;
            } else if (n.isNumber()) {
                k = s.number("inertia", "");
                if (!(k > 0 && k <= Ball.THIN_SHELL + 1e-15)) {
                    throw new ScenarioException("ball.inertia must be \"solid\", \"hollow\" or a factor k = I/(m r^2) in"
                        + " (0, 2/3], got " + k);
                }
            } else {
                throw new ScenarioException("ball.inertia must be \"solid\", \"hollow\" or a number k = I/(m r^2), got "
                    + Section.kind(n));
            }
        }
        return Ball.of(r, m, k);
    }

    /** The id of the scenario's one patch (its {@code surface} section) in wall loads. */
    public static final String PATCH_ID = "surface";

    /**
     * Reads {@code ball.material} and {@code surface.material}: both or neither.
     *
     * @return the two materials (ball, wall), or empty when neither is given
     */
    private static Optional<Material[]> wallLoadMaterials(Section root) {
        if (!root.has("surface")) {
            sceneMaterials(root);
            return Optional.empty();
        }
        Section ball = root.section("ball");
        Section surface = root.section("surface");
        if (!ball.has("material") && !surface.has("material")) {
            return Optional.empty();
        }
        if (!ball.has("material") || !surface.has("material")) {
            throw new ScenarioException("ball.material and surface.material go together (wall loads and"
                + " contact.spin_creep need both); "
                + (ball.has("material") ? "surface.material" : "ball.material") + " is missing");
        }
        return Optional.of(new Material[] {material(ball.section("material")), material(surface.section("material"))});
    }

    /**
     * {@code contact.compliant: true} with the one {@code surface} makes its contact a compliant Hertz contact with
     * Hunt–Crossley damping ({@link HertzStiffness#compliance}) from {@code ball.material}, {@code surface.material}
     * and {@code contact.restitution} (at least 0.1); the surface may move. (In a scene see {@code compliantScene}.)
     *
     * @return the compliance, or null for the rigid contact
     */
    private static Compliance compliance(Section root, Section contact, ContactLaw law) {
        if (!contact.bool("compliant", false)) {
            return null;
        }
        Material[] m = wallLoadMaterials(root).orElseThrow(() -> new ScenarioException(
            "contact.compliant needs ball.material and surface.material (the Hertz stiffness comes from them)"));
        return compliance("contact.compliant", m[0], m[1], law);
    }

    /**
     * {@code contact.compliant: true} in a scene: every patch that takes the scenario's {@code contact} (no
     * {@code contact} of its own) is compliant, from {@code ball.material} and its entry's {@code material}; a patch
     * with its own {@code contact} is compliant when that says so.
     */
    private static List<Patch> compliantScene(Section root, ContactLaw law, List<Patch> patches,
                                              java.util.Set<String> takeScenarioContact) {
        return withWallMaterials(root, "contact.compliant = true", patches, p -> takeScenarioContact.contains(p.id()),
            (p, m) -> p.withCompliance(compliance("contact.compliant", m[0], m[1], law)));
    }

    /**
     * A compliant Hertz contact with Hunt–Crossley damping from the two materials and the law's restitution.
     *
     * @param where the key, for messages
     * @param ball the ball's material
     * @param wall the wall's material
     * @param law the contact law (its restitution, at least {@link Compliance#MIN_RESTITUTION})
     * @return the compliance
     */
    static Compliance compliance(String where, Material ball, Material wall, ContactLaw law) {
        double e = law.restitution().orElse(0.0);
        if (!(e >= Compliance.MIN_RESTITUTION)) {
            String restitution = where.endsWith(".compliant")
                ? where.substring(0, where.length() - ".compliant".length()) + ".restitution" : "contact.restitution";
            throw new ScenarioException(where + " needs " + restitution + " of at least "
                + Compliance.MIN_RESTITUTION + " (Hunt-Crossley damping), got " + e);
        }
        return HertzStiffness.compliance(ball, wall, e);
    }

    /**
     * Reads {@code ball.material} and the {@code material} of the entries of a {@code surfaces} list: the
     * ball's goes with at least one wall's, and a wall's needs the ball's.
     *
     * @return the ball's material and the walls' by patch id, or empty when none is given
     */
    private static Optional<Map.Entry<Material, Map<String, Material>>> sceneMaterials(Section root) {
        Section ball = root.section("ball");
        Map<String, Material> walls = SceneFactory.wallMaterials(root);
        if (!ball.has("material") && walls.isEmpty()) {
            return Optional.empty();
        }
        if (!ball.has("material")) {
            throw new ScenarioException("surfaces[].material (given for " + walls.keySet() + ") needs ball.material"
                + " (wall loads and contact.spin_creep need both)");
        }
        if (walls.isEmpty()) {
            throw new ScenarioException("ball.material goes with the material of at least one patch"
                + " (surfaces[].material); none is given");
        }
        return Optional.of(Map.entry(material(ball.section("material")), walls));
    }

    /**
     * In a scene, the scenario's {@code contact} with {@code spin_creep: true} built for each patch that has no
     * {@code contact} of its own, with {@code ball.material} and that patch's {@code material} (refused, naming the
     * patch, where one is missing).
     */
    private static List<Patch> spinCreepPerPatch(Section root, Section contact, List<Patch> patches) {
        return withWallMaterials(root, "contact.spin_creep = true", patches, p -> p.law() == null,
            (p, m) -> p.withLaw(ContactFactory.create(contact, Optional.of(m))));
    }

    /**
     * Remakes the patches a scenario-wide key applies to from the ball's and the patch's material
     * ({@code {ball, wall}}); each such patch needs its entry's {@code material}.
     *
     * @param what the key and value, for the message
     * @param applies which patches the key applies to
     * @param make the patch remade from the pair of materials
     */
    private static List<Patch> withWallMaterials(Section root, String what, List<Patch> patches,
                                                 java.util.function.Predicate<Patch> applies,
                                                 java.util.function.BiFunction<Patch, Material[], Patch> make) {
        Map<String, Material> walls = sceneMaterials(root).map(Map.Entry::getValue).orElse(Map.of());
        Material ballMaterial = root.section("ball").has("material")
            ? material(root.section("ball").section("material")) : null;
        List<Patch> out = new java.util.ArrayList<>();
        for (Patch p : patches) {
            if (!applies.test(p)) {
                out.add(p);
                continue;
            }
            Material wall = walls.get(p.id());
            if (ballMaterial == null || wall == null) {
                throw new ScenarioException(what + " in a scene needs ball.material and the material"
                    + " of every patch without a contact of its own; patch \"" + p.id() + "\" has none");
            }
            out.add(make.apply(p, new Material[] {ballMaterial, wall}));
        }
        return out;
    }

    /** A material from {@code {"youngs_modulus": Pa, "poisson_ratio": ...}}. */
    static Material material(Section s) {
        s.allow("youngs_modulus", "poisson_ratio");
        double e = s.positive("youngs_modulus", "Pa");
        double nu = s.number("poisson_ratio", "");
        if (!(nu >= 0 && nu <= 0.5)) {
            throw new ScenarioException(s.where("poisson_ratio") + " must lie in [0, 0.5], got " + nu);
        }
        return Material.of(e, nu);
    }

    /**
     * The loads the walls see, when the scenario gives {@code ball.material} and {@code surface.material}
     * (each {@code {"youngs_modulus": Pa, "poisson_ratio": ν}}; the patch id is {@link #PATCH_ID}), or
     * {@code ball.material} and the {@code material} of entries of {@code surfaces} (one patch each, by id).
     *
     * @return a fresh calculator for one run, or empty without materials
     */
    public Optional<WallLoads> wallLoads() {
        Section root = Section.root(document);
        if (root.has("surfaces")) {
            return sceneMaterials(root).map(m -> WallLoads.forScene(simulation, m.getKey(), m.getValue()));
        }
        if (simulation.patches().size() > 1) {
            // a single surface of an assembly type: its parts share surface.material
            return wallLoadMaterials(root).map(m -> {
                Map<String, Material> walls = new java.util.LinkedHashMap<>();
                simulation.patches().forEach(p -> walls.put(p.id(), m[1]));
                return WallLoads.forScene(simulation, m[0], walls);
            });
        }
        return wallLoadMaterials(root).map(m -> new WallLoads(PATCH_ID, simulation.surface(),
            simulation.ball().radius(), m[0], m[1]));
    }

    /** Default cap on the rows of {@code trajectory.csv} (about 600 MB of text). */
    public static final long DEFAULT_MAX_ROWS = 2_000_000L;

    private static long maxRows(Section run) {
        double v = run.number("max_rows", "");
        JsonNode n = run.raw("max_rows");
        if (!n.canConvertToExactIntegral() || !(v >= 1) || v > 1e15) {
            throw new ScenarioException("run.max_rows must be a whole number from 1 to 1e15, got " + n.asText());
        }
        return (long) v;
    }

    /**
     * @return the most trajectory rows a run of this scenario may write: {@code run.max_rows}, by
     *     default {@link #DEFAULT_MAX_ROWS}
     */
    public long maxRows() {
        Section run = Section.root(document).section("run");
        return run.has("max_rows") ? maxRows(run) : DEFAULT_MAX_ROWS;
    }

    /** @return whether {@code start.on_surface: true} moved the start centre */
    public boolean placed() {
        return placement != null && placement.distance() > 0;
    }

    /** @return this scenario as a run of the core sweep API */
    public RunSpec runSpec() {
        return new RunSpec(simulation, start, duration);
    }
}
