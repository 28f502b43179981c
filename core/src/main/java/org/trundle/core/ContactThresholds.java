package org.trundle.core;

import org.trundle.core.internal.Checks;

/**
 * The thresholds of the contact's switching rules, each relative to the run's scales (ball radius
 * {@code r}, speed scale {@code V = max(|v₀|, r|ω₀|, √(|g| r), 1e-3 m/s)}). Part of
 * {@link SolverSettings}.
 *
 * <ul>
 *   <li>{@code stickSpeedFraction} (default 1e-8): the stick threshold {@code ε = fraction·V} of the
 *       sliding phase; sliding ends when {@code |s|} falls to {@code ε} and the remaining slip is
 *       removed by a sticking impulse booked as friction loss. The stick instant is early by
 *       {@code ε/|ds/dt|}, that is {@code ε/|s₀|} of the sliding time from an initial slip
 *       {@code s₀}; the threshold sits 100 times above the velocity tolerance so that the stick
 *       root is located on a smooth stretch of the slip, before its kink.</li>
 *   <li>{@code settleSpeed} (m/s, default 0, meaning {@code 0.01 √(|g| r)}, at least 1e-6 m/s): an
 *       impact whose rebound normal speed is at or below it hands the ball over to rolling or
 *       sliding (where that phase's normal force is positive), so that bouncing settles in finite
 *       time.</li>
 *   <li>{@code restSpeedFraction} (default 1e-5): a ball in contact whose speed {@code |v| + r|ω|}
 *       falls to {@code fraction·V} is tested for static equilibrium (grip and holding couples of
 *       the law); if it holds, the run ends with {@link EndReason#REST}.</li>
 *   <li>{@code smoothingSpinFraction} (default 1e-3): the smoothing spin
 *       {@link ContactContext#smoothingSpin()} {@code = fraction·V/r} of set-valued couples that
 *       may stick while the ball keeps moving (pivoting resistance).</li>
 *   <li>{@code contactTolerance} (default 1e-6): largest gap or penetration of a contact start, as
 *       a fraction of the ball radius, and largest normal or slip speed of a rolling start, as a
 *       fraction of {@code V}.</li>
 * </ul>
 *
 * @param stickSpeedFraction stick threshold as a fraction of the speed scale, positive
 * @param settleSpeed settle speed (m/s), not negative; 0 for the automatic value
 * @param restSpeedFraction rest speed threshold as a fraction of the speed scale, positive
 * @param smoothingSpinFraction couple smoothing spin as a fraction of the speed scale over the
 *     radius, positive
 * @param contactTolerance contact start tolerance as a fraction of the ball radius (lengths) or of
 *     the speed scale (speeds), positive
 */
public record ContactThresholds(double stickSpeedFraction, double settleSpeed, double restSpeedFraction,
        double smoothingSpinFraction, double contactTolerance) {
    /** Checks every value; the message names the parameter and the value. */
    public ContactThresholds {
        Checks.positive("stickSpeedFraction", stickSpeedFraction);
        Checks.nonNegative("settleSpeed", settleSpeed);
        Checks.positive("restSpeedFraction", restSpeedFraction);
        Checks.positive("smoothingSpinFraction", smoothingSpinFraction);
        Checks.positive("contactTolerance", contactTolerance);
    }

    /** @return the defaults listed above */
    public static ContactThresholds defaults() {
        return new ContactThresholds(1e-8, 0.0, 1e-5, 1e-3, 1e-6);
    }
}
