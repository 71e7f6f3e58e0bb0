package org.ventcase.device;

/** Gas flow regime through the nozzle. */
public enum FlowRegime {
    /** Back pressure at or below the critical flow pressure: the flow is choked. */
    CRITICAL,
    /** Back pressure above the critical flow pressure. */
    SUBCRITICAL
}
