/**
 * Trundle's surfaces: plane, cylinder, cone, sphere, torus, splines, implicit surfaces, placement,
 * bounds and assembly helpers ({@code org.trundle.surfaces}).
 */
module org.trundle.surfaces {
    requires transitive org.trundle.core;

    exports org.trundle.surfaces;
}
