package org.trundle.scenario;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.trundle.core.Compliance;
import org.trundle.core.ContactLaw;
import org.trundle.core.Material;
import org.trundle.core.Patch;
import org.trundle.core.Surface;
import org.trundle.core.SurfaceMotion;

/**
 * Builds a scenario's scene: the {@code surfaces} list of patches, or the single {@code surface}
 * (a one-patch scene with id {@code "surface"}). Each entry is a surface section
 * ({@link SurfaceFactory}) with, besides its type's keys, {@code id} (required in a list: letters,
 * digits, {@code _}, {@code -}, {@code .}), an optional {@code motion} and an optional {@code contact}
 * (the patch's own law, {@link ContactFactory}; default the scenario's {@code contact}); its
 * {@code contact.compliant: true} makes the patch a compliant Hertz contact from {@code ball.material} and the
 * entry's {@code material}.
 *
 * <p>A section whose {@code type} is an assembly ({@code v_groove}, {@code rails}, {@code bearing_races};
 * {@link AssemblyFactory}) gives several patches: for the single {@code surface} named by their parts
 * ({@code left}/{@code right}, {@code inner}/{@code outer}), in a {@code surfaces} list {@code <id>.<part>}; its
 * {@code contact}, {@code material} and {@code motion} apply to every part.
 *
 * <p>An entry of {@code surfaces} may give its wall's {@code material} ({@code {"youngs_modulus": Pa,
 * "poisson_ratio": ν}}): with {@code ball.material} the run reports that patch's wall loads, and the patch's
 * own {@code contact.spin_creep} uses the pair.
 *
 * <p>{@code motion}: {@code {"type": "rotation", "axis": [x, y, z], "origin": [x, y, z] (m), "rate": Ω
 * (rad/s)}} (turning about the axis through the origin, right-handed) or {@code {"type":
 * "translation", "velocity": [x, y, z] (m/s)}}; the surface's keys give it at time 0.
 */
final class SceneFactory {
    private SceneFactory() {
    }

    /**
     * @param root the scenario's root
     * @param materials the ball's and the wall's material ({@code ball.material}, {@code surface.material}),
     *     or empty (always empty for a {@code surfaces} list: a patch's {@code contact.spin_creep} is refused)
     * @return the patches, with their own laws where they give one (null: the scenario's)
     */
    static List<Patch> patches(Section root, Optional<Material[]> materials) {
        List<Patch> out = new ArrayList<>();
        if (root.has("surfaces")) {
            if (root.has("surface")) {
                throw new ScenarioException("give either surface (one patch) or surfaces (a list of patches), not both");
            }
            Set<String> ids = new HashSet<>();
            for (Section s : root.sectionList("surfaces")) {
                String id = s.text("id", null);
                if (id == null) {
                    throw new ScenarioException(s.where("id") + " is missing: every entry of surfaces needs an id");
                }
                if (!id.matches("[A-Za-z0-9_.-]{1,64}")) {
                    throw new ScenarioException(s.where("id") + " must be 1 to 64 letters, digits, '_', '-' or '.', got \""
                        + Texts.clip(id) + "\"");
                }
                for (String pid : ids(id, s)) {
                    if (!ids.add(pid)) {
                        throw new ScenarioException(s.where("id") + " = \"" + id + "\" gives the patch id \"" + pid
                            + "\" a second time; ids must be unique");
                    }
                }
                Optional<Material[]> own = s.has("material") && root.section("ball").has("material")
                    ? Optional.of(new Material[] {Scenario.material(root.section("ball").section("material")),
                        Scenario.material(s.section("material"))})
                    : Optional.empty();
                add(out, id, s.without("material"), own, root);
            }
            return out;
        }
        Section s = root.section("surface").without("material");
        if (s.has("contact")) {
            throw new ScenarioException(s.where("contact") + ": the one surface uses the scenario's contact section;"
                + " a contact per patch is for the entries of surfaces");
        }
        add(out, null, s, materials, root);
        return out;
    }

