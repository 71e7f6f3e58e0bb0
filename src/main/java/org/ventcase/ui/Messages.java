package org.ventcase.ui;

import java.text.MessageFormat;
import java.util.Locale;
import java.util.MissingResourceException;
import java.util.ResourceBundle;

/** The wizard's strings, all in {@code org/ventcase/ui/messages.properties}. */
public final class Messages {

    private static final ResourceBundle BUNDLE = ResourceBundle.getBundle("org.ventcase.ui.messages", Locale.ROOT);

    private Messages() {
    }

    /** The string for {@code key}, formatted with {@code args} when given. */
    public static String get(String key, Object... args) {
        String s = BUNDLE.getString(key);
        return args.length == 0 ? s : new MessageFormat(s, Locale.ROOT).format(args);
    }

    /** The string for {@code key}, or {@code dflt} when there is none. */
    public static String orElse(String key, String dflt) {
        try {
            return BUNDLE.getString(key);
        } catch (MissingResourceException e) {
            return dflt;
        }
    }

    /** True when the bundle has {@code key}. */
    public static boolean has(String key) {
        return BUNDLE.containsKey(key);
    }

    /** The bundle key of a field path: "$.scenarios[2].inflow" -> "scenarios.inflow". */
    public static String fieldKey(String path) {
        return path.replaceFirst("^\\$\\.", "").replaceAll("\\[\\d+]", "");
    }

    /** A string without its mnemonic marker. */
    public static String plain(String key) {
        return get(key).replace("_", "");
    }
}
