package org.ventcase.relief;

/** Number of pressure-relief devices protecting the vessel for the scenario. */
public enum DeviceCount {
    /** One device. */
    SINGLE,
    /** Two or more devices share the relief load. */
    MULTIPLE
}
