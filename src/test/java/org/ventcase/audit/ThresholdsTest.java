package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.inventory.StorageMode;

/** User-set thresholds per substance against site and area totals. */
class ThresholdsTest {

    private static VesselAudit vessel(int row, String area, double propaneKg) {
        VesselAudit.Contents c = new VesselAudit.Contents(StorageMode.SATURATED, 300, 1e6, 10, 8, 2, 80, 20, 20,
                propaneKg, 0, propaneKg, Map.of("propane", propaneKg));
        return new VesselAudit(row, "t.csv", "V-" + row, area, "propane", VesselAudit.Status.OK, Optional.empty(),
                Optional.of(c), Optional.empty(), List.of(), List.of());
    }

    @Test
    void siteAndAreaTotalsAreComparedWithTheUsersThreshold() {
        Thresholds th = Thresholds.parse("substance,threshold [t],label\nC3H8,1,invented for the test\n", "th.csv");
        assertEquals("propane", th.entries().get(0).component().name(), "found by formula");
        assertEquals(1000.0, th.entries().get(0).thresholdKg(), 0.0);
        AuditResult r = AuditResult.of(List.of(vessel(2, "A", 600), vessel(3, "A", 500), vessel(4, "B", 300)), th);
        AuditResult.ThresholdCheck c = r.thresholds().get(0);
        // Hand calculation: site 600 + 500 + 300 = 1400 kg > 1000 kg; area A 1100 kg > 1000 kg; B 300 kg below
        assertEquals(1400.0, c.siteKg(), 0.0);
        assertTrue(c.siteExceeds());
        assertEquals(Map.of("A", 1100.0), c.areasExceeding());
        assertEquals(1.4, c.siteRatio(), 1e-15);
    }

    @Test
    void aTotalEqualToTheThresholdDoesNotExceedIt() {
        Thresholds th = Thresholds.parse("substance,threshold,label\npropane,1400 kg,x\n", "th.csv");
        AuditResult r = AuditResult.of(List.of(vessel(2, "A", 600), vessel(3, "A", 500), vessel(4, "B", 300)), th);
        // Hand calculation: 1400 kg is not greater than 1400 kg
        assertFalse(r.thresholds().get(0).siteExceeds());
    }

    @Test
    void aWrongEntryRefusesTheFileWithItsLine() {
        InvalidInputException u = assertThrows(InvalidInputException.class,
                () -> Thresholds.parse("substance,threshold,label\npropane,5 t,x\nunobtainium,5 t,y\n", "th.csv"));
        assertTrue(u.getMessage().contains("th.csv line 3"), u.getMessage());
        InvalidInputException b = assertThrows(InvalidInputException.class,
                () -> Thresholds.parse("substance,threshold,label\npropane,5,x\n", "th.csv"));
        assertTrue(b.getMessage().contains("bare number"), b.getMessage());
        InvalidInputException d = assertThrows(InvalidInputException.class,
                () -> Thresholds.parse("substance,threshold [t],label\npropane,5,x\nC3H8,6,y\n", "th.csv"));
        assertTrue(d.getMessage().contains("already has a threshold"), d.getMessage());
    }
}
