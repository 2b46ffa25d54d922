package org.twinorbit.harness.progress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

/** The time left comes from the work computed in this process only (an injected clock). */
class TimeLeftTest {

    private static final long SECOND = 1_000_000_000L;

    @Test
    void resumedWorkShortensWhatIsLeftButNotTheRate() {
        AtomicLong now = new AtomicLong(7 * SECOND);
        TimeLeft t = new TimeLeft(now::get);
        t.start(100, 80);
        assertTrue(t.remaining().isEmpty(), "no rate before the first point of this run");
        now.addAndGet(10 * SECOND);
        t.done(5);
        // 5 points in 10 s: 2 s a point, 15 points left (100 - 80 resumed - 5 done)
        assertEquals(Duration.ofSeconds(30), t.remaining().orElseThrow());
    }

    @Test
    void workResumedAfterTheStartIsNotCountedAsComputed() {
        AtomicLong now = new AtomicLong();
        TimeLeft t = new TimeLeft(now::get);
        t.start(200, 0);
        now.addAndGet(20 * SECOND);
        t.done(10);
        t.resumed(100); // a later scan of a safe-use map finds its points on disk
        // 2 s a point, 90 points left
        assertEquals(Duration.ofSeconds(180), t.remaining().orElseThrow());
        assertEquals(Duration.ofSeconds(20), t.elapsed());
    }
}
