/**
 * Trundle's solver: a rigid sphere rolling, slipping, flying and leaving curved rigid surfaces.
 * Exports the API ({@code org.trundle.core}: ball, state, surfaces and contact laws as interfaces,
 * {@code Simulation}, results; {@code org.trundle.core.sweep}: parameter sweeps); the engine
 * ({@code org.trundle.core.engine}) stays inside. Hipparchus' geometry and core appear in the API
 * (vectors, rotations, field elements) and are passed on to users of this module.
 */
@SuppressWarnings({"requires-automatic", "requires-transitive-automatic"})
module org.trundle.core {
    requires transitive hipparchus.core;
    requires transitive hipparchus.geometry;
    requires hipparchus.ode;
    requires ejml.core;
    requires ejml.ddense;

    exports org.trundle.core;
    exports org.trundle.core.sweep;
    // argument checks shared with the sibling library modules; not an API
    exports org.trundle.core.internal to org.trundle.surfaces, org.trundle.contact, org.trundle.kit;
}
