package org.ventcase.casefile;

import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Case-file layout versions and the migration from each to the next. A file says its version in
 * the integer {@code schemaVersion}; older layouts are rewritten step by step to
 * {@link #CURRENT} on load, one step per version, each step moving fields without guessing. A
 * file without a version, with a version that is not a whole number, or with a version newer than
 * this build reads is refused, never reinterpreted.
 *
 * <h2>Versions</h2>
 * <ul>
 *   <li><b>0</b>: pure fluids only. The title block fields ({@code title}, {@code tag},
 *       {@code revision}, {@code preparer}, {@code checker}, {@code date}, {@code notes}) sat at
 *       the top level; the fluid was one name in {@code fluidName} and the equation of state in
 *       {@code eos}, also at the top level; liquid densities were always the translated ones.
 *       {@code vessel}, {@code storage}, {@code scenarios}, {@code device} and {@code site} had
 *       today's layout.</li>
 *   <li><b>1</b> (current): title block in {@code identity}; mixtures in {@code fluid} with
 *       {@code components}, {@code eos}, {@code kij} and an explicit {@code densityBasis}.</li>
 * </ul>
 */
public final class Migrations {

    /** The layout version this build writes. */
    public static final int CURRENT = 1;

    /** The oldest layout version this build reads. */
    public static final int OLDEST = 0;

    /** One step from version {@code from} to {@code from + 1}. */
    interface Step {
        int from();

        /** Rewrites the tree; problems that make the step impossible go to {@code problems}. */
        ObjectNode apply(ObjectNode in, List<Problem> problems);
    }

    private static final List<Step> STEPS = List.of(new V0ToV1());

    /**
     * The result of migrating a tree.
     *
     * @param tree        the tree in the current layout
     * @param fromVersion the version the file was written in
     * @param notes       one line per step applied, for the report's warnings
     */
    public record Migrated(ObjectNode tree, int fromVersion, List<String> notes) {
        public Migrated {
            notes = List.copyOf(notes);
        }
    }

    private Migrations() {
    }

    /**
     * Brings a parsed case file to the current layout.
     *
     * @throws CaseValidationException when the version is missing, not a whole number, older than
     *                                 {@link #OLDEST} or newer than {@link #CURRENT}, or when a
     *                                 step cannot be applied
     */
    public static Migrated migrate(ObjectNode root, String origin) {
        int version = version(root, origin);
        ObjectNode tree = root;
        List<String> notes = new ArrayList<>();
        for (int v = version; v < CURRENT; v++) {
            Step step = STEPS.get(v - OLDEST);
            if (step.from() != v) {
                throw new IllegalStateException("migration steps out of order at version " + v);
            }
            List<Problem> problems = new ArrayList<>();
            tree = step.apply(tree, problems);
            if (!problems.isEmpty()) {
                throw new CaseValidationException(origin, problems);
            }
            notes.add("Case file migrated from schema version " + v + " to " + (v + 1)
                    + "; save it to keep the new layout.");
        }
        return new Migrated(tree, version, notes);
    }

    private static int version(ObjectNode root, String origin) {
        JsonNode v = root.get("schemaVersion");
        String accepted = "expected a whole number from " + OLDEST + " to " + CURRENT + " (this build writes " + CURRENT + ")";
        if (v == null) {
            throw new CaseValidationException(origin, List.of(Problem.missing("$.schemaVersion", accepted
                    + "; a file without a version is not guessed at")));
        }
        if (!v.isIntegralNumber() || !v.canConvertToInt()) {
            throw new CaseValidationException(origin, List.of(Problem.of("$.schemaVersion", v.toString(), accepted)));
        }
        int n = v.intValue();
        if (n > CURRENT) {
            throw new CaseValidationException(origin, List.of(Problem.of("$.schemaVersion", v.toString(),
                    "this file was written for schema version " + n + " by a newer Ventcase; this build reads versions "
                            + OLDEST + " to " + CURRENT + ". Open it with a newer build.")));
        }
        if (n < OLDEST) {
            throw new CaseValidationException(origin, List.of(Problem.of("$.schemaVersion", v.toString(), accepted)));
        }
        return n;
    }

    /** Version 0 to 1: title block into {@code identity}, {@code fluidName}/{@code eos} into {@code fluid}. */
    static final class V0ToV1 implements Step {
        static final List<String> IDENTITY_FIELDS = List.of("title", "tag", "revision", "preparer", "checker", "date",
                "notes");

        @Override
        public int from() {
            return 0;
        }

        @Override
        public ObjectNode apply(ObjectNode in, List<Problem> problems) {
            for (String taken : List.of("identity", "fluid")) {
                if (in.has(taken)) {
                    problems.add(Problem.of("$." + taken, "present", "a version 0 file has no '" + taken
                            + "' section; this looks like a version 1 file: set schemaVersion to 1"));
                }
            }
            JsonNode fluidName = in.get("fluidName");
            if (fluidName == null || !fluidName.isTextual() || fluidName.asText().isBlank()) {
                problems.add(new Problem("$.fluidName", fluidName == null ? null : fluidName.toString(),
                        "a version 0 file names its fluid in fluidName (text)", ""));
            }
            if (!problems.isEmpty()) {
                return in;
            }
            JsonNodeFactory f = JsonNodeFactory.instance;
            ObjectNode out = f.objectNode();
            out.put("schemaVersion", 1);
            ObjectNode identity = f.objectNode();
            for (String k : IDENTITY_FIELDS) {
                if (in.has(k)) {
                    identity.set(k, in.get(k));
                }
            }
            out.set("identity", identity);
            ObjectNode fluid = f.objectNode();
            ArrayNode comps = f.arrayNode();
            comps.addObject().put("name", fluidName.asText()).put("moleFraction", 1.0);
            fluid.set("components", comps);
            if (in.has("eos")) {
                fluid.set("eos", in.get("eos"));
            }
            // Version 0 always used translated liquid densities: said here, not guessed.
            fluid.put("densityBasis", "translated");
            out.set("fluid", fluid);
            in.fieldNames().forEachRemaining(k -> {
                if (!k.equals("schemaVersion") && !k.equals("fluidName") && !k.equals("eos")
                        && !IDENTITY_FIELDS.contains(k)) {
                    out.set(k, in.get(k));
                }
            });
            return out;
        }
    }
}
