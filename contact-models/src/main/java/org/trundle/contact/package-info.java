/**
 * Contact laws for the Trundle solver: pure rolling (unbounded grip) and Coulomb friction with
 * static and kinetic coefficients, composable with {@link org.trundle.core.ContactLaw#and}.
 */
package org.trundle.contact;
