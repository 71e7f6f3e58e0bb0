package org.ventcase.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.ventcase.common.InvalidInputException;
import org.ventcase.review.ClaimedValues;
import org.ventcase.review.ReviewQuantity;

class ClaimedFilesTest {

    private static final double ATM = 101_325.0;

    @Test
    void jsonValuesAreReadIntoSiAndTheCasePathIsRelativeToTheFile() {
        ClaimedFiles.Claimed c = ClaimedFiles.json("{\"case\": \"../a/case.json\", \"scenario\": 2, \"claimed\": {"
                + "\"relievingPressure\": \"20.8 barg\", \"relievingTemperature\": \"61 C\", \"molarMass\": 44.1, "
                + "\"Z\": 0.67, \"k\": \"1.11\", \"latentHeat\": \"252 kJ/kg\", \"reliefLoad\": \"36000 kg/h\", "
                + "\"requiredArea\": \"2.5 in2\", \"orifice\": \"2xl\"}}", "t.json", Path.of("/x/claims"));
        assertEquals(Path.of("/x/a/case.json"), c.casePath().orElseThrow());
        assertEquals("2", c.scenario().orElseThrow());
        ClaimedValues v = c.values(ATM);
        // Hand calculation: 20.8 barg = 2.08e6 + 101325 Pa abs
        assertEquals(2_181_325, v.value(ReviewQuantity.RELIEVING_PRESSURE).orElseThrow(), 1e-6);
        // Hand calculation: 61 C = 334.15 K
        assertEquals(334.15, v.value(ReviewQuantity.RELIEVING_TEMPERATURE).orElseThrow(), 1e-9);
        assertEquals(44.1, v.value(ReviewQuantity.MOLAR_MASS).orElseThrow(), 0.0);
        assertEquals(1.11, v.value(ReviewQuantity.K).orElseThrow(), 0.0);
        // Hand calculation: 36000 kg/h / 3600 = 10 kg/s; 2.5 in2 = 2.5 x 0.0254^2 m2 (exact, NIST SP 811)
        assertEquals(10.0, v.value(ReviewQuantity.RELIEF_LOAD).orElseThrow(), 1e-12);
        assertEquals(2.5 * 0.0254 * 0.0254, v.value(ReviewQuantity.REQUIRED_AREA).orElseThrow(), 1e-15);
        assertEquals("2 x L", v.orifice().orElseThrow());
    }

    @Test
    void csvRowsWithHeaderCommentsAndAQuotedSource() {
        ClaimedFiles.Claimed c = ClaimedFiles.csv("# a comment\nquantity,value\ncase,case.json\n"
                + "source,\"Someone, somewhere\"\nlatentHeat,252 kJ/kg\norifice,L\n", "t.csv", Path.of("/d"));
        assertEquals(Path.of("/d/case.json"), c.casePath().orElseThrow());
        assertEquals("Someone, somewhere", c.source());
        ClaimedValues v = c.values(ATM);
        assertEquals(252e3, v.value(ReviewQuantity.LATENT_HEAT).orElseThrow(), 1e-9);
        assertEquals("L", v.orifice().orElseThrow());
    }

    @Test
    void badInputNamesTheFieldAndWhatIsAccepted() {
        InvalidInputException bare = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"relievingPressure\": \"21.8 bar\"}}", "t", null).values(ATM));
        assertEquals("claimed.relievingPressure", bare.field());
        assertTrue(bare.getMessage().contains("gauge or absolute"), bare.getMessage());
        InvalidInputException unknown = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"latentHaet\": \"252 kJ/kg\"}}", "t", null));
        assertTrue(unknown.getMessage().contains("latentHeat"), unknown.getMessage());
        InvalidInputException top = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimd\": {}}", "t", null));
        assertTrue(top.getMessage().contains("claimed"), top.getMessage());
        InvalidInputException noUnit = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"latentHeat\": 252}}", "t", null));
        assertEquals("claimed.latentHeat", noUnit.field());
        InvalidInputException dup = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"k\": 1.1, \"k\": 1.2}}", "t", null));
        assertTrue(dup.getMessage().contains("repeated") && dup.getMessage().contains("line 1"), dup.getMessage());
        assertThrows(InvalidInputException.class, () -> ClaimedFiles.json("{\"claimed\": {\"orifice\": \"LL\"}}",
                "t", null).values(ATM));
        assertThrows(InvalidInputException.class, () -> ClaimedFiles.json("{\"claimed\": {\"k\": 0}}", "t", null)
                .values(ATM));
        assertThrows(InvalidInputException.class, () -> ClaimedFiles.json("{\"claimed\": {}}", "t", null)
                .values(ATM));
    }

    @Test
    void malformedJsonSaysWhatWasFoundAndWhereWithoutLibraryWords() {
        // each of these once gave a message quoting the JSON library's feature names
        for (String bad : new String[] {"{\"claimed\": {\"k\": NaN}}", "{\"claimed\": {\"k\": 1.1,}}",
                "{\"claimed\": {\"k\": 1.1}} {\"claimed\": {}}"}) {
            InvalidInputException e = assertThrows(InvalidInputException.class,
                    () -> ClaimedFiles.json(bad, "claims.json", null));
            String m = e.getMessage();
            assertTrue(m.startsWith("claims.json"), m);
            assertTrue(m.contains("line 1"), m);
            for (String leak : new String[] {"Feature", "ALLOW_", "FAIL_ON", "Source:", "Exception"}) {
                assertTrue(!m.contains(leak), m);
            }
        }
    }

    @Test
    void csvErrorsNameTheFileLineAndQuantity() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> ClaimedFiles.csv(
                "quantity,value\nk,1.1\nlatentHeat,252 kJ\n", "claims.csv", null).values(ATM));
        assertEquals("claims.csv line 3 (latentHeat)", e.field());
        // the accepted units are listed in their usual spelling (kJ/kg, not kj/kg)
        assertTrue(e.getMessage().contains("kJ/kg"), e.getMessage());
    }

    @Test
    void orificeLettersOutsideApi526AndImplausibleValuesAreRefused() {
        // API Std 526 letters D to T without I, O and S (from memory; the project's OrificeTable holds them); 'Z' is not one of them
        InvalidInputException z = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"orifice\": \"3 x Z\"}}", "t", null).values(ATM));
        assertEquals("claimed.orifice", z.field());
        assertTrue(z.getMessage().contains("'Z' is not an API 526 orifice letter"), z.getMessage());
        assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"orifice\": \"1000 x L\"}}", "t", null).values(ATM));
        // 1e300 MW is finite but no fire heats a vessel so: taken as a typing error, not a result
        InvalidInputException big = assertThrows(InvalidInputException.class, () -> ClaimedFiles.json(
                "{\"claimed\": {\"heatInput\": \"1e300 MW\"}}", "t", null).values(ATM));
        assertEquals("claimed.heatInput", big.field());
        assertTrue(big.getMessage().contains("typing error"), big.getMessage());
        assertTrue(!big.getMessage().contains("Infinity") && !big.getMessage().contains("NaN"), big.getMessage());
    }
}
