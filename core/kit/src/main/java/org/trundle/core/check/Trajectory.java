package org.trundle.core.check;

import java.util.ArrayList;
import java.util.List;

import org.trundle.core.BallState;
import org.trundle.core.RunObserver;
import org.trundle.core.RunResult;
import org.trundle.core.Sample;
import org.trundle.core.Simulation;

/** A run with its samples kept (the checks' durations are bounded, so this is small). */
final class Trajectory implements RunObserver {
    final List<Sample> samples = new ArrayList<>();
    RunResult result;

    @Override
    public void sample(Sample s) {
        samples.add(s);
    }

    static Trajectory run(Simulation sim, BallState start, double duration) {
        Trajectory t = new Trajectory();
        t.result = sim.run(start, duration, t);
        return t;
    }

    /** Samples not written at an event instant (regular output times). */
    List<Sample> regular() {
        List<Sample> out = new ArrayList<>();
        for (Sample s : samples) {
            if (!s.event()) {
                out.add(s);
            }
        }
        return out;
    }
}
