package org.ventcase.calc;

/** The scenario types of a case, with the keys case files and results use. */
public enum ScenarioKey {
    FIRE_WETTED("fire-wetted"),
    FIRE_NEAR_CRITICAL("fire-near-critical"),
    FIRE_BOIL_OFF("fire-boil-off"),
    FIRE_GAS_FILLED("fire-gas-filled"),
    BLOCKED_OUTLET("blocked-outlet"),
    THERMAL_EXPANSION("thermal-expansion");

    private final String key;

    ScenarioKey(String key) {
        this.key = key;
    }

    /** The text used in case and results files, e.g. {@code fire-wetted}. */
    public String key() {
        return key;
    }
}
