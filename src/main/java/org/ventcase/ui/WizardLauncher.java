package org.ventcase.ui;

import javafx.application.Application;

/**
 * Starts the wizard. A plain class (not an {@link Application}), so that a shaded jar without the
 * module path can launch JavaFX; {@code ventcase} with no arguments calls {@link #launch}.
 */
public final class WizardLauncher {

    private WizardLauncher() {
    }

    /** Opens the wizard and returns when its window closes. */
    public static void launch(String... args) {
        Application.launch(WizardApp.class, args);
    }

    /** Opens the wizard with the built-in demo case and its results; returns when the window closes. */
    public static void launchDemo() {
        Application.launch(WizardApp.class, WizardApp.DEMO_ARG);
    }

    public static void main(String[] args) {
        launch(args);
    }
}
