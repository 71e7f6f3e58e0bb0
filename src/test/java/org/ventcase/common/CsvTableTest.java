package org.ventcase.common;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;

/**
 * The shared table reader. The quoting rules are those of RFC 4180 (a field in double quotes, a
 * doubled quote inside standing for one); comments, the header and the free-text last column are
 * this program's file conventions (common practice, no source).
 */
class CsvTableTest {

    private static CsvTable read(String text, CsvTable.LastColumn last) throws IOException {
        return CsvTable.read(new StringReader(text), "t.csv", last);
    }

    @Test
    void commentsAndBlankLinesAreSkippedAndRowsKnowTheirLine() throws IOException {
        CsvTable t = read("# source header\n\nname,value,source\n# note\na,1.5,s1\nb,,s2\n",
                CsvTable.LastColumn.FIELD);
        assertEquals(List.of("name", "value", "source"), t.columns());
        assertEquals(2, t.rows().size());
        assertEquals("t.csv:row 5", t.rows().get(0).where());
        assertEquals(1.5, t.rows().get(0).number("value"));
        assertEquals(OptionalDouble.empty(), t.rows().get(1).optionalNumber("value"));
        assertEquals("t.csv:row 3.header", t.headerWhere());
    }

    @Test
    void quotedFieldsFollowRfc4180() {
        assertEquals(List.of("a,b", "say \"x\"", ""), CsvTable.split("\"a,b\",\"say \"\"x\"\"\",", "w", 0));
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CsvTable.split("\"open,b", "w", 0));
        assertTrue(e.getMessage().contains("unbalanced double quote"), e.getMessage());
    }

    @Test
    void aFreeTextLastColumnTakesTheRestOfTheLine() throws IOException {
        CsvTable t = read("key,f,source\nbare,1.0,API Std 521, 5th ed., Table 5\nq,2,\"quoted, whole\"\n",
                CsvTable.LastColumn.REST_OF_LINE);
        assertEquals("API Std 521, 5th ed., Table 5", t.rows().get(0).text("source"));
        assertEquals("quoted, whole", t.rows().get(1).text("source"));
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> read("key,f,source\nbare,1.0,a, b\n", CsvTable.LastColumn.FIELD));
        assertEquals("t.csv:row 2", e.field());
    }

    @Test
    void refusedValuesNameThePlaceAndTheColumn() throws IOException {
        CsvTable t = read("name,value,source\nx,abc,\ny,NaN,s\nz,1,\n", CsvTable.LastColumn.FIELD);
        InvalidInputException bad = assertThrows(InvalidInputException.class, () -> t.rows().get(0).number("value"));
        assertEquals("t.csv:row 2.value", bad.field());
        InvalidInputException nan = assertThrows(InvalidInputException.class, () -> t.rows().get(1).number("value"));
        assertTrue(nan.getMessage().contains("finite"), nan.getMessage());
        InvalidInputException src = assertThrows(InvalidInputException.class, () -> t.rows().get(2).required("source"));
        assertTrue(src.getMessage().contains("every datum needs a source"), src.getMessage());
        InvalidInputException col = assertThrows(InvalidInputException.class, () -> t.rows().get(2).text("unit"));
        assertEquals("t.csv:row 4.unit", col.field());
    }

    @Test
    void aHeaderMustNameEachColumnOnceAndMustExist() {
        assertThrows(InvalidInputException.class, () -> read("a,b,a\n1,2,3\n", CsvTable.LastColumn.FIELD));
        assertThrows(InvalidInputException.class, () -> read("a,,c\n1,2,3\n", CsvTable.LastColumn.FIELD));
        assertThrows(InvalidInputException.class, () -> read("# only comments\n\n", CsvTable.LastColumn.FIELD));
    }

    @Test
    void aFaultInAPackagedTableIsTheBuildsNotTheUsers() {
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> CsvTable.resource(CsvTableTest.class, "no-such-table.csv", CsvTable.LastColumn.FIELD));
        assertTrue(e.getMessage().contains("missing resource"), e.getMessage());
    }
}
