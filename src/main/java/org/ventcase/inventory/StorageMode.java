package org.ventcase.inventory;

/** How the contents of a vessel are specified. */
public enum StorageMode {
    /** Liquid at its bubble point at the stated temperature; vapour in equilibrium with it. */
    SATURATED("saturated"),
    /** Stated temperature and pressure; liquid and vapour-space compositions stated separately. */
    SPECIFIED("specified"),
    /** No liquid: a single gas phase at the stated temperature and pressure. */
    GAS("gas");

    private final String label;

    StorageMode(String label) {
        this.label = label;
    }

    /** Lower-case label used in JSON, on the sheet and on the command line. */
    public String label() {
        return label;
    }
}
