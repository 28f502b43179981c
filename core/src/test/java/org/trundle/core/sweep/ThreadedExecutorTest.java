package org.trundle.core.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The executor seam with a plain row task (no simulation): order, failure count, errors. */
class ThreadedExecutorTest {

    /** Row: index and a value computed from the point; "failed" for odd multiples of 7. */
    record Row(int index, double value, boolean failed) {
    }

    private static final PointTask<Row> TASK = new PointTask<>() {
        @Override
        public Row run(ParameterPoint p, BooleanSupplier abandoned) {
            double x = p.value(0);
            double acc = 0;
            for (int k = 1; k <= 200 + p.index() % 13; k++) { // uneven work, so threads finish out of order
                acc += Math.sin(x * k) / k;
            }
            return new Row(p.index(), acc, p.index() % 14 == 7);
        }

        @Override
        public boolean failed(Row row) {
            return row.failed();
        }
    };

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 5})
    void rowsArriveInIndexOrderAndEqualTheSingleThreadRows(int threads) {
        Grid g = Grid.of(Axis.linear("x", 0, 3, 301));
        List<Row> one = new ArrayList<>();
        new ThreadedExecutor(1, null, null).execute(g, TASK, one::add);
        List<Row> many = new ArrayList<>();
        SweepSummary s = new ThreadedExecutor(threads, null, null).execute(g, TASK, many::add);
        assertEquals(one, many);
        for (int i = 0; i < many.size(); i++) {
            assertEquals(i, many.get(i).index());
        }
        assertEquals(new SweepSummary(301, 301, 21, false), s); // 7, 21, …, 287: 21 odd multiples of 7
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 3})
    void aTaskExceptionStopsTheSweepAndIsRethrown(int threads) {
        Grid g = Grid.of(Axis.linear("x", 0, 1, 50));
        PointTask<Row> bad = (p, a) -> {
            if (p.index() == 20) {
                throw new IllegalStateException("broken task at 20");
            }
            return new Row(p.index(), 0, false);
        };
        List<Row> got = new ArrayList<>();
        IllegalStateException e = assertThrows(IllegalStateException.class,
            () -> new ThreadedExecutor(threads, null, null).execute(g, bad, got::add));
        assertEquals("broken task at 20", e.getMessage());
        assertTrue(got.size() <= 20);
        PointTask<Row> none = (p, a) -> null;
        assertThrows(IllegalStateException.class, () -> new ThreadedExecutor(threads, null, null).execute(g, none, r -> { }));
    }
}
