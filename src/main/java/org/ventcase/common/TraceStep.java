package org.ventcase.common;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * One step of a calculation as a reviewer checks it: what was computed, by which equation, from
 * which published source, with the inputs substituted and the results, all as already-formatted
 * text with units. The calculation sheet prints these and nothing else, so every number on the
 * sheet is one the calculation produced.
 *
 * @param title    short name of the step, e.g. "Relieving pressure"
 * @param equation the equation in plain text
 * @param source   publication, edition and equation or table
 * @param inputs   name -> value with unit, in order
 * @param outputs  name -> value with unit, in order
 * @param notes    rules applied and remarks
 */
public record TraceStep(String title, String equation, String source, Map<String, String> inputs,
                        Map<String, String> outputs, List<String> notes) {

    public TraceStep {
        inputs = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(inputs));
        outputs = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(outputs));
        notes = List.copyOf(notes);
    }

    /** Builder for readable construction at the call site. */
    public static Builder of(String title) {
        return new Builder(title);
    }

    /** Collects a step's parts in order. */
    public static final class Builder {
        private final String title;
        private String equation = "";
        private String source = "";
        private final Map<String, String> inputs = new LinkedHashMap<>();
        private final Map<String, String> outputs = new LinkedHashMap<>();
        private final java.util.ArrayList<String> notes = new java.util.ArrayList<>();

        private Builder(String title) {
            this.title = title;
        }

        public Builder equation(String e) {
            this.equation = e;
            return this;
        }

        public Builder source(String s) {
            this.source = s;
            return this;
        }

        public Builder in(String name, String value) {
            inputs.put(name, value);
            return this;
        }

        public Builder out(String name, String value) {
            outputs.put(name, value);
            return this;
        }

        public Builder note(String n) {
            if (n != null && !n.isBlank()) {
                notes.add(n);
            }
            return this;
        }

        public TraceStep build() {
            return new TraceStep(title, equation, source, inputs, outputs, notes);
        }
    }
}
