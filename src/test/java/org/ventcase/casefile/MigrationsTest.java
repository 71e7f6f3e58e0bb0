package org.ventcase.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MigrationsTest {

    /** A version 0 file: flat title block, one fluid by name, eos at the top level. */
    static final String V0 = """
            {
              "schemaVersion": 0,
              "title": "Old propane bullet",
              "tag": "V-0901",
              "revision": "B",
              "preparer": "K. Ashdown",
              "checker": "",
              "date": "2019-06-30",
              "fluidName": "propane",
              "eos": "PR78",
              "vessel": { "shape": "sphere", "insideDiameter": "10 m", "bottomElevation": "2 m" },
              "storage": { "mode": "saturated", "temperature": "30 C", "liquidLevel": "60 %" },
              "scenarios": [ { "type": "fire-wetted", "fireFighting": "adequate", "environmentFactor": "bare" } ],
              "device": { "setPressure": "15 barg", "mawp": "15 barg", "deviceCount": "single",
                          "backPressure": { "superimposed": "0 barg", "builtUp": "0.2 bar" },
                          "valveType": "conventional" }
            }
            """;

    /** The same case written by hand in the version 1 layout. */
    static final String V1 = """
            {
              "schemaVersion": 1,
              "identity": { "title": "Old propane bullet", "tag": "V-0901", "revision": "B",
                            "preparer": "K. Ashdown", "checker": "", "date": "2019-06-30" },
              "fluid": { "components": [ { "name": "propane", "moleFraction": 1 } ], "eos": "PR78",
                         "densityBasis": "translated" },
              "vessel": { "shape": "sphere", "insideDiameter": "10 m", "bottomElevation": "2 m" },
              "storage": { "mode": "saturated", "temperature": "30 C", "liquidLevel": "60 %" },
              "scenarios": [ { "type": "fire-wetted", "fireFighting": "adequate", "environmentFactor": "bare" } ],
              "device": { "setPressure": "15 barg", "mawp": "15 barg", "deviceCount": "single",
                          "backPressure": { "superimposed": "0 barg", "builtUp": "0.2 bar" },
                          "valveType": "conventional" }
            }
            """;

    @TempDir
    Path dir;

    @Test
    void versionZeroBecomesTheHandWrittenVersionOne() {
        Case migrated = CaseFiles.read(V0, "v0");
        Case expected = CaseFiles.read(V1, "v1");
        assertEquals(expected, migrated);
        assertEquals(CaseFiles.inputHash(expected), CaseFiles.inputHash(migrated));
    }

    @Test
    void migratedCaseRoundTripsThroughAFileInTheCurrentLayout() {
        Case migrated = CaseFiles.read(V0, "v0");
        Path f = dir.resolve("migrated.json");
        CaseFiles.write(migrated, f);
        Case back = CaseFiles.read(f);
        assertEquals(migrated, back);
        assertEquals(Integer.valueOf(Migrations.CURRENT), back.schemaVersion());
    }

    @Test
    void migrationIsNotedAndTheMigratedCaseValidates() {
        ValidationReport r = CaseFiles.check(V0, "v0");
        assertTrue(r.ok(), r.problems().toString());
        assertTrue(r.warnings().stream().anyMatch(w -> w.contains("migrated from schema version 0 to 1")), r.warnings().toString());
    }

    @Test
    void newerVersionIsRefusedWithAClearMessage() {
        String v2 = V1.replace("\"schemaVersion\": 1", "\"schemaVersion\": 2");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(v2, "v2"));
        Problem p = e.problems().get(0);
        assertEquals("$.schemaVersion", p.path());
        assertTrue(p.accepted().contains("newer Ventcase") && p.accepted().contains("reads versions 0 to 1"), p.accepted());
    }

    @Test
    void missingOrFractionalVersionIsRefusedNotGuessed() {
        String none = V1.replace("\"schemaVersion\": 1,", "");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(none, "none"));
        assertEquals("$.schemaVersion", e.problems().get(0).path());
        assertEquals(null, e.problems().get(0).value());
        String frac = V1.replace("\"schemaVersion\": 1", "\"schemaVersion\": 1.5");
        assertThrows(CaseValidationException.class, () -> CaseFiles.read(frac, "frac"));
    }

    @Test
    void versionZeroLabelOnAVersionOneLayoutIsRefused() {
        String mislabelled = V1.replace("\"schemaVersion\": 1", "\"schemaVersion\": 0");
        CaseValidationException e = assertThrows(CaseValidationException.class, () -> CaseFiles.read(mislabelled, "m"));
        assertTrue(e.problems().stream().anyMatch(p -> p.path().equals("$.identity")), e.getMessage());
        assertTrue(e.problems().stream().anyMatch(p -> p.path().equals("$.fluidName")), e.getMessage());
    }
}
