/**
 * The solver's engine (internal, not part of the API): the run loop, the integrator adapter, the
 * state mapper, the contact set, contact kinematics, the right-hand side and one class per switch
 * rule. See the project's DEVELOPERS.md, "How the solver works".
 */
package org.trundle.core.engine;
