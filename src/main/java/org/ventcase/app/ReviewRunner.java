package org.ventcase.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.BooleanSupplier;

import org.ventcase.casefile.CaseFiles;
import org.ventcase.casefile.CaseInputs;
import org.ventcase.casefile.CaseValidationException;
import org.ventcase.casefile.ClaimedFiles;
import org.ventcase.casefile.ReviewJson;
import org.ventcase.casefile.ValidatedCase;
import org.ventcase.report.CalculationSheet;
import org.ventcase.report.ReviewSheets;
import org.ventcase.review.ClaimedValues;
import org.ventcase.review.Review;
import org.ventcase.review.ReviewResult;
import org.ventcase.review.Tolerances;

/**
 * The wizard's review mode's bridge to {@link Review}: reads a claimed-value file (a file on disk,
 * or one of the packaged demo files of {@code demo-cases/review/}), finds the case it is checked
 * against (the case the file names, else the case open in the wizard), runs the review with the
 * tolerances given, and writes the review PDF and JSON, both atomically. The same steps as
 * {@code ventcase review}. Free of JavaFX; called off the application thread.
 */
public final class ReviewRunner {

    /** The packaged demo claimed-value files, by file name (ReviewRunnerTest checks this against the folder). */
    public static final List<String> DEMOS = List.of("propane-bullet-clean.json", "lpg-sphere-clean.csv",
            "propane-bullet-latent-at-storage.json", "propane-bullet-gauge-as-absolute.json",
            "propane-bullet-k-real.json", "propane-bullet-untranslated-density.json",
            "lpg-sphere-wetted-area-fire-height.json");

    private static final String DEMO_DIR = "/org/ventcase/demo-cases/";

    /** Where a claimed-value file comes from. */
    public sealed interface Source {
        /** File name as shown. */
        String name();
    }

    /** A claimed-value file on disk. */
    public record FileSource(Path path) implements Source {
        @Override
        public String name() {
            return path.getFileName().toString();
        }
    }

    /** A packaged demo claimed-value file ({@link #DEMOS}). */
    public record DemoSource(String name) implements Source {
        public DemoSource {
            if (!DEMOS.contains(name)) {
                throw new IllegalArgumentException("no demo review file " + name + "; there are " + DEMOS);
            }
        }
    }

    /**
     * The case open in the wizard, offered for claimed values that name none.
     *
     * @param kase the case, when it validates
     * @param name how it is called on screen (its file name, or "untitled")
     */
    public record OpenCase(Optional<ValidatedCase> kase, String name) {
    }

    /**
     * A finished review with what it was run on.
     *
     * @param result      the review
     * @param kase        the case it was checked against
     * @param caseName    the case's name as shown and printed
     * @param caseOrigin  why this case: named by the claimed file, or open in the wizard
     * @param claimedName the claimed-value file's name
     */
    public record Outcome(ReviewResult result, ValidatedCase kase, String caseName, String caseOrigin,
                          String claimedName, Review.Prepared prepared) {
        /**
         * The same review judged with other tolerances: no case is computed again (fast enough
         * for the application thread).
         */
        public Outcome withTolerances(Tolerances tolerances) {
            return new Outcome(prepared.judge(tolerances), kase, caseName, caseOrigin, claimedName, prepared);
        }
    }

    /**
     * Reads the claimed values, finds the case and runs the review.
     *
     * @throws org.ventcase.common.InvalidInputException a claimed value or a tolerance is not accepted (the
     *         message names the field)
     * @throws CaseValidationException the case has problems
     * @throws CaseRunner.Cancelled when {@code cancelled} turned true before the result was made
     */
    public Outcome run(Source source, OpenCase open, Tolerances tolerances, CaseRunner.Progress progress,
                       BooleanSupplier cancelled) {
        progress.update(0.05, "reading " + source.name());
        ClaimedFiles.Claimed claimed = read(source);
        check(cancelled);
        String caseName;
        String origin;
        ValidatedCase kase;
        if (claimed.casePath().isPresent()) {
            Path p = claimed.casePath().get();
            caseName = p.getFileName().toString();
            origin = "named in " + source.name();
            progress.update(0.1, "reading the case " + caseName);
            kase = source instanceof DemoSource ? CaseFiles.load(demoText(caseName), caseName) : CaseFiles.load(p);
        } else {
            caseName = open.name();
            origin = "open in the wizard (" + source.name() + " names no case)";
            kase = open.kase().orElseThrow(() -> new org.ventcase.common.InvalidInputException("case", null,
                    source.name() + " names no case, and no valid case is open in the wizard: open the case first "
                            + "(or fix its marked fields), or add a 'case' entry to the claimed values"));
        }
        check(cancelled);
        progress.update(0.2, "computing the case, then again with PR78 and SRK on both density bases (once: a "
                + "tolerance change only judges again)");
        Outcome o = review(kase, caseName, origin, claimed, source.name(), tolerances);
        check(cancelled);
        progress.update(1.0, "done");
        return o;
    }

    /**
     * The review of a case already read against claimed values already read: the last step of
     * {@link #run}, and the whole of {@code ventcase review} once the command line has found its case.
     *
     * @throws org.ventcase.common.InvalidInputException a claimed value is not accepted (the message names
     *         the field)
     */
    public static Outcome review(ValidatedCase kase, String caseName, String caseOrigin, ClaimedFiles.Claimed claimed,
                                 String claimedName, Tolerances tolerances) {
        ClaimedValues values = claimed.values(kase.site().atmosphericPa());
        Review.Prepared prepared = Review.prepare(CaseInputs.from(kase), values);
        return new Outcome(prepared.judge(tolerances), kase, caseName, caseOrigin, claimedName, prepared);
    }

    private static void check(BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new CaseRunner.Cancelled();
        }
    }

    /** Reads a claimed-value file as written (not yet in SI: that needs the case's atmospheric pressure). */
    public static ClaimedFiles.Claimed read(Source source) {
        if (source instanceof FileSource f) {
            return ClaimedFiles.read(f.path());
        }
        String name = source.name();
        String text = demoText("review/" + name);
        // a packaged file's case path stays as written; run() maps it to the packaged case
        return name.toLowerCase(Locale.ROOT).endsWith(".json") ? ClaimedFiles.json(text, name, null)
                : ClaimedFiles.csv(text, name, null);
    }

    private static String demoText(String name) {
        String path = DEMO_DIR + name;
        try (InputStream in = ReviewRunner.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new org.ventcase.common.InvalidInputException("case", name,
                        "expected one of the packaged demo files; there is no " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Writes the review PDF atomically. */
    public static void writePdf(Outcome o, Path target, CalculationSheet.PageSize size, String toolVersion)
            throws IOException {
        writePdf(o, target, size, toolVersion, org.ventcase.report.UnitSystem.SI);
    }

    /** Writes the review PDF atomically, its values in the unit system given. */
    public static void writePdf(Outcome o, Path target, CalculationSheet.PageSize size, String toolVersion,
                                org.ventcase.report.UnitSystem units) throws IOException {
        CalculationSheet.write(ReviewSheets.from(o.result(), CaseSheets.identity(o.kase(), toolVersion), o.caseName(),
                o.claimedName(), units), target, size);
    }

    /** Writes the review JSON atomically. */
    public static void writeJson(Outcome o, Path target, String toolVersion) {
        CaseFiles.writeText(ReviewJson.write(o.result(), toolVersion), target);
    }
}
