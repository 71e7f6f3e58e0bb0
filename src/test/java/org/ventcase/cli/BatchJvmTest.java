package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** When the audit runs in a child JVM with the serial collector (BatchJvm's Javadoc says why). */
class BatchJvmTest {

    @Test
    void onlyTheAuditForksAndOnlyWithoutTheUsersOwnJvmChoices() {
        String[] audit = {"audit", "register.csv", "-o", "out.csv"};
        assertTrue(BatchJvm.wanted(audit, List.of(), null));
        assertTrue(BatchJvm.wanted(audit, List.of("-Dfoo=bar"), "1"));
        assertFalse(BatchJvm.wanted(new String[] {"calc", "case.json"}, List.of(), null));
        assertFalse(BatchJvm.wanted(new String[0], List.of(), null));
        assertFalse(BatchJvm.wanted(audit, List.of("-Xmx2g"), null), "the user's heap size");
        assertFalse(BatchJvm.wanted(audit, List.of("-XX:+UseZGC"), null), "the user's collector");
        assertFalse(BatchJvm.wanted(audit, List.of(), "0"), "VENTCASE_FORK=0");
        assertFalse(BatchJvm.wanted(new String[] {"audit", "--help"}, List.of(), null));
    }
}
