package org.trundle.bench.baseline;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * Hand-derived equations of motion of a ball rolling without slip on the inside wall of a
 * vertical circular tube, written for that one geometry and nothing else: no surface query, no
 * contact law, no phase machine, no event detector. It is the yardstick against which the general
 * library's cost is measured (what generality costs a user).
 *
 * <p><b>Geometry.</b> Tube axis {@code e_z} through the origin, tube radius {@code R}, ball
 * radius {@code r}, inertia factor {@code k = I/(m r²)}, gravity {@code −g e_z}. The centre
 * {@code c = (x, y, z)} stays at distance {@code ρ = R − r} from the axis. With
 * {@code ρ_c = sqrt(x² + y²)} the outward radial unit vector is {@code e_r = (x, y, 0)/ρ_c}, the
 * circumferential one {@code e_φ = (−y, x, 0)/ρ_c}; the contact point is {@code p = c + r e_r}.
 *
 * <p><b>Derivation</b> (Newton–Euler with the no-slip constraint, done by hand for this geometry).
 * Let {@code F} be the wall's force on the ball, applied at {@code p}.
 * <ol>
 *   <li>Newton: {@code m a = −m g e_z + F}. Euler about the centre:
 *       {@code I α = (p − c) × F = r e_r × F}.</li>
 *   <li>No slip: the contact point of the ball is at rest, {@code v + ω × (r e_r) = 0}, so
 *       {@code v = r e_r × ω}. Its components: {@code v_φ = −r ω_z}, {@code v_z = r ω_φ},
 *       {@code v_r = 0}.</li>
 *   <li>Differentiate, with {@code ė_r = Ω e_φ} and the orbital rate
 *       {@code Ω = v_φ/ρ = (x v_y − y v_x)/ρ_c²}:
 *       {@code a = r Ω e_φ × ω + r e_r × α}. From Euler,
 *       {@code r e_r × α = (r²/I) e_r × (e_r × F) = −F_t/(k m)}, with {@code F_t} the part of
 *       {@code F} normal to {@code e_r} (tangent to the wall). Since
 *       {@code e_φ × ω = ω_z e_r − ω_r e_z}:
 *       {@code a = r Ω ω_z e_r − r Ω ω_r e_z − F_t/(k m)}.</li>
 *   <li>Radial part: {@code a_r = r Ω ω_z = −ρ Ω²} (centripetal, because {@code r ω_z = −ρ Ω}), so
 *       the normal force is {@code F_r = −m ρ Ω²}: the wall pushes inward with {@code m ρ Ω²}.</li>
 *   <li>Tangential part: Newton gives {@code F_t = m (a_t + g e_z)}; substituting into step 3,
 *       {@code a_t (1 + 1/k) = −r Ω ω_r e_z − g e_z / k}, so {@code a_φ = 0} ({@code Ω} constant)
 *       and
 *       <pre>  z̈ = −(g + k r Ω ω_r)/(1 + k).</pre></li>
 *   <li>Then {@code F_t = (k m/(1+k)) (g − r Ω ω_r) e_z} and, with {@code e_r × e_z = −e_φ},
 *       <pre>  α = −(g − r Ω ω_r)/((1 + k) r) e_φ.</pre></li>
 *   <li>Orientation: {@code q̇ = ½ (0, ω) ⊗ q} (quaternion product, scalar first, body to world).</li>
 * </ol>
 * Checks of the derivation: {@code dω_r/dt = α·e_r + ω·ė_r = Ω ω_φ = Ω ż/r}, so
 * {@code ω_r − Ω z/r} is conserved, and then {@code z̈ = −k Ω²/(1+k) · z + const}: harmonic height
 * with angular frequency {@code Ω sqrt(k/(1+k))} about {@code z₀ − g/(kΩ²) − r ω_r(0)/Ω}, the
 * published result (M. Gualtieri, T. Tokieda et al., "Golfer's dilemma", Am. J. Phys. 74 (2006)
 * 497–501; J. E. Littlewood, A Mathematician's Miscellany, 1953).
 *
 * <p><b>The equations integrated</b>, Cartesian, state {@code (c, v, q, ω)} of dimension 13:
 * <pre>
 *   ċ = v
 *   v̇ = (−Ω² x, −Ω² y, −(g + k r Ω ω_r)/(1 + k))
 *   q̇ = ½ (0, ω) ⊗ q
 *   ω̇ = −(g − r Ω ω_r)/((1 + k) r) · e_φ
 * </pre>
 * with {@code Ω = (x v_y − y v_x)/(x² + y²)} and {@code ω_r = (x ω_x + y ω_y)/ρ_c}. The radial
 * acceleration is written {@code −Ω² (x, y)}, which equals {@code r Ω ω_z e_r} on the constraint.
 *
 * <p>{@link #integrate} uses Hipparchus' {@code DormandPrince853Integrator} with the same tolerance
 * scaling as the library (relative tolerance {@code tol} on every component; absolute tolerance
 * {@code tol} times the ball radius for positions, the speed scale for velocities, 1 for the
 * quaternion, speed scale / radius for spins; speed scale {@code max(|v₀|, r|ω₀|, √(g r), 1e-3)}
 * m/s, as documented in {@code org.trundle.core.SolverSettings}).
 *
 * <p>Not thread-safe (counts evaluations); one instance per thread.
 */
public final class VerticalTubeRolling implements OrdinaryDifferentialEquation {
    /** State dimension: centre 3, velocity 3, quaternion 4, spin 3. */
    public static final int DIM = 13;

    private final double r;
    private final double k;
    private final double g;
    private long evaluations;

    /**
     * @param ballRadius ball radius r (m)
     * @param inertiaFactor k = I/(m r²)
     * @param gravity magnitude g of the downward gravitational acceleration (m/s²)
     */
    public VerticalTubeRolling(double ballRadius, double inertiaFactor, double gravity) {
        if (!(ballRadius > 0) || !Double.isFinite(ballRadius)) {
            throw new IllegalArgumentException("ballRadius must be finite and positive, got " + ballRadius);
        }
        if (!(inertiaFactor > 0 && inertiaFactor <= 2.0 / 3.0 + 1e-15)) {
            throw new IllegalArgumentException("inertiaFactor must lie in (0, 2/3], got " + inertiaFactor);
        }
        if (!Double.isFinite(gravity)) {
            throw new IllegalArgumentException("gravity must be finite, got " + gravity);
        }
        this.r = ballRadius;
        this.k = inertiaFactor;
        this.g = gravity;
    }

    @Override
    public int getDimension() {
        return DIM;
    }

    /** @return ball radius r (m) */
    public double ballRadius() {
        return r;
    }

    /** @return right-hand-side evaluations since construction */
    public long evaluations() {
        return evaluations;
    }

    @Override
    public double[] computeDerivatives(double t, double[] y) {
        double[] yDot = new double[DIM];
        evaluate(y, yDot);
        return yDot;
    }

    /**
     * Evaluates the derivatives into {@code yDot} (allocation-free).
     *
     * @param y state (c, v, q, ω)
     * @param yDot output derivatives
     */
    public void evaluate(double[] y, double[] yDot) {
        evaluations++;
        double x = y[0];
        double yy = y[1];
        double vx = y[3];
        double vy = y[4];
        double wx = y[10];
        double wy = y[11];
        double wz = y[12];
        double rho2 = x * x + yy * yy;
        double rhoc = Math.sqrt(rho2);
        double omega = (x * vy - yy * vx) / rho2;
        double wr = (x * wx + yy * wy) / rhoc;
        double onePlusK = 1.0 + k;
        yDot[0] = vx;
        yDot[1] = vy;
        yDot[2] = y[5];
        double o2 = omega * omega;
        yDot[3] = -o2 * x;
        yDot[4] = -o2 * yy;
        yDot[5] = -(g + k * r * omega * wr) / onePlusK;
        double q0 = y[6];
        double q1 = y[7];
        double q2 = y[8];
        double q3 = y[9];
        yDot[6] = -0.5 * (wx * q1 + wy * q2 + wz * q3);
        yDot[7] = 0.5 * (q0 * wx + wy * q3 - wz * q2);
        yDot[8] = 0.5 * (q0 * wy + wz * q1 - wx * q3);
        yDot[9] = 0.5 * (q0 * wz + wx * q2 - wy * q1);
        double f = -(g - r * omega * wr) / (onePlusK * r * rhoc);
        yDot[10] = -f * yy;
        yDot[11] = f * x;
        yDot[12] = 0.0;
    }

    /**
     * Integrates from {@code y0} for {@code duration} seconds with Dormand–Prince 8(5,3).
     *
     * @param y0 start state (c, v, q, ω), not modified
     * @param duration simulated time (s), positive
     * @param tolerance relative tolerance (the library's {@code SolverSettings.tolerance()})
     * @param observer receives every accepted step's interpolator, or null
     * @return the end state (c, v, q, ω)
     */
    public double[] integrate(double[] y0, double duration, double tolerance, ODEStepHandler observer) {
        if (y0 == null || y0.length != DIM) {
            throw new IllegalArgumentException("y0 must have length " + DIM + ", got "
                + (y0 == null ? "null" : Integer.toString(y0.length)));
        }
        if (!(duration > 0) || !Double.isFinite(duration)) {
            throw new IllegalArgumentException("duration must be finite and positive, got " + duration);
        }
        if (!(tolerance > 0 && tolerance < 1e-2)) {
            throw new IllegalArgumentException("tolerance must lie in (0, 1e-2), got " + tolerance);
        }
        double speed = Math.sqrt(y0[3] * y0[3] + y0[4] * y0[4] + y0[5] * y0[5]);
        double spin = Math.sqrt(y0[10] * y0[10] + y0[11] * y0[11] + y0[12] * y0[12]);
        double speedScale = Math.max(Math.max(speed, r * spin), Math.max(Math.sqrt(Math.abs(g) * r), 1e-3));
        double[] absTol = new double[DIM];
        double[] relTol = new double[DIM];
        for (int i = 0; i < DIM; i++) {
            relTol[i] = tolerance;
            double s;
            if (i < 3) {
                s = r;
            } else if (i < 6) {
                s = speedScale;
            } else if (i < 10) {
                s = 1.0;
            } else {
                s = speedScale / r;
            }
            absTol[i] = tolerance * s;
        }
        DormandPrince853Integrator integ = new DormandPrince853Integrator(0.0, duration + 1e-300, absTol, relTol);
        if (observer != null) {
            integ.addStepHandler(observer);
        }
        ODEStateAndDerivative end = integ.integrate(this, new ODEState(0.0, y0.clone()), duration);
        return end.getPrimaryState();
    }

    /**
     * Convenience: a step handler that writes interpolated states at {@code t = i·interval}
     * ({@code i = 1, 2, …}) to a consumer, mirroring the library's fixed-interval samples.
     *
     * @param interval sample interval (s), positive
     * @param sink receives (t, state); the state array is a fresh copy
     * @return the step handler
     */
    public static ODEStepHandler sampler(double interval, java.util.function.ObjDoubleConsumer<double[]> sink) {
        if (!(interval > 0)) {
            throw new IllegalArgumentException("interval must be positive, got " + interval);
        }
        return new ODEStepHandler() {
            private long index;

            @Override
            public void handleStep(ODEStateInterpolator interpolator) {
                double tc = interpolator.getCurrentState().getTime();
                while (true) {
                    double ts = (index + 1) * interval;
                    if (ts > tc) {
                        break;
                    }
                    index++;
                    sink.accept(interpolator.getInterpolatedState(ts).getPrimaryState(), ts);
                }
            }
        };
    }
}
