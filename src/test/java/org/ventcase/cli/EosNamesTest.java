package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;

import org.junit.jupiter.api.Test;
import org.ventcase.thermo.EosVariant;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import picocli.CommandLine;
import picocli.CommandLine.Option;

/**
 * The EOS variant names have one registry, {@link EosVariant#OFFERED}. Code reads it; the texts that
 * cannot (annotation constants, the schema, the wizard help, the user docs) are checked against it
 * here, so a new variant that is not named everywhere fails the build (project convention, no source).
 */
class EosNamesTest {

    @Test
    void commandLineDefaultAndCandidatesComeFromTheRegistry() throws Exception {
        Option eos = CommonOptions.class.getDeclaredField("eos").getAnnotation(Option.class);
        assertEquals(EosVariant.DEFAULT.id(), eos.defaultValue());
        java.util.List<String> candidates = new java.util.ArrayList<>();
        new CommonOptions.EosNames().forEach(candidates::add);
        assertEquals(EosVariant.offeredIds(), candidates);
        // the rendered help lists every offered name
        String usage = new CommandLine(new Main()).getSubcommands().get("sat").getUsageMessage();
        for (String id : EosVariant.offeredIds()) {
            assertTrue(usage.contains(id), "sat --help lacks " + id);
        }
    }

    @Test
    void schemaWizardHelpAndUserDocsNameEveryOfferedVariant() throws IOException {
        JsonNode schema;
        try (InputStream in = EosVariant.class.getResourceAsStream("/org/ventcase/casefile/case.schema.json")) {
            schema = new ObjectMapper().readTree(in);
        }
        String schemaText = schema.findValue("eos").path("description").asText();
        Properties messages = new Properties();
        try (InputStream in = EosVariant.class.getResourceAsStream("/org/ventcase/ui/messages.properties")) {
            messages.load(new java.io.InputStreamReader(in, StandardCharsets.UTF_8));
        }
        String help = messages.getProperty("help.fluid.eos");
        String readme = Files.readString(Path.of("README.md"));
        String auditDoc = Files.readString(Path.of("docs/audit.md"));
        for (String id : EosVariant.offeredIds()) {
            assertTrue(schemaText.contains(id), "schema eos description lacks " + id);
            assertTrue(help.contains(id), "wizard help lacks " + id);
            assertTrue(readme.contains("`" + id + "`"), "README lacks " + id);
            assertTrue(auditDoc.contains("`" + id + "`"), "docs/audit.md lacks " + id);
        }
        assertTrue(schemaText.contains(EosVariant.DEFAULT.id() + " (the default"), schemaText);
    }

    @Test
    void translatedIdsAreTheVariantsWithAVolumeShift() {
        for (EosVariant v : EosVariant.OFFERED) {
            assertEquals(v.hasVolumeShift(), EosVariant.translatedIds().contains(v.id()), v.id());
        }
        assertTrue(EosVariant.ACCEPTED.startsWith(EosVariant.DEFAULT.id() + " (default)"), EosVariant.ACCEPTED);
    }
}
