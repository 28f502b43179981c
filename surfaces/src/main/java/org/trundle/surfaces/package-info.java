/**
 * Contact surfaces for the Trundle solver: closed-form analytic patches (plane, cylinder) that
 * answer closest point, normal, signed distance, distance Hessian, principal curvatures and patch
 * margin without allocation.
 */
package org.trundle.surfaces;
