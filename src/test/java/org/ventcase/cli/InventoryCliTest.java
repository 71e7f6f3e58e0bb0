package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.ventcase.cli.CliTest.json;
import static org.ventcase.cli.CliTest.run;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;

import org.junit.jupiter.api.Test;

/** {@code ventcase inventory}: the JSON contract, the text form and exit codes. */
class InventoryCliTest {

    static final String[] BULLET = {"inventory", "--shape", "horizontal", "--diameter", "3.2 m", "--length", "12 m"};

    static String[] args(String... more) {
        List<String> a = new ArrayList<>(List.of(BULLET));
        a.addAll(List.of(more));
        return a.toArray(new String[0]);
    }

    @Test
    void saturatedJsonHasTheDocumentedContract() throws Exception {
        CliTest.Run r = run(args("--level", "80 %v", "--fluid", "propane:0.95,n-butane:0.05", "--mode", "saturated",
                "--temperature", "15 C", "--relief-pressure", "17.2 barg", "--json"));
        assertEquals(0, r.code(), r.err());
        JsonNode n = json(r.out());
        for (String f : List.of("mode", "eos", "eosName", "densityBasis", "temperature_K", "pressure_Pa", "composition",
                "components", "kij", "vessel", "liquid", "vapor", "totals", "rackettLiquidDensity_kg_m3", "liquidFull",
                "trace", "warnings")) {
            assertTrue(n.has(f), "missing " + f);
        }
        for (String f : List.of("volume_m3", "density_kg_m3", "densityBasis", "Z", "mass_kg", "moles_mol",
                "molarMass_kg_kmol", "composition", "massPerComponent_kg")) {
            assertTrue(n.get("liquid").has(f), "missing liquid." + f);
            assertTrue(n.get("vapor").has(f), "missing vapor." + f);
        }
        assertEquals("saturated", n.get("mode").asText());
        assertEquals("translated", n.get("liquid").get("densityBasis").asText());
        assertTrue(n.get("rackettLiquidDensity_kg_m3").isNull(), "no Rackett figure for a mixture");
        assertTrue(n.get("vessel").has("totalVolume_m3"));
        // Hand calculation: totals.mass_kg = liquid.mass_kg + vapor.mass_kg, and the component masses add up.
        double ml = n.get("liquid").get("mass_kg").asDouble();
        double mv = n.get("vapor").get("mass_kg").asDouble();
        assertEquals(ml + mv, n.get("totals").get("mass_kg").asDouble(), 1e-9 * (ml + mv));
        double sum = 0;
        for (Iterator<JsonNode> it = n.get("totals").get("massPerComponent_kg").elements(); it.hasNext();) {
            sum += it.next().asDouble();
        }
        assertEquals(ml + mv, sum, 1e-9 * (ml + mv));
        // Hand calculation: 17.2 barg + 1.01325 bar = 1 821 325 Pa.
        assertEquals(1821325.0, n.get("liquidFull").get("relievingPressure_Pa").asDouble(), 1e-6);
        assertTrue(n.get("liquidFull").has("fillsBeforeRelief"));
        assertTrue(n.get("trace").size() >= 5);
    }

    @Test
    void gasModeHasANullLiquidAndNoLevelIsNeeded() throws Exception {
        CliTest.Run r = run(args("--fluid", "methane:0.9,ethane:0.1", "--mode", "gas", "--temperature", "20 C",
                "--pressure", "49 barg", "--json"));
        assertEquals(0, r.code(), r.err());
        JsonNode n = json(r.out());
        assertTrue(n.get("liquid").isNull());
        assertTrue(n.get("liquidFull").isNull());
        assertEquals(0.0, n.get("totals").get("liquidMass_kg").asDouble(), 0.0);
        assertEquals(n.get("vessel").get("totalVolume_m3").asDouble(), n.get("vapor").get("volume_m3").asDouble(), 1e-9);
    }

    @Test
    void specifiedTextOutputShowsPhasesAndWarnings() {
        CliTest.Run r = run(args("--level", "80 %v", "--fluid", "propane", "--mode", "specified", "--temperature",
                "20 C", "--pressure", "4 barg", "--vapour", "nitrogen:0.9,propane:0.1"));
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("Liquid density"), r.out());
        assertTrue(r.out().contains("Vapour composition"), r.out());
        assertTrue(r.out().contains("The liquid would flash"), r.out());
    }

    @Test
    void badInputExitsWithTwoAndNamesTheOption() {
        record Case(String option, String[] args) {
        }
        List<Case> cases = List.of(
                new Case("--fluid", args("--level", "50 %", "--fluid", "propane:0.9,n-butane:0.2", "--mode",
                        "saturated", "--temperature", "15 C")),
                new Case("--fluid[1]", args("--level", "50 %", "--fluid", "propane:0.9,unobtainium:0.1", "--mode",
                        "saturated", "--temperature", "15 C")),
                new Case("--mode", args("--level", "50 %", "--fluid", "propane", "--mode", "boiling",
                        "--temperature", "15 C")),
                new Case("--pressure", args("--level", "50 %", "--fluid", "propane", "--mode", "saturated",
                        "--temperature", "15 C", "--pressure", "5 barg")),
                new Case("--pressure", args("--fluid", "propane", "--mode", "gas", "--temperature", "15 C")),
                new Case("--vapour", args("--level", "50 %", "--fluid", "propane", "--mode", "specified",
                        "--temperature", "15 C", "--pressure", "9 barg")),
                new Case("--level", args("--fluid", "propane", "--mode", "saturated", "--temperature", "15 C")),
                new Case("--level", args("--level", "10 %", "--fluid", "methane", "--mode", "gas", "--temperature",
                        "15 C", "--pressure", "9 barg")),
                new Case("--relief-pressure", args("--level", "50 %", "--fluid", "propane", "--mode", "saturated",
                        "--temperature", "15 C", "--relief-pressure", "1 barg")),
                new Case("--temperature", args("--level", "50 %", "--fluid", "propane", "--mode", "saturated",
                        "--temperature", "120 C")));
        for (Case c : cases) {
            CliTest.Run r = run(c.args());
            assertEquals(2, r.code(), String.join(" ", c.args()) + "\n" + r.err());
            assertTrue(r.err().startsWith("ventcase: " + c.option() + ": "), r.err());
        }
    }

    @Test
    void vesselCommandStillWorksThroughTheSharedOptions() throws Exception {
        CliTest.Run r = run("vessel", "--shape", "horizontal", "--diameter", "3.2 m", "--length", "12 m", "--level",
                "65 %", "--json");
        assertEquals(0, r.code(), r.err());
        assertTrue(json(r.out()).has("fireWettedArea_m2"));
        CliTest.Run missing = run("vessel", "--shape", "horizontal", "--diameter", "3.2 m", "--length", "12 m");
        assertEquals(2, missing.code());
        assertTrue(missing.err().contains("--level"), missing.err());
    }
}
