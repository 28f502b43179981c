package org.trundle.core;

/** The switching conditions the engine watches, one detector each. */
enum Trigger {
    /** Normal force falls to zero (contact phases), N. */
    LIFT_OFF,
    /** Grip minus needed tangential force falls to zero (rolling), N. */
    SLIP,
    /** Slip speed falls to the stick threshold (sliding), m/s. */
    STICK,
    /** Patch margin falls to zero (contact phases), m. */
    EXIT,
    /** Speed |v| + r|ω| falls to the rest threshold (contact phases), m/s. */
    REST,
    /** {@code 1 − r κ₁} falls to zero: the ball no longer fits where it touches (contact phases). */
    FIT,
    /** Distance minus radius falls to zero, approaching, inside the patch (flight), m. */
    IMPACT
}
