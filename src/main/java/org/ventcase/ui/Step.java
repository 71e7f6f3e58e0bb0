package org.ventcase.ui;

import java.util.List;

/** The wizard's steps, in the order an engineer works through a relief case. */
public enum Step {
    IDENTITY("step.identity", List.of("$.identity", "$.schemaVersion")),
    FLUID("step.fluid", List.of("$.fluid")),
    VESSEL("step.vessel", List.of("$.vessel", "$.site")),
    STORAGE("step.storage", List.of("$.storage")),
    SCENARIOS("step.scenarios", List.of("$.scenarios")),
    DEVICE("step.device", List.of("$.device")),
    RESULTS("step.results", List.of("$")),
    EXPORT("step.export", List.of());

    private final String key;
    private final List<String> prefixes;

    Step(String key, List<String> prefixes) {
        this.key = key;
        this.prefixes = prefixes;
    }

    /** Bundle key of the title (and, with ".intro", of the introduction). */
    public String key() {
        return key;
    }

    /**
     * True when a problem at {@code path} belongs to this step. The results step owns only
     * problems of the case as a whole ({@code $}).
     */
    public boolean owns(String path) {
        for (String p : prefixes) {
            if (p.equals("$") ? path.equals("$") : path.equals(p) || path.startsWith(p + ".") || path.startsWith(p + "[")) {
                return true;
            }
        }
        return false;
    }

    /** Steps where the case is edited. */
    public boolean editing() {
        return ordinal() <= DEVICE.ordinal();
    }
}
