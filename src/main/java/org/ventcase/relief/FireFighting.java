package org.ventcase.relief;

/** Drainage and fire-fighting conditions, which select the constant of the wetted-vessel fire equation. */
public enum FireFighting {
    /** Adequate drainage and prompt fire-fighting: Q = 43,200 F A^0.82 (W, m2). */
    ADEQUATE_DRAINAGE_AND_FIREFIGHTING,
    /** Adequate drainage and fire-fighting not both present: Q = 70,900 F A^0.82 (W, m2). */
    INADEQUATE
}
