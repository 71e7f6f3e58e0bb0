package org.ventcase.relief;

/** Whether the overpressure case is an external fire; fire cases have a larger allowable accumulation. */
public enum ScenarioKind {
    /** External pool fire. */
    FIRE,
    /** Any other cause (blocked outlet, control failure, thermal expansion, ...). */
    NON_FIRE
}
