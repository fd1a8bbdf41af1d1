package org.nebulith.progress;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;

/** Steps counted before the display exists reach it on attachment, and later ones as they come. */
class DeferredProgressTest {

    @Test
    void stepsBeforeAndAfterAttachmentAllArrive() {
        AtomicLong seen = new AtomicLong();
        Progress display = new Progress() {
            @Override
            public void advance(final long steps) {
                seen.addAndGet(steps);
            }

            @Override
            public void close() {
            }
        };
        DeferredProgress p = new DeferredProgress();
        p.step();
        p.advance(4);
        assertEquals(0, seen.get());
        p.attach(display);
        assertEquals(5, seen.get());
        p.step();
        assertEquals(6, seen.get());
    }
}
