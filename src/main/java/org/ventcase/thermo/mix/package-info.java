/**
 * Mixtures with a cubic equation of state: binary interaction parameters ({@link
 * org.ventcase.thermo.mix.KijTable}), tangent-plane stability ({@link
 * org.ventcase.thermo.mix.StabilityAnalysis}), Rachford-Rice ({@link
 * org.ventcase.thermo.mix.RachfordRice}), PT flash ({@link org.ventcase.thermo.mix.PTFlash}),
 * bubble and dew points ({@link org.ventcase.thermo.mix.SaturationPoints}), PH and PS flashes
 * ({@link org.ventcase.thermo.mix.StateFlash}), phase envelopes ({@link
 * org.ventcase.thermo.mix.PhaseEnvelope}) and single-phase labels ({@link
 * org.ventcase.thermo.mix.SinglePhaseLabel}). Uses only the public API of
 * {@link org.ventcase.thermo.CubicModel}. Everything is SI: K, Pa absolute, J/mol, mole fractions.
 * Solvers are stateless and thread-safe.
 */
package org.ventcase.thermo.mix;
