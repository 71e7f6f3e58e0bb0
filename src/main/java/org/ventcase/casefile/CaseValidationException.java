package org.ventcase.casefile;

import java.util.List;
import java.util.stream.Collectors;

import org.ventcase.common.VentcaseException;

/**
 * A case file that cannot be used, with every problem found (not only the first). The command
 * line prints each problem on its own line and exits with code 2.
 */
public final class CaseValidationException extends VentcaseException {
    private static final long serialVersionUID = 1L;

    private final String origin;
    private final transient List<Problem> problems;

    public CaseValidationException(String origin, List<Problem> problems) {
        super(format(origin, problems));
        if (problems == null || problems.isEmpty()) {
            throw new IllegalArgumentException("a validation exception needs at least one problem");
        }
        this.origin = origin;
        this.problems = List.copyOf(problems);
    }

    private static String format(String origin, List<Problem> problems) {
        int n = problems == null ? 0 : problems.size();
        return origin + ": " + n + (n == 1 ? " problem" : " problems") + System.lineSeparator()
                + (problems == null ? "" : problems.stream().map(p -> "  " + p.message())
                .collect(Collectors.joining(System.lineSeparator())));
    }

    /** The file name or other origin given when reading. */
    public String origin() {
        return origin;
    }

    /** Every problem, in the order found (file order within each pass). */
    public List<Problem> problems() {
        return problems;
    }
}
