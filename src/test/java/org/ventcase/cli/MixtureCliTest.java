package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** flash, sat (mixture) and envelope as a script uses them. */
class MixtureCliTest {

    private static JsonNode json(String... args) throws Exception {
        CliTest.Run r = CliTest.run(args);
        assertEquals(0, r.code(), r.err());
        return CliTest.json(r.out());
    }

    @Test
    void flashJsonHasTheDocumentedContractAndClosesTheMaterialBalance() throws Exception {
        JsonNode n = json("flash", "--fluid", "propane:0.7,n-butane:0.3", "--temperature", "40 C", "--pressure",
                "10 bara", "--json");
        for (String f : List.of("components", "kij", "vaporFraction", "phases", "stable", "warnings")) {
            assertTrue(n.has(f), "missing " + f);
        }
        assertEquals(2, n.get("phases").size());
        for (JsonNode p : n.get("phases")) {
            for (String f : List.of("phase", "moleFraction", "composition", "Z", "density_kg_m3", "molarMass_kg_kmol",
                    "enthalpy_J_mol")) {
                assertTrue(p.has(f), "missing phase." + f);
            }
        }
        double beta = n.get("vaporFraction").asDouble();
        double xl = n.get("phases").get(0).get("composition").get("propane").asDouble();
        double yv = n.get("phases").get(1).get("composition").get("propane").asDouble();
        // Material balance (identity): z = (1 - beta) x + beta y
        assertEquals(0.7, (1 - beta) * xl + beta * yv, 1e-10);
    }

    @Test
    void bubblePointFlashHasZeroVapourFraction() throws Exception {
        JsonNode b = json("sat", "--fluid", "propane:0.7,n-butane:0.3", "--temperature", "40 C", "--json");
        for (String f : List.of("temperature_K", "pressure_Pa", "incipientComposition")) {
            assertTrue(b.has(f), "missing " + f);
        }
        assertEquals("bubble", b.get("kind").asText());
        double p = b.get("pressure_Pa").asDouble();
        JsonNode f = json("flash", "--fluid", "propane:0.7,n-butane:0.3", "--temperature", "40 C", "--pressure",
                (p * 0.999) / 1000 + " kPaa", "--json");
        // Just below the bubble pressure the vapour fraction is small and positive (consistency).
        assertTrue(f.get("vaporFraction").asDouble() > 0 && f.get("vaporFraction").asDouble() < 0.02,
                f.get("vaporFraction").toString());
        JsonNode d = json("sat", "--fluid", "propane:0.7,n-butane:0.3", "--temperature", "40 C", "--dew", "--json");
        assertEquals("dew", d.get("kind").asText());
        assertTrue(d.get("pressure_Pa").asDouble() < p, "dew pressure below bubble pressure");
    }

    @Test
    void envelopeWritesCsvAndJson(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("env.csv");
        JsonNode n = json("envelope", "--fluid", "methane:0.1,propane:0.6,n-butane:0.3", "--csv", csv.toString(),
                "--json");
        assertTrue(n.get("points").size() > 20);
        assertTrue(n.has("cricondenbar") && n.has("cricondentherm") && n.has("criticalPoint"));
        List<String> lines = Files.readAllLines(csv);
        assertEquals("branch,temperature_K,pressure_Pa", lines.get(0));
        assertEquals(n.get("points").size() + 1, lines.size());
        // Cricondenbar is the highest pressure on the curve (definition).
        double pmax = 0;
        for (JsonNode p : n.get("points")) {
            pmax = Math.max(pmax, p.get("pressure_Pa").asDouble());
        }
        assertTrue(n.get("cricondenbar").get("pressure_Pa").asDouble() >= pmax * 0.999);
    }

    @Test
    void compositionNotSummingToOneIsRefusedWithItsSumUnlessNormalised() throws Exception {
        CliTest.Run r = CliTest.run("flash", "--fluid", "propane:0.7,n-butane:0.2", "--temperature", "40 C",
                "--pressure", "10 bara");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--fluid") && r.err().contains("0.9"), r.err());
        JsonNode n = json("flash", "--fluid", "propane:0.7,n-butane:0.2", "--normalize", "--temperature", "40 C",
                "--pressure", "10 bara", "--json");
        assertEquals(0.7 / 0.9, n.get("feed").get("propane").asDouble(), 1e-12);
    }
}
