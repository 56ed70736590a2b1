package dev.sigmawalk.engine.evidence;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class InputListSizeTest {
    /**
     * n = 50: 50 + 50·51/2 = 1 325 estimates for the full model and 3·50 + 2 = 152 for the single
     * index, a reduction of 1 - 152/1325 ≈ 88.5 % (common practice, no published source).
     */
    @Test
    void fiftyAssets_give1325And152() {
        InputListSize s = new InputListSize(50);
        assertEquals(1325, s.fullModel());
        assertEquals(152, s.singleIndex());
        assertEquals(0.885, s.reduction(), 0.0005);
        assertEquals(1.0 - 152.0 / 1325.0, s.reduction(), 1e-15);
    }

    /** Hand: n = 4 needs 4 + 10 = 14 either way; n = 2000 needs 2 003 000 against 6 002. */
    @Test
    void breakEvenAndLargeUniverse() {
        assertEquals(0.0, new InputListSize(4).reduction(), 0.0);
        assertEquals(2_003_000L, new InputListSize(2000).fullModel());
        assertEquals(6_002L, new InputListSize(2000).singleIndex());
    }

    @Test
    void noAssets_isRejected() {
        assertThrows(IllegalArgumentException.class, () -> new InputListSize(0));
    }
}
