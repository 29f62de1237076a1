package dev.noninertial.bench;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The CI gate, run by {@code mvn -B verify}: bulk paths allocate nothing per state
 * (deterministic, per-thread allocation counter) and no hot path is grossly slower (more than
 * 3x) than hand-written primitive code (median of alternating rounds). Set
 * {@code -Dbench.gate.rounds=N} for more rounds; the standalone form is
 * {@link HotPathGate#main(String[])}.
 */
class HotPathGateTest {

    @Test
    void bulkPathsAllocateNothingPerState() {
        List<HotPathGate.Allocation> rows = HotPathGate.allocations();
        String table = HotPathGate.format(rows);
        System.out.print(table);
        for (HotPathGate.Allocation row : rows) {
            assertTrue(row.passed(), "allocation regression in " + row.path() + "\n" + table);
        }
        // the control row allocates a known array that escapes: if the counter does not see its
        // 8 bytes per element, it is not counting and the gated rows prove nothing
        HotPathGate.Allocation control = rows.get(rows.size() - 1);
        assertTrue(control.bytesPerState() >= 8, "allocation counter seems inactive\n" + table);
    }

    @Test
    void hotPathsAreNotGrosslySlowerThanHandWrittenCode() {
        int rounds = Integer.getInteger("bench.gate.rounds", 7);
        List<HotPathGate.Speed> rows = HotPathGate.speeds(rounds);
        String table = HotPathGate.formatSpeeds(rows);
        System.out.print(table);
        for (HotPathGate.Speed row : rows) {
            assertTrue(row.passed(), "speed regression (over " + HotPathGate.GROSS_REGRESSION + "x) in "
                    + row.path() + "\n" + table);
        }
    }
}
