package org.trundle.runner;

import java.util.List;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.trundle.core.BallState;
import org.trundle.core.EndReason;
import org.trundle.core.EnergyBudget;
import org.trundle.core.PhaseSpan;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.scenario.ScenarioFiles;

/**
 * The {@code summary.json} of a run. Keys: {@code description}; {@code end_reason} (one of
 * {@code duration}, {@code exit}, {@code rest}, {@code budget}, {@code failed}) with
 * {@code end_message} (why a failed or budget run stopped, else empty); {@code end_time} (s);
 * {@code end_state} ({@code position} m, {@code velocity} m/s, {@code spin} rad/s, {@code phase});
 * {@code events} (each {@code time}, {@code kind} — {@code exit}, {@code slip}, {@code stick},
 * {@code lift_off}, {@code impact}, {@code rest}, {@code handover}, {@code pivot_stick}, {@code pivot_release} —,
 * {@code position}, {@code velocity},
 * {@code spin} at the instant, {@code phase_after}, {@code impulse} N·s, for an exit the
 * {@code edge} crossed, {@code patch} (the id of the patch it happened on) and for a hand-over
 * {@code from} and {@code to}); {@code energy} (J: {@code initial}, {@code final}, {@code friction_loss},
 * {@code rolling_resistance_loss}, {@code pivoting_resistance_loss}, {@code impact_loss},
 * {@code other_loss}, {@code applied_work}, {@code drive_work} (work done by moving surfaces), {@code residual}, {@code relative_residual});
 * {@code max_distance_error} (m), {@code max_normal_force} (N);
 * {@code phases} (each {@code phase}, {@code start}, {@code end}, {@code duration} s and
 * {@code centre_path} m, the path length of the centre in that phase); {@code evaluations},
 * {@code steps}.
 */
final class SummaryJson {
    private SummaryJson() {
    }

    /**
     * The runner's name of an end reason: the library's, with geometry stops reported as
     * {@code failed}.
     *
     * @param r the reason
     * @return its label
     */
    static String endReason(EndReason r) {
        return r == EndReason.GEOMETRY ? "failed" : r.label();
    }

    /**
     * @param description scenario description
     * @param r the result
     * @return the summary
     */
    static ObjectNode of(String description, RunResult r) {
        ObjectNode o = ScenarioFiles.JSON.createObjectNode();
        o.put("description", description);
        o.put("end_reason", endReason(r.endReason()));
        o.put("end_message", r.message());
        o.put("end_time", r.endState().time());
        o.set("end_state", state(r.endState()));
        o.set("events", events(r.events()));
        EnergyBudget e = r.energy();
        ObjectNode en = o.putObject("energy");
        en.put("initial", e.initial());
        en.put("final", e.fin());
        en.put("friction_loss", e.slidingFrictionLoss());
        en.put("rolling_resistance_loss", e.rollingResistanceLoss());
        en.put("pivoting_resistance_loss", e.pivotingResistanceLoss());
        en.put("impact_loss", e.impactLoss());
        en.put("other_loss", e.otherCoupleLoss());
        en.put("contact_damping_loss", e.contactDampingLoss());
        en.put("applied_work", e.appliedWork());
        en.put("drive_work", e.driveWork());
        en.put("residual", e.residual());
        en.put("relative_residual", e.relativeResidual());
        o.put("max_distance_error", r.maxDistanceError());
        o.put("max_normal_force", r.maxNormalForce());
        ArrayNode ph = o.putArray("phases");
        for (PhaseSpan p : r.phases()) {
            ObjectNode s = ph.addObject();
            s.put("phase", p.phase().label());
            s.put("start", p.start());
            s.put("end", p.end());
            s.put("duration", p.duration());
            s.put("centre_path", p.centrePath());
        }
        o.put("evaluations", r.evaluations());
        o.put("steps", r.steps());
        return o;
    }

    /**
     * The summary of a run the library stopped with an exception: the last good state as end
     * state, the events logged until then, no energy account.
     *
     * @param description scenario description
     * @param message why it failed
     * @param lastGood last good state
     * @param events events logged before the failure
     * @return the summary
     */
    static ObjectNode failed(String description, String message, BallState lastGood, List<RunEvent> events) {
        ObjectNode o = ScenarioFiles.JSON.createObjectNode();
        o.put("description", description);
        o.put("end_reason", "failed");
        o.put("end_message", message);
        o.put("end_time", lastGood.time());
        o.set("end_state", state(lastGood));
        o.set("events", events(events));
        o.putNull("energy");
        o.putNull("max_distance_error");
        o.putNull("max_normal_force");
        o.putArray("phases");
        return o;
    }

    static ArrayNode events(List<RunEvent> events) {
        ArrayNode a = ScenarioFiles.JSON.createArrayNode();
        for (RunEvent e : events) {
            ObjectNode n = a.addObject();
            n.put("time", e.time());
            n.put("kind", e.kind().label());
            n.set("position", vec(e.before().centre()));
            n.set("velocity", vec(e.before().velocity()));
            n.set("spin", vec(e.before().spin()));
            n.put("phase_after", e.phaseAfter().label());
            n.set("impulse", vec(e.impulse()));
            if (e.edge() != null) {
                n.put("edge", e.edge());
            }
            if (e.patch() != null) {
                n.put("patch", e.patch());
            }
            if (e.from() != null) {
                n.put("from", e.from());
                n.put("to", e.to());
            }
        }
        return a;
    }

    static ObjectNode state(BallState s) {
        ObjectNode n = ScenarioFiles.JSON.createObjectNode();
        n.set("position", vec(s.centre()));
        n.set("velocity", vec(s.velocity()));
        n.set("spin", vec(s.spin()));
        n.put("phase", s.phase().label());
        return n;
    }

    static ArrayNode vec(Vector3D v) {
        ArrayNode a = ScenarioFiles.JSON.createArrayNode();
        a.add(v.getX());
        a.add(v.getY());
        a.add(v.getZ());
        return a;
    }
}
