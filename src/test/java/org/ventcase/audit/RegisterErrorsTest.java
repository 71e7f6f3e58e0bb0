package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

/** Malformed rows are reported with row, field and reason, and never stop the others. */
class RegisterErrorsTest {

    private static final String GOOD = "V-1,Area 1,propane,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,,17.2,,,";

    private static AuditResult audit(String... rows) {
        return Audit.run(RegisterCases.items(Register.parse(AuditFixtures.HEADER + "\n" + String.join("\n", rows)
                + "\n", "t.csv")), Thresholds.none(), 2, Audit.Progress.NONE);
    }

    private static AuditError errorOf(VesselAudit v) {
        assertEquals(VesselAudit.Status.ERROR, v.status(), v.tag());
        return v.error().orElseThrow();
    }

    @Test
    void eachMalformedRowHasItsOwnMessageAndTheOthersAreComputed() {
        AuditResult r = audit(GOOD,
                // missing column: the row ends after the temperature
                "V-2,Area 1,propane,,horizontal,2:1,3.0,12,1.0,70,25",
                // bad unit: a set pressure that does not say gauge or absolute
                "V-3,Area 1,propane,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,,17.2 bar,,,",
                // unknown fluid
                "V-4,Area 1,propain,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,,17.2,,,",
                // level above the top (3.0 m inside height for a horizontal 3.0 m vessel)
                "V-5,Area 1,propane,,horizontal,2:1,3.0,12,1.0,4.5 m,25,,saturated,,17.2,,,",
                // a bare number in a column without a header unit
                "V-6,Area 1,n-hexane,,vertical,2:1,2.0,5.0,1.0,60,25,1.2,specified,nitrogen,3.5,,,",
                GOOD.replace("V-1", "V-7"));
        assertEquals(7, r.rows().size());
        assertEquals(VesselAudit.Status.OK, r.rows().get(0).status());
        assertEquals(VesselAudit.Status.OK, r.rows().get(6).status(), "a row after the bad ones is still computed");

        AuditError missing = errorOf(r.rows().get(1));
        assertEquals("pressure", missing.field(), "the first column the short row does not reach");
        assertTrue(missing.reason().contains("11 fields, the header 18"), missing.reason());

        AuditError unit = errorOf(r.rows().get(2));
        assertEquals("set pressure", unit.field());
        assertEquals("17.2 bar", unit.value());
        assertTrue(unit.reason().contains("gauge or absolute"), unit.reason());

        AuditError fluid = errorOf(r.rows().get(3));
        assertEquals("fluid", fluid.field());
        assertTrue(fluid.reason().contains("unknown component") && fluid.reason().contains("propane"),
                fluid.reason());

        AuditError level = errorOf(r.rows().get(4));
        assertEquals("level", level.field());
        assertTrue(level.reason().contains("above the top of the vessel") && level.reason().contains("3.000 m"),
                level.reason());

        AuditError bare = errorOf(r.rows().get(5));
        assertEquals("pressure", bare.field());
        assertTrue(bare.reason().contains("bare number"), bare.reason());
    }

    @Test
    void everyInputRowAppearsExactlyOnceInInputOrderWithItsLineNumber() {
        String text = "# a comment line\n" + AuditFixtures.HEADER + "\n" + GOOD + "\n\n"
                + "V-2,Area 1,propain,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,,17.2,,,\n"
                + "# another comment\n" + GOOD.replace("V-1", "V-3") + "\n";
        AuditResult r = Audit.run(RegisterCases.items(Register.parse(text, "t.csv")), Thresholds.none(), 3,
                Audit.Progress.NONE);
        // lines: 1 comment, 2 header, 3 V-1, 4 blank, 5 V-2, 6 comment, 7 V-3
        assertEquals(List.of(3, 5, 7), r.rows().stream().map(VesselAudit::row).toList());
        assertEquals(List.of("V-1", "V-2", "V-3"), r.rows().stream().map(VesselAudit::tag).toList());
        assertEquals(List.of("ok", "error", "ok"), r.rows().stream().map(v -> v.status().word()).toList());
        String csv = AuditCsv.text(r);
        List<String> lines = csv.lines().toList();
        assertEquals(4, lines.size(), "header + one line per input row");
        assertTrue(lines.get(1).startsWith("3,t.csv,V-1,") && lines.get(2).startsWith("5,t.csv,V-2,")
                && lines.get(3).startsWith("7,t.csv,V-3,"), csv);
        assertTrue(lines.get(2).contains(",error,fluid,"), lines.get(2));
    }

