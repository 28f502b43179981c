/**
 * Contact laws for the Trundle solver: pure rolling (unbounded grip) and Coulomb friction with
 * static and kinetic coefficients, rolling resistance, pivoting laws about the contact normal
 * (Coulomb, viscous, banded, spin creep), composable with {@link org.trundle.core.ContactLaw#and};
 * and the exact Hertz solution for a ball on a curved wall ({@link org.trundle.contact.HertzContact},
 * {@link org.trundle.contact.HertzPatch}) from the materials ({@link org.trundle.core.Material}).
 */
package org.trundle.contact;
