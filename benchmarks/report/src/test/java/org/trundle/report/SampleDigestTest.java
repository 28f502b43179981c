package org.trundle.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The bounded reduction of samples: fixed size, exact envelopes, every sample kept when few. */
class SampleDigestTest {

    private static double[] row(long i, double v) {
        double[] r = SampleDigest.newRow();
        r[SampleDigest.Column.T.ordinal()] = i * 1e-3;
        r[SampleDigest.Column.SPEED.ordinal()] = v;
        r[SampleDigest.Column.HEIGHT.ordinal()] = -v;
        return r;
    }

    @Test
    void fewSamplesAreAllKept() {
        SampleDigest d = new SampleDigest(64);
        for (int i = 0; i < 64; i++) {
            d.add(row(i, i * 0.5));
        }
        assertEquals(64, d.size());
        assertEquals(1, d.stride());
        for (int i = 0; i < 64; i++) {
            assertEquals(i * 1e-3, d.get(i, SampleDigest.Column.T), 0.0);
            assertEquals(i * 0.5, d.low(i, SampleDigest.Column.SPEED), 0.0);
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {65, 1000, 123_457, 3_000_000})
    void manySamplesStayBoundedWithExactEnvelopes(int n) {
        SplittableRandom r = new SplittableRandom(n);
        SampleDigest d = new SampleDigest(64);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double v = r.nextGaussian();
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
            d.add(row(i, v));
        }
        assertTrue(d.size() <= 65 && d.size() >= 32, "kept " + d.size());
        assertEquals(n, d.count());
        assertEquals(0.0, d.get(0, SampleDigest.Column.T), 0.0, "the first sample is kept");
        assertEquals((n - 1) * 1e-3, d.get(d.size() - 1, SampleDigest.Column.T), 0.0, "the last sample is kept");
        double dlo = Double.POSITIVE_INFINITY;
        double dhi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < d.size(); i++) {
            assertTrue(d.low(i, SampleDigest.Column.SPEED) <= d.get(i, SampleDigest.Column.SPEED));
            assertTrue(d.high(i, SampleDigest.Column.SPEED) >= d.get(i, SampleDigest.Column.SPEED));
            assertEquals(-d.high(i, SampleDigest.Column.SPEED), d.low(i, SampleDigest.Column.HEIGHT), 0.0);
            if (i > 0) {
                assertTrue(d.get(i, SampleDigest.Column.T) > d.get(i - 1, SampleDigest.Column.T), "times increase");
            }
            dlo = Math.min(dlo, d.low(i, SampleDigest.Column.SPEED));
            dhi = Math.max(dhi, d.high(i, SampleDigest.Column.SPEED));
        }
        assertEquals(lo, dlo, 0.0, "the envelopes hold the least sample");
        assertEquals(hi, dhi, 0.0, "the envelopes hold the greatest sample");
        // buckets are whole powers of two of samples: representatives sit at multiples of the stride
        long stride = d.stride();
        assertEquals(0, Long.bitCount(stride) - 1);
        for (int i = 0; i + 1 < d.size(); i++) {
            assertEquals(i * stride * 1e-3, d.get(i, SampleDigest.Column.T), 1e-9);
        }
    }

    @Test
    void sameSamplesSameDigest() {
        SampleDigest a = new SampleDigest(128);
        SampleDigest b = new SampleDigest(128);
        SplittableRandom r = new SplittableRandom(7);
        for (int i = 0; i < 10_000; i++) {
            double[] x = row(i, r.nextDouble());
            a.add(x);
            b.add(x.clone());
        }
        for (SampleDigest.Column c : SampleDigest.Column.values()) {
            assertArrayEquals(a.column(c), b.column(c));
        }
    }
}
