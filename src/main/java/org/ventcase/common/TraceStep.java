package org.ventcase.common;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * One step of a calculation as a reviewer checks it: what was computed, by which equation, from
 * which published source, with the inputs substituted and the results, as text with units. The
 * calculation sheet prints these and nothing else, so every number on the sheet is one the
 * calculation produced.
 *
 * <p>Values given as a format and its arguments ({@link Builder#in(String, String, Object...)})
 * are kept as typed values and formatted (with {@link Locale#US}) only when something reads them:
 * the audit, which shows no trace, never pays for the text. The result is the same text as
 * formatting at once.
 */
public final class TraceStep {

    /** A value formatted on first use. */
    private record Deferred(String format, Object[] args) {
        String text() {
            return String.format(Locale.US, format, args);
        }
    }

    /** A value made on first use. */
    private record Made(java.util.function.Supplier<String> supplier) {
    }

    private final String title;
    private final String equation;
    private final Object source;
    private final List<String> inNames;
    private final List<Object> inValues;
    private final List<String> outNames;
    private final List<Object> outValues;
    private final List<Object> noteValues;
    private volatile Map<String, String> inputs;
    private volatile Map<String, String> outputs;
    private volatile List<String> notes;

    private TraceStep(String title, String equation, Object source, List<String> inNames, List<Object> inValues,
                      List<String> outNames, List<Object> outValues, List<Object> noteValues) {
        this.title = title;
        this.equation = equation;
        this.source = source;
        this.inNames = inNames;
        this.inValues = inValues;
        this.outNames = outNames;
        this.outValues = outValues;
        this.noteValues = noteValues;
    }

    /** Builder for readable construction at the call site. */
    public static Builder of(String title) {
        return new Builder(title);
    }

    /** Short name of the step, e.g. "Relieving pressure". */
    public String title() {
        return title;
    }

    /** The equation in plain text. */
    public String equation() {
        return equation;
    }

    /** Publication, edition and equation or table. */
    public String source() {
        return text(source);
    }

    /** Name -> value with unit, in order. */
    public Map<String, String> inputs() {
        Map<String, String> m = inputs;
        if (m == null) {
            m = map(inNames, inValues);
            inputs = m;
        }
        return m;
    }

    /** Name -> value with unit, in order. */
    public Map<String, String> outputs() {
        Map<String, String> m = outputs;
        if (m == null) {
            m = map(outNames, outValues);
            outputs = m;
        }
        return m;
    }

    /** Rules applied and remarks. */
    public List<String> notes() {
        List<String> n = notes;
        if (n == null) {
            List<String> out = new ArrayList<>(noteValues.size());
            for (Object o : noteValues) {
                String s = text(o);
                if (s != null && !s.isBlank()) {
                    out.add(s);
                }
            }
            n = List.copyOf(out);
            notes = n;
        }
        return n;
    }

    private static Map<String, String> map(List<String> names, List<Object> values) {
        Map<String, String> m = new LinkedHashMap<>();
        for (int i = 0; i < names.size(); i++) {
            m.put(names.get(i), text(values.get(i)));
        }
        return Collections.unmodifiableMap(m);
    }

    private static String text(Object o) {
        if (o instanceof Deferred d) {
            return d.text();
        }
        return o instanceof Made m ? m.supplier().get() : (String) o;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TraceStep t && title.equals(t.title) && equation.equals(t.equation)
                && source().equals(t.source()) && inputs().equals(t.inputs()) && outputs().equals(t.outputs())
                && notes().equals(t.notes());
    }

    @Override
    public int hashCode() {
        return Objects.hash(title, equation, source(), inputs(), outputs(), notes());
    }

    @Override
    public String toString() {
        return "TraceStep[title=" + title + ", equation=" + equation + ", source=" + source() + ", inputs=" + inputs()
                + ", outputs=" + outputs() + ", notes=" + notes() + "]";
    }

    /** Collects a step's parts in order. */
    public static final class Builder {
        private final String title;
        private String equation = "";
        private Object source = "";
        private final List<String> inNames = new ArrayList<>();
        private final List<Object> inValues = new ArrayList<>();
        private final List<String> outNames = new ArrayList<>();
        private final List<Object> outValues = new ArrayList<>();
        private final List<Object> notes = new ArrayList<>();

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

        /** A source made when it is read (see {@link LazyText}). */
        public Builder source(java.util.function.Supplier<String> s) {
            this.source = new Made(s);
            return this;
        }

        public Builder in(String name, String value) {
            put(inNames, inValues, name, value);
            return this;
        }

        /** An input formatted as String.format(Locale.US, format, args) when it is read. */
        public Builder in(String name, String format, Object... args) {
            put(inNames, inValues, name, new Deferred(format, args));
            return this;
        }

        /** An input made when it is read (e.g. a description that takes work to write). */
        public Builder in(String name, java.util.function.Supplier<String> value) {
            put(inNames, inValues, name, new Made(value));
            return this;
        }

        public Builder out(String name, String value) {
            put(outNames, outValues, name, value);
            return this;
        }

        /** An output formatted as String.format(Locale.US, format, args) when it is read. */
        /** An output made when it is read (see {@link LazyText}). */
        public Builder out(String name, java.util.function.Supplier<String> value) {
            put(outNames, outValues, name, new Made(value));
            return this;
        }

        public Builder out(String name, String format, Object... args) {
            put(outNames, outValues, name, new Deferred(format, args));
            return this;
        }

        public Builder note(String n) {
            if (n != null && !n.isBlank()) {
                notes.add(n);
            }
            return this;
        }

        /** A note formatted as String.format(Locale.US, format, args) when it is read. */
        /** A note made when it is read (see {@link LazyText}). */
        public Builder note(java.util.function.Supplier<String> n) {
            notes.add(new Made(n));
            return this;
        }

        public Builder note(String format, Object... args) {
            notes.add(new Deferred(format, args));
            return this;
        }

        /** A later value under the same name replaces the earlier one, in its place (as a map put). */
        private static void put(List<String> names, List<Object> values, String name, Object value) {
            int i = names.indexOf(name);
            if (i >= 0) {
                values.set(i, value);
            } else {
                names.add(name);
                values.add(value);
            }
        }

        public TraceStep build() {
            return new TraceStep(title, equation, source, List.copyOf(inNames), List.copyOf(inValues),
                    List.copyOf(outNames), List.copyOf(outValues), List.copyOf(notes));
        }
    }
}
