package org.trundle.core;

import org.trundle.core.engine.Model;

/** Gives tests of the internal engine package the model of a simulation. */
public final class ModelsForTests {
    private ModelsForTests() {
    }

    /**
     * @param sim a simulation
     * @return its model
     */
    public static Model model(Simulation sim) {
        return sim.model();
    }
}