    @Test
    void aCellWithItsOwnUnitOverridesTheHeaderUnit() {
        AuditResult r = audit(GOOD, GOOD.replace("V-1", "V-2").replace(",3.0,12,", ",3000 mm,12,"),
                GOOD.replace("V-1", "V-3").replace(",25,,saturated", ",77 F,,saturated"));
        VesselAudit.Contents a = r.rows().get(0).inventory().orElseThrow();
        VesselAudit.Contents b = r.rows().get(1).inventory().orElseThrow();
        // Hand calculation: 3000 mm = 3.0 m exactly, so the same vessel
        assertEquals(a.totalVolumeM3(), b.totalVolumeM3(), 0.0);
        // Hand calculation: 77 F = (77 - 32) / 1.8 C = 25 C; 1e-9 K allows the two conversion paths' round-off
        assertEquals(a.temperatureK(), r.rows().get(2).inventory().orElseThrow().temperatureK(), 1e-9);
    }

    @Test
    void aRegisterWithoutARequiredColumnOrWithABadHeaderUnitIsRefusedAsAWhole() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Register.parse(
                AuditFixtures.HEADER.replace("set pressure [barg],", "") + "\n", "t.csv"));
        assertTrue(e.getMessage().contains("'set pressure'"), e.getMessage());
        InvalidInputException u = assertThrows(InvalidInputException.class, () -> Register.parse(
                AuditFixtures.HEADER.replace("diameter [m]", "diameter [furlong]") + "\n", "t.csv"));
        assertTrue(u.getMessage().contains("[furlong]") && u.getMessage().contains("column 7"), u.getMessage());
        InvalidInputException d = assertThrows(InvalidInputException.class, () -> Register.parse(
                AuditFixtures.HEADER + ",tag\n", "t.csv"));
        assertTrue(d.getMessage().contains("already column 1"), d.getMessage());
    }

    @Test
    void aHeaderWithoutVesselRowsIsRefusedNotAuditedAsAnEmptySite() {
        // before: exit 0 with 'Rows 0' and a site inventory of 0.0 t, which reads like a result
        for (String text : new String[] {AuditFixtures.HEADER + "\n", AuditFixtures.HEADER + "\n# a comment\n\n"}) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> Register.parse(text, "t.csv"));
            assertTrue(e.getMessage().startsWith("t.csv") && e.getMessage().contains("no vessel rows"),
                    e.getMessage());
            assertThrows(InvalidInputException.class, () -> Register.stream(text, "t.csv"));
        }
    }

    @Test
    void aRowLongerThanTheHeaderIsAnErrorNotAShiftedRow() {
        AuditResult r = audit(GOOD + ",extra");
        AuditError e = errorOf(r.rows().get(0));
        assertTrue(e.reason().contains("19 fields, the header 18"), e.reason());
    }

    @Test
    void modeRulesAreCheckedPerRow() {
        AuditResult r = audit(
                // specified storage without a pressure
                "V-1,Area 1,n-hexane,,vertical,2:1,2.0,5.0,1.0,60,25,,specified,nitrogen,3.5,,,",
                // a vapour composition with saturated storage
                "V-2,Area 1,propane,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,nitrogen,17.2,,,",
                // unknown orifice letter
                "V-3,Area 1,propane,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,,17.2,,Z,",
                // set pressure above the MAWP (one device: at most 100 % of MAWP, API Std 520 Part I)
                "V-4,Area 1,propane,,horizontal,2:1,3.0,12,1.0,70,25,,saturated,,17.2,16,,");
        assertEquals("pressure", errorOf(r.rows().get(0)).field());
        assertEquals("vapour", errorOf(r.rows().get(1)).field());
        assertEquals("orifice", errorOf(r.rows().get(2)).field());
        AuditError set = errorOf(r.rows().get(3));
        assertEquals("set pressure", set.field());
        assertTrue(set.reason().contains("of MAWP"), set.reason());
    }

    /**
     * Sweep findings (issue 19): a value out of the calculation's range is reported against its register
     * column with the cell as written, not as a domain path with its SI value ("storage.temperature
     * '1e+300 K'", "storage.relievingPressure '1.21e+305 Pa'"); NaN and Infinity are refused by name.
     */
    @Test
    void outOfRangeAndNonNumericCellsNameTheirColumnAndTheCellAsWritten() {
        AuditResult r = audit(
                GOOD.replace(",25,,saturated,", ",1e300 C,,saturated,"),
                GOOD.replace(",17.2,,,", ",1e300,,,"),
                GOOD.replace(",17.2,,,", ",17.2,1e300 barg,,"),
                GOOD.replace(",25,,saturated,,", ",25,1e300 barg,specified,,"),
                GOOD.replace(",12,1.0,70,", ",12,1e300,70,"),
                GOOD.replace(",25,,saturated,", ",NaN,,saturated,"),
                GOOD.replace(",17.2,,,", ",Infinity,,,"));
        List<String[]> expected = List.of(
                new String[] {"temperature", "1e300 C", "from -272.15 C to 1726.85 C"},
                new String[] {"set pressure", "1e300 barg", "at most 4000 barg"},
                new String[] {"mawp", "1e300 barg", "at most 4000 barg"},
                new String[] {"pressure", "1e300 barg", "from 1 Pa to 1000 MPa"},
                new String[] {"elevation", "1e300 m", "from -50 m to 200 m"},
                new String[] {"temperature", "NaN", "expected a number followed by a unit"},
                new String[] {"set pressure", "Infinity", "expected a number followed by a unit"});
        for (int i = 0; i < expected.size(); i++) {
            AuditError e = errorOf(r.rows().get(i));
            String[] x = expected.get(i);
            assertEquals(x[0], e.field(), "row " + i + ": " + e);
            assertEquals(x[1], e.value(), "row " + i + ": " + e);
            assertTrue(e.reason().contains(x[2]), "row " + i + ": " + e.reason());
        }
    }

    /**
     * Sweep finding (issue 19): a 100,000-character tag stalled the audit PDF. A cell longer than its
     * column takes refuses the row, and the refused row carries the cell shortened, never the whole of it.
     */
    @Test
    void anOverlongCellRefusesTheRowAndIsEchoedShortened() {
        String longTag = "T".repeat(100_000);
        String longArea = "A".repeat(101);
        AuditResult r = audit(GOOD.replace("V-1", longTag), GOOD.replace("Area 1", longArea),
                GOOD.replace("V-1", "T".repeat(60)));
        AuditError tag = errorOf(r.rows().get(0));
        assertEquals("tag", tag.field());
        assertTrue(tag.reason().contains("at most 60 characters"), tag.reason());
        assertTrue(tag.value().endsWith("... (100000 characters)") && tag.value().length() < 80, tag.value());
        assertTrue(r.rows().get(0).tag().length() < 80, "the refused row's tag is shortened");
        AuditError area = errorOf(r.rows().get(1));
        assertEquals("area", area.field());
        assertTrue(area.reason().contains("at most 100 characters"), area.reason());
        assertEquals(VesselAudit.Status.OK, r.rows().get(2).status(), "a 60-character tag is taken");
    }
}
