/**
 * What a vessel holds: the contents by phase (liquid, vapour) and by component, for saturated
 * storage, for a liquid under a stated vapour space (e.g. a nitrogen blanket) and for a
 * gas-filled vessel, with the calculation trace and warnings where the physics leaves the mode's
 * assumptions. Imports only {@code java.*}, Commons Math and {@code common}, {@code units},
 * {@code thermo}, {@code thermo.mix} and {@code vessel}.
 */
package org.ventcase.inventory;
