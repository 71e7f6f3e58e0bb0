package org.ventcase.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Spreadsheet formula injection is neutralised in text cells; numbers stay numbers. */
class AuditCsvTest {

    @Test
    void textCellsThatAFormulaCouldStartWithGetAnApostrophe() {
        // common practice, no source: the characters spreadsheets treat as the start of a formula
        assertEquals("'=SUM(A1:A9)", Csv.text("=SUM(A1:A9)"));
        assertEquals("'+1", Csv.text("+1"));
        assertEquals("'-2", Csv.text("-2"));
        assertEquals("'@cmd", Csv.text("@cmd"));
        assertEquals("'\tx", Csv.text("\tx"), "a tab at the start is neutralised");
        assertEquals("' =1", Csv.text(" =1"), "a formula after leading spaces is neutralised too");
        assertEquals("\"'=1,2\"", Csv.text("=1,2"), "neutralised, then quoted for the comma");
        assertEquals("V-1001", Csv.text("V-1001"), "a dash inside a tag is harmless");
        assertEquals("\"say \"\"hi\"\"\"", Csv.text("say \"hi\""));
    }

    @Test
    void numbersAreWrittenPlainAndUnquotedIncludingNegativeOnes() {
        // Hand calculation: rounding to 6 significant digits
        assertEquals("-16.1219", Csv.number(-16.121903, 6));
        assertEquals("1234570", Csv.number(1234567.8, 6));
        assertEquals("0.000123457", Csv.number(1.234567e-4, 6));
        assertEquals("0", Csv.number(0.0, 6));
    }

    @Test
    void theAuditCsvNeutralisesEveryTextCellAndKeepsNegativeMarginsNumeric() {
        String text = AuditFixtures.HEADER + "\n"
                + "=V-1,@Area,propane,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,D,\n"
                + "-V-2,+Area,propain,,horizontal,2:1,3.2,16,1.2,85,38,,saturated,,17.2,,,\n";
        AuditResult r = Audit.run(RegisterCases.items(Register.parse(text, "=evil.csv")), Thresholds.none(), 1,
                Audit.Progress.NONE);
        String csv = AuditCsv.text(r);
        List<List<String>> rows = Csv.parse(csv, "out").stream().map(Csv.Record::fields).toList();
        List<String> head = rows.get(0);
        int margin = head.indexOf("installed margin [%]");
        assertEquals("'=V-1", rows.get(1).get(head.indexOf("tag")));
        assertEquals("'@Area", rows.get(1).get(head.indexOf("area")));
        assertEquals("'=evil.csv", rows.get(1).get(head.indexOf("source")));
        assertEquals("'-V-2", rows.get(2).get(head.indexOf("tag")));
        // a D orifice (71 mm2) is far below a 3.2 m bullet's fire area: the margin is a negative number
        double m = Double.parseDouble(rows.get(1).get(margin));
        assertTrue(m < 0, "margin " + m);
        for (List<String> row : rows.subList(1, rows.size())) {
            for (String cell : row) {
                if (!cell.isEmpty() && "=+-@\t\r".indexOf(cell.charAt(0)) >= 0) {
                    // only numbers may start with a minus sign
                    Double.parseDouble(cell);
                }
            }
        }
        assertTrue(csv.contains(",-"), "negative numbers are written with their sign, unquoted");
    }

    @Test
    void parsingKeepsQuotedCommasAndLineNumbers() {
        List<Csv.Record> recs = Csv.parse("a,b\n# c\n\"x,1\",\"two\nlines\"\nlast,\"q\"\"\"\n", "t");
        assertEquals(3, recs.size());
        assertEquals(List.of("x,1", "two\nlines"), recs.get(1).fields());
        assertEquals(3, recs.get(1).line());
        assertEquals(5, recs.get(2).line(), "the record after a two-line field starts on line 5");
        assertEquals(List.of("last", "q\""), recs.get(2).fields());
    }
}
