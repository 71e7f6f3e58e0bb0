package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;

/** Register input that used to be taken silently or blamed on the wrong column. */
class RegisterInputTest {

    private static final String HEADER = "tag,area,fluid,shape,heads,diameter [m],length [m],elevation [m],level [%v],"
            + "temperature [C],mode,set pressure [barg]";

    @Test
    void aMisspeltColumnIsRefusedWithTheColumnItMeans() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> Register.parse(
                HEADER + ",orifise\nV-1,A,propane,horizontal,2:1,3,10,1,50,20,saturated,17,J\n", "r.csv"));
        assertTrue(e.getMessage().contains("did you mean 'orifice'"), e.getMessage());
    }

    @Test
    void anUnrelatedColumnIsListedNotUsed() {
        Register r = Register.parse(HEADER + ",inspection notes\nV-1,A,propane,horizontal,2:1,3,10,1,50,20,saturated,17,"
                + "ok\n", "r.csv");
        assertEquals(List.of("inspection notes"), r.ignoredColumns());
    }

    @Test
    void aBadDiameterIsReportedUnderItsOwnColumnWithTheRange() {
        Register r = Register.parse(HEADER + "\nV-1,A,propane,horizontal,2:1,-3,10,1,50,20,saturated,17\n"
                + "V-2,A,propane,horizontal,2:1,3,1e-300,1,50,20,saturated,17\n", "r.csv");
        RegisterCases rc = new RegisterCases("r.csv");
        AuditItem a = rc.item(r.rows().get(0));
        assertEquals("diameter", a.error().orElseThrow().field(), a.error().toString());
        assertTrue(a.error().orElseThrow().message().contains("0.05 to 40 m"), a.error().toString());
        AuditItem b = rc.item(r.rows().get(1));
        assertEquals("length", b.error().orElseThrow().field(), b.error().toString());
    }
}
