/**
 * Pressure-relief device sizing as pure formulas: required effective area for gas and vapour
 * (critical and subcritical flow) and for liquid (with the iterative viscosity correction) by
 * API Std 520 Part I, and the standard effective orifice areas D..T of API Std 526 with orifice
 * selection and rated capacity. Inputs and results are records in SI (Pa absolute, K, kg/s,
 * m3/s, m2, kg/kmol); each class converts to the standard's units inside, with the conversion
 * stated, and returns a trace of the substituted values. Imports only {@code java.*},
 * {@code org.ventcase.common} and {@code org.ventcase.units}.
 */
package org.ventcase.device;
