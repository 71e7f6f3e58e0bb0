package org.ventcase.casefile;

import java.util.List;
import java.util.Optional;

/**
 * The outcome of checking a case: every problem found, the cautions that do not stop a
 * calculation, and the validated case when there were no problems.
 *
 * @param origin    file name or other origin
 * @param problems  every problem, empty when the case is usable
 * @param warnings  cautions (e.g. a set pressure accepted above the limit with a reason; a
 *                  migration from an older layout)
 * @param validated the case ready for calculation, present exactly when {@code problems} is empty
 */
public record ValidationReport(String origin, List<Problem> problems, List<String> warnings,
                               Optional<ValidatedCase> validated) {

    public ValidationReport {
        problems = List.copyOf(problems);
        warnings = List.copyOf(warnings);
        validated = validated == null ? Optional.empty() : validated;
        if (problems.isEmpty() != validated.isPresent()) {
            throw new IllegalArgumentException("a validated case is present exactly when there are no problems");
        }
    }

    /** True when the case can be calculated. */
    public boolean ok() {
        return problems.isEmpty();
    }

    /** The validated case, or a {@link CaseValidationException} with every problem. */
    public ValidatedCase orThrow() {
        return validated.orElseThrow(() -> new CaseValidationException(origin, problems));
    }
}
