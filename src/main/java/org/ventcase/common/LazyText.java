package org.ventcase.common;

import java.util.Locale;
import java.util.function.Supplier;

/**
 * A text made when it is first read, then kept: a format and its arguments (formatted with
 * {@link Locale#US}, as the calculation's trace text is) or any supplier. The calculation's
 * rule and trace texts are built this way, so that a run whose text nobody reads (the audit's
 * screening rows) does not pay for the formatting; the text read is the same as formatting at once.
 * Equal when the texts are equal; {@link #toString()} is the text, so a LazyText can be
 * concatenated or passed to a {@code %s}.
 */
public final class LazyText implements Supplier<String>, CharSequence {

    private final String format;
    private final Object[] args;
    private final Supplier<String> supplier;
    private volatile String text;

    private LazyText(String format, Object[] args, Supplier<String> supplier) {
        this.format = format;
        this.args = args;
        this.supplier = supplier;
    }

    /** String.format(Locale.US, format, args), when first read. */
    public static LazyText format(String format, Object... args) {
        return new LazyText(format, args, null);
    }

    /** The supplier's text, when first read. */
    public static LazyText of(Supplier<String> supplier) {
        return new LazyText(null, null, supplier);
    }

    /** A text already made. */
    public static LazyText fixed(String text) {
        LazyText t = new LazyText(null, null, null);
        t.text = text;
        return t;
    }

    @Override
    public String get() {
        String t = text;
        if (t == null) {
            t = supplier != null ? supplier.get() : String.format(Locale.US, format, args);
            text = t;
        }
        return t;
    }

    @Override
    public int length() {
        return get().length();
    }

    @Override
    public char charAt(int index) {
        return get().charAt(index);
    }

    @Override
    public CharSequence subSequence(int start, int end) {
        return get().subSequence(start, end);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LazyText l && get().equals(l.get());
    }

    @Override
    public int hashCode() {
        return get().hashCode();
    }

    @Override
    public String toString() {
        return get();
    }
}
