/**
 * Trundle core: the ball, its state, the {@link org.trundle.core.Surface} and
 * {@link org.trundle.core.ContactLaw} extension points, and the hybrid constrained-dynamics
 * solver ({@link org.trundle.core.Simulation}) that integrates rolling, sliding and flight
 * with exact event location.
 *
 * <p>All quantities are SI: metres, kilograms, seconds, newtons, radians. Vectors are in the
 * world frame unless stated otherwise.
 */
package org.trundle.core;