    /**
     * The patch ids a surface section gives: its own id (or {@link Scenario#PATCH_ID} for the single
     * {@code surface}), or for an assembly type ({@link AssemblyFactory}) one per part: the part's name, prefixed
     * by {@code id.} in a {@code surfaces} list.
     */
    private static List<String> ids(String id, Section s) {
        if (!AssemblyFactory.isAssembly(s)) {
            return List.of(id == null ? Scenario.PATCH_ID : id);
        }
        List<String> out = new ArrayList<>();
        for (String part : AssemblyFactory.partNames(s)) {
            String pid = id == null ? part : id + "." + part;
            if (pid.length() > 64) {
                throw new ScenarioException(s.where("id") + " = \"" + Texts.clip(id) + "\" is too long for the patch id \""
                    + Texts.clip(pid) + "\" of its part " + part + " (at most 64 characters)");
            }
            out.add(pid);
        }
        return out;
    }

    /** Adds the patch, or the patches of an assembly type, of one surface section. */
    private static void add(List<Patch> out, String id, Section s, Optional<Material[]> materials, Section root) {
        if (!AssemblyFactory.isAssembly(s)) {
            out.add(patch(id == null ? Scenario.PATCH_ID : id, s, materials));
            return;
        }
        ContactLaw law = s.has("contact") ? ContactFactory.create(s.section("contact").without("compliant"), materials)
            : null;
        Compliance compliance = s.has("contact") ? compliance(s, law, materials) : null;
        double ballRadius = root.section("ball").positive("radius", "m");
        List<String> pids = ids(id, s);
        List<AssemblyFactory.Part> parts = AssemblyFactory.expand(s.without("id").without("contact"), ballRadius);
        for (int i = 0; i < parts.size(); i++) {
            out.add(new Patch(pids.get(i), parts.get(i).surface(), parts.get(i).motion(), law, compliance));
        }
    }

    /**
     * The wall materials of a {@code surfaces} list, by patch id in list order (entries without a
     * {@code material} left out); empty for a single {@code surface}.
     *
     * @param root the scenario's root
     * @return the materials
     */
    static Map<String, Material> wallMaterials(Section root) {
        Map<String, Material> out = new LinkedHashMap<>();
        if (root.has("surfaces")) {
            for (Section s : root.sectionList("surfaces")) {
                if (s.has("material")) {
                    Material m = Scenario.material(s.section("material"));
                    for (String pid : ids(s.text("id", ""), s)) {
                        out.put(pid, m);
                    }
                }
            }
        }
        return out;
    }

    private static Patch patch(String id, Section s, Optional<Material[]> materials) {
        SurfaceMotion motion = s.has("motion") ? motion(s.section("motion")) : SurfaceMotion.NONE;
        ContactLaw law = s.has("contact") ? ContactFactory.create(s.section("contact").without("compliant"), materials)
            : null;
        Compliance compliance = s.has("contact") ? compliance(s, law, materials) : null;
        Surface surface = SurfaceFactory.create(s.without("id").without("motion").without("contact"));
        return new Patch(id, surface, motion, law, compliance);
    }

    /**
     * An entry's own {@code contact.compliant: true}: the patch (every part of an assembly) is a compliant Hertz
     * contact with Hunt–Crossley damping from {@code ball.material}, the entry's {@code material} and the entry's
     * {@code contact.restitution} (at least 0.1).
     *
     * @return the compliance, or null for a rigid patch
     */
    private static Compliance compliance(Section entry, ContactLaw law, Optional<Material[]> materials) {
        Section contact = entry.section("contact");
        if (!contact.bool("compliant", false)) {
            return null;
        }
        Material[] m = materials.orElseThrow(() -> new ScenarioException(contact.where("compliant")
            + " needs ball.material and this entry's material (the Hertz stiffness comes from them)"));
        return Scenario.compliance(contact.where("compliant"), m[0], m[1], law);
    }

    /**
     * @param s a {@code motion} section
     * @return the motion
     */
    static SurfaceMotion motion(Section s) {
        String type = s.choice("type", List.of("rotation", "translation"));
        try {
            if (type.equals("rotation")) {
                s.allow("type", "axis", "origin", "rate");
                return SurfaceMotion.rotation(s.direction("axis"), s.vector("origin", "m"), s.number("rate", "rad/s"));
            }
            s.allow("type", "velocity");
            return SurfaceMotion.translation(s.vector("velocity", "m/s"));
        } catch (IllegalArgumentException e) {
            throw new ScenarioException(s.path() + ": " + e.getMessage());
        }
    }
}
