/**
 * Trundle's property-testing kit, framework-neutral: samplers, invariants, minimiser, robustness
 * probe ({@code org.trundle.core.check}).
 */
module org.trundle.kit {
    requires transitive org.trundle.core;

    exports org.trundle.core.check;
}
