package org.linemass.engine.parallel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Jobs on several threads give what a plain loop gives (expected values: the loop; common practice, no source). */
class IndexedWorkTest {

    @Test
    void map_manyJobs_resultsInJobOrderOnAnyThreadCount() throws Exception {
        int n = 10_007;
        List<Long> loop = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            loop.add((long) i * i % 977);
        }
        for (int threads : new int[] {1, 2, 3, 8}) {
            List<Long> got = IndexedWork.map(threads, n, i -> (long) i * i % 977);
            assertEquals(loop, got, "threads " + threads);
        }
    }

    @Test
    void map_noJobs_isEmpty() throws Exception {
        assertEquals(List.of(), IndexedWork.map(4, 0, i -> i));
    }

    @Test
    void map_severalFailures_throwsTheLowestJobsFailure() {
        // jobs 5000 and 7000 fail; a loop stops at 5000 first
        for (int threads : new int[] {1, 4}) {
            IOException e = assertThrows(IOException.class, () -> IndexedWork.map(threads, 10_000, i -> {
                if (i == 5000 || i == 7000) {
                    throw new IOException("job " + i);
                }
                return i;
            }));
            assertEquals("job 5000", e.getMessage(), "threads " + threads);
        }
    }

    @Test
    void map_uncheckedFailure_isThrownAsItWas() {
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> IndexedWork.map(4, 1000, i -> {
            if (i == 999) {
                throw new IllegalStateException("last");
            }
            return i;
        }));
        assertEquals("last", e.getMessage());
    }

    @Test
    void map_badArguments_rejected() {
        assertThrows(IllegalArgumentException.class, () -> IndexedWork.map(0, 10, i -> i));
        assertThrows(IllegalArgumentException.class, () -> IndexedWork.map(2, -1, i -> i));
    }
}
