package org.trundle.surfaces;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.TimeUnit;

import org.hipparchus.geometry.euclidean.threed.Rotation;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.Timeout.ThreadMode;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.trundle.contact.Coulomb;
import org.trundle.contact.PivotingResistance;
import org.trundle.contact.PureRolling;
import org.trundle.contact.RollingResistance;
import org.trundle.core.Ball;
import org.trundle.core.BallState;
import org.trundle.core.ContactLaw;
import org.trundle.core.EndReason;
import org.trundle.core.Phase;
import org.trundle.core.RunEvent;
import org.trundle.core.RunResult;
import org.trundle.core.Simulation;
import org.trundle.core.SimulationException;
import org.trundle.core.SolverSettings;

/**
 * Starts exactly on a patch edge. A contact point exactly on the edge is on the patch (the patch
 * is closed), so a ball starting there and moving out leaves at once, and one moving in goes on
 * (common practice for closed switching regions). The hostile cases come from the robustness
 * campaign (seed 0x0b57ac1e, indexes 9125, 22581, 22874, 38062, 39451, 40461–40476, 54414): a start
 * on a tube's or rod's edge with a rolling- or pivoting-resistance length of about 1e298 m made the
 * integrator's first step zero long, and the event search looped for ever without calling back;
 * they must now end, in well under the timeout, with a typed outcome.
 */
class EdgeStartTest {
    private static final double G = 9.81;
    private static final double R = 0.01;

    private static Simulation tube(ContactLaw law, Vector3D gravity) {
        Cylinder tube = new Cylinder(Vector3D.ZERO, Vector3D.PLUS_K, 1.5 * R, Side.INSIDE, -0.05, 0.05);
        return Simulation.builder().ball(Ball.solid(R, 0.002)).surface(tube).law(law).gravity(gravity).build();
    }

