package org.ventcase.relief;

import java.util.Optional;
import java.util.OptionalDouble;

import org.ventcase.common.InvalidInputException;

/**
 * One row of the environment-factor table, or a factor computed from insulation properties.
 *
 * @param key            stable identifier used by case files (e.g. {@code bare}, {@code insulated_5.68})
 * @param description    what the row means
 * @param conductanceWPerM2K insulation conductance k/t, W/(m2 K), when the row is an insulation row
 * @param f              environment factor, 0..1
 * @param status         S, D or M as in REFERENCES.md
 * @param source         where the value comes from
 * @param warning        a caution to print with the factor, if any
 */
public record EnvironmentFactor(String key, String description, OptionalDouble conductanceWPerM2K, double f,
                                String status, String source, Optional<String> warning) {
    public EnvironmentFactor {
        if (key == null || key.isBlank()) {
            throw InvalidInputException.missing("fire.environment", "expected a non-empty key");
        }
        InvalidInputException.requireInRange("fire.environment[" + key + "].f", f, 0, 1, "");
        if (source == null || source.isBlank()) {
            throw InvalidInputException.missing("fire.environment[" + key + "].source", "every datum needs a source");
        }
        conductanceWPerM2K = conductanceWPerM2K == null ? OptionalDouble.empty() : conductanceWPerM2K;
        warning = warning == null ? Optional.empty() : warning;
        description = description == null ? "" : description;
        status = status == null ? "" : status;
    }
}
