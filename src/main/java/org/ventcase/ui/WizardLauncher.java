package org.ventcase.ui;

import javafx.application.Application;

/**
 * Starts the wizard. A plain class (not an {@link Application}), so that a shaded jar without the
 * module path can launch JavaFX; {@code ventcase} with no arguments calls {@link #launch}.
 */
public final class WizardLauncher {

    /**
     * JavaFX's logger (java.util.logging, "javafx"), kept here so that its filter stays set. JavaFX
     * warns on every start that it was loaded from the class path ("Unsupported JavaFX configuration:
     * classes were loaded from 'unnamed module'"): that is how a single runnable jar works, and the
     * line only alarms a user, so that one message is dropped; every other JavaFX message is kept.
     */
    private static final java.util.logging.Logger FX_LOG = java.util.logging.Logger.getLogger("javafx");

    static {
        FX_LOG.setFilter(r -> r.getMessage() == null
                || !r.getMessage().startsWith("Unsupported JavaFX configuration"));
    }

    private WizardLauncher() {
    }

    /**
     * Opens the wizard and returns when its window closes: true; false, having opened nothing, when
     * the display named by DISPLAY cannot be opened (e.g. a remote shell without X forwarding).
     */
    public static boolean launch(String... args) {
        try {
            Application.launch(WizardApp.class, args);
            return true;
        } catch (UnsupportedOperationException e) {
            // the windowing toolkit's "Unable to open DISPLAY": the caller says so in the user's terms
            return false;
        }
    }

    /** Opens the wizard with the built-in demo case and its results, as {@link #launch}. */
    public static boolean launchDemo() {
        return launch(WizardApp.DEMO_ARG);
    }

    public static void main(String[] args) {
        if (!launch(args)) {
            // the development entry (mvn javafx:run); 'ventcase' itself says this in its own words
            throw new IllegalStateException(NO_WINDOW);
        }
    }

    /** Said when the display cannot be opened. */
    public static final String NO_WINDOW = "ventcase: the display '" + System.getenv("DISPLAY") + "' cannot be "
            + "opened, so the case wizard cannot open (check DISPLAY, or the X forwarding of a remote shell).";
}