    /** On the top edge of a vertical tube, rolling upward: the exit is the start itself. */
    @Test
    void startOnTheEdgeMovingOutLeavesAtOnce() {
        Simulation sim = tube(new PureRolling(), new Vector3D(0, 0, -G));
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0.5 * R, 0, 0.05), new Vector3D(0, 0.3, 0.2)), 1.0);
        assertEquals(EndReason.EXIT, res.endReason());
        RunEvent exit = res.exit().orElseThrow();
        assertEquals("to", exit.edge());
        // located within the event time tolerance (1e-12 s) of the start
        assertEquals(0.0, exit.time(), 1e-12);
    }

    /**
     * On the top edge, rolling downward: the ball goes on into the tube and leaves through the
     * bottom; the axial motion of a ball rolling in a vertical tube with no slip is
     * {@code z(t) = z̄ + (z0 − z̄) cos λt + (w0/λ) sin λt} (Gualtieri, Tokieda et al., Am. J. Phys.
     * 74 (2006) 497), so it stays on the patch for as long as the formula keeps it above the bottom.
     */
    @Test
    void startOnTheEdgeMovingInGoesOn() {
        Simulation sim = tube(new PureRolling(), new Vector3D(0, 0, -G));
        RunResult res = sim.run(sim.rollingStart(new Vector3D(0.5 * R, 0, 0.05), new Vector3D(0, 0.3, -0.2)), 1.0);
        RunEvent first = res.events().get(0);
        assertTrue(first.time() > 0.01, "first event " + first);
    }

    /**
     * The campaign's hanging inputs, rebuilt exactly as the campaign draws them (directions,
     * origin and numbers copied from its draws): each must end with a result or a typed stop.
     */
    @ParameterizedTest(name = "case {0}")
    @CsvSource(delimiter = ';', value = {
        "9125; -0.6966809239594371,-0.5192023035516546,0.4950400571445511;"
            + " 0.9245421383253705,-0.2711237491701514,0.26779422528626784;"
            + " 0.015998834934302274,0.06947340882279089,-0.01705506621545774; 0.015015073420744561; tube; 1.5;"
            + " coulomb+rolling; 0.8431859980379356; 0.036398653788151686; 1.5015073420744562E298; 0.0; 1000.0;"
            + " sliding; to; 2.8221153635069114; 0.5749544426811728,0.805367036503458,0.14426130927875183",
        "22874; -0.6308522713742779,0.6217756806831013,0.46413404810785064;"
            + " -0.6307201452864519,-0.31202622430492255,-0.7105151185413658;"
            + " -0.03163804755185378,-0.02729225304156222,0.02774818116107134; 0.001988014910657822; rod; 0.01;"
            + " coulomb+rolling; 0.7714627058955492; 0.2294957269166006; 1.988014910657822E297; 4.9E-324; 0.0;"
            + " rolling; from; 4.492580164544532; 0.41374151934957987,-0.7604293315735766,0.5005648677732634",
        "40461; 0.94277791958209,-0.044014852486787145,0.33050338441388555;"
            + " 0.36118584744501847,-0.8803173333979217,-0.3075486565156741;"
            + " -0.037819601003113816,-0.06477829099140826,0.03981934491600639; 0.010285385826471264; tube; 1.001;"
            + " coulomb+rolling+pivoting; 0.4282153354012321; 0.23713725134535876; 1.0285385826471265E298; 4.9E-324;"
            + " -3.0; sliding; from; 2.3407673627931893; 0.17260808215458728,0.9656860227068277,0.19405400156550145",
        "54414; -0.714888389457038,0.5887280966758499,-0.3772715451819199;"
            + " -0.1268244423659592,-0.10152814432432665,0.9867155601938291;"
            + " 0.016392330645319086,-0.05349212664107128,-0.021323143022606895; 0.014985236056085403; tube;"
            + " 1.000000001; pivoting; 0.551655790586469; 0.16146425820822297; 1.4985236056085404E298; 2.0; 0.0;"
            + " sliding; from; 6.077166073115365; 0.03137987594083616,-0.4542639421965147,-0.8903143120303185",
        "38062; -0.8485709860248416,-0.5286732362041747,-0.020781987350418408;"
            + " -0.31835476409563146,0.7141051302784558,0.6234613918179734;"
            + " -0.04870044563812248,0.046093299647556665,0.033354807805151654; 0.0035838555602898227; tube; 1.5;"
            + " pivoting; 0.21343892108370927; 0.1759970945420722; 3.583855560289823E297; 0.5; 0.0; sliding; to;"
            + " 2.957699629105662; -0.4071370710031766,0.9019523560701469,-0.1439491326631224"})
    @Timeout(value = 60, unit = TimeUnit.SECONDS, threadMode = ThreadMode.SEPARATE_THREAD)
    void hugeCouplesOnTheEdgeEnd(int index, String gDir, String axisText, String originText, double r, String kind,
                                 double ratio, String law, double mu, double muK, double delta, double speed,
                                 double spinFactor, String start, String edge, double angle, String kickText) {
        Vector3D axis = vector(axisText);
        Vector3D origin = vector(originText);
        double halfLength = 0.05;
        Side side = kind.equals("tube") ? Side.INSIDE : Side.OUTSIDE;
        Cylinder surface = new Cylinder(origin, axis, ratio * r, side, -halfLength, halfLength);
        ContactLaw l;
        switch (law) {
            case "coulomb+rolling":
                l = new Coulomb(mu, muK, 0.0).and(new RollingResistance(delta));
                break;
            case "coulomb+rolling+pivoting":
                l = new Coulomb(mu, muK, 0.0).and(new RollingResistance(delta)).and(new PivotingResistance(delta));
                break;
            default:
                l = new PivotingResistance(delta);
                break;
        }
        Simulation sim = Simulation.builder().ball(Ball.of(r, 0.002, 0.4)).surface(surface).law(l)
            .gravity(vector(gDir).scalarMultiply(G))
            .settings(SolverSettings.defaults().withMaxEvaluations(100_000).withMaxEvents(2_000)).build();
        // the campaign's placement: on an edge of the cylinder, on the wall
        double m = Math.max(Math.abs(axis.getX()), Math.max(Math.abs(axis.getY()), Math.abs(axis.getZ())));
        Vector3D a = axis.scalarMultiply(1 / m).normalize();
        Vector3D er = a.orthogonal();
        double rho = side == Side.INSIDE ? ratio * r - r : ratio * r + r;
        Vector3D c = origin.add(edge.equals("to") ? halfLength : -halfLength, a).add(rho, er);
        Vector3D n = side == Side.INSIDE ? er.negate() : er;
        Vector3D t1 = n.orthogonal();
        Vector3D t2 = Vector3D.crossProduct(n, t1);
        Vector3D v = new Vector3D(speed * Math.cos(angle), t1, speed * Math.sin(angle), t2);
        double spin = spinFactor * speed / r;
        BallState s0 = start.equals("rolling") ? sim.rollingStart(c, v, spin)
            : BallState.of(0, c, v, Rotation.IDENTITY, vector(kickText).scalarMultiply(spin), Phase.SLIDING);
        try {
            RunResult res = sim.run(s0, 0.2);
            assertTrue(res.endReason() != null, "case " + index);
        } catch (SimulationException e) {
            assertTrue(e.getMessage() != null && !e.getMessage().isEmpty(), "case " + index);
        }
    }

    private static Vector3D vector(String text) {
        String[] p = text.trim().split(",");
        return new Vector3D(Double.parseDouble(p[0]), Double.parseDouble(p[1]), Double.parseDouble(p[2]));
    }
}
