package org.trundle.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.trundle.core.sweep.Sweep;
import org.trundle.core.sweep.SweepRun;
import org.trundle.core.sweep.ThreadedExecutor;

/** A sweep job survives serialization with the same rows; rows match the library's runs. */
class SweepJobTest {
    private static SweepJob job(String sweep) {
        ObjectNode doc = (ObjectNode) ScenarioFiles.parse(ScenarioFiles.demoText());
        ((ObjectNode) doc.get("run")).put("duration", 0.1);
        doc.set("sweep", ScenarioFiles.parse(sweep));
        return SweepJob.of(doc);
    }

    @Test
    void aDeserializedJobGivesTheSameRowsAsTheLibrarysRuns() throws Exception {
        SweepJob job = job("{\"start.speed\": {\"from\": 0.3, \"to\": 1.3}, \"random\": {\"samples\": 12, \"seed\": 5}}");
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream o = new ObjectOutputStream(bytes)) {
            o.writeObject(job);
        }
        SweepJob back;
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            back = (SweepJob) in.readObject();
        }
        List<SweepRow> rows = new ArrayList<>();
        new ThreadedExecutor(2, null, null).execute(back.space(), back, rows::add);
        // the same points run straight through the library's sweep
        List<SweepRun> runs = Sweep.over(job.space()).threads(1).runAll(p -> job.scenario(p.index()).runSpec());
        assertEquals(12, rows.size());
        for (int i = 0; i < rows.size(); i++) {
            assertEquals(SweepRow.of(runs.get(i)), rows.get(i));
            assertEquals(i, rows.get(i).index());
        }
    }

    @Test
    void anInvalidPointIsAFailedRowWithItsReason() {
        // a 4 mm ball in the demo's 15 mm bore fits; 16 mm does not
        SweepJob job = job("{\"ball.radius\": [0.004, 0.016]}");
        SweepRow ok = job.row(0);
        SweepRow bad = job.row(1);
        assertTrue(!ok.failed() && ok.endTime().isPresent(), ok.csv());
        assertTrue(bad.failed() && bad.endTime().isEmpty());
        assertEquals("failed", bad.outcome());
        assertTrue(bad.message().startsWith("ScenarioException: sweep point 1 (ball.radius = 0.016)"), bad.message());
        assertNull(bad.value(5)); // end_time absent
        assertTrue(bad.csv().startsWith("1,0.016,failed,failed,,,,,,,,,,,,,,0,\"ScenarioException"), bad.csv());
        assertEquals(SweepRow.columns(job.names()).size(), bad.width());
    }
}
