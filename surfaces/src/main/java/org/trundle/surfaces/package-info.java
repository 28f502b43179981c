/**
 * Contact surfaces for the Trundle solver. Closed-form analytic patches ({@link org.trundle.surfaces.Plane},
 * {@link org.trundle.surfaces.Cylinder}, {@link org.trundle.surfaces.Cone},
 * {@link org.trundle.surfaces.Sphere}, {@link org.trundle.surfaces.Torus}); spline surfaces
 * ({@link org.trundle.surfaces.SurfaceOfRevolution} from a profile,
 * {@link org.trundle.surfaces.SplineTube} about a centreline), whose closest point is found by a
 * Newton iteration seeded from the run's hint; custom shapes from one implicit function
 * ({@link org.trundle.surfaces.ImplicitSurface}, {@link org.trundle.surfaces.ImplicitFunction}) with
 * automatic differentiation; and {@link org.trundle.surfaces.Placed}, which puts any surface in the
 * world by a rigid transform. Every surface answers closest point, normal, signed distance,
 * distance Hessian, principal curvatures, patch margin and its largest concave curvature for the
 * fit check.
 */
package org.trundle.surfaces;
