/**
 * Relief scenarios and their loads: relieving pressure from MAWP and the allowable accumulation,
 * wetted-vessel fire heat input with environment factors, the near-critical latent-heat guard, and
 * the scenario cases built on the equation of state: wetted fire for a pure fluid
 * ({@link org.ventcase.relief.WettedFire}) and a mixture ({@link org.ventcase.relief.MixtureFire}),
 * boil-off of a multicomponent liquid ({@link org.ventcase.relief.BoilOff}), near-critical or
 * supercritical contents ({@link org.ventcase.relief.NearCriticalFire}), gas-filled vessel fire
 * ({@link org.ventcase.relief.GasFilledFire}), blocked outlet
 * ({@link org.ventcase.relief.BlockedOutlet}) and thermal expansion of a blocked-in liquid
 * ({@link org.ventcase.relief.ThermalRelief}); each reports the relieved fluid's properties
 * ({@link org.ventcase.relief.RelievedFluid}) and, where relevant, the temperature after
 * isenthalpic expansion to the back pressure ({@link org.ventcase.relief.IsenthalpicExpansion}).
 *
 * <p>SI inside (Pa absolute unless a name says gauge, K, kg/s, m2, W, kg/kmol); the standards'
 * customary-unit equations are evaluated inside each class with the conversion stated. Imports
 * only {@code java.*}, Commons Math and the lower domain packages (common, units, thermo,
 * thermo.mix, vessel, device); no printing, no I/O besides class-path resources.
 *
 * <p>Sources are API Std 520 Part I, API Std 521 / ISO 23251, ASME BPVC VIII-1 and NFPA 30 /
 * API Std 2000, as summarised and status-tagged in the project's REFERENCES.md.
 */
package org.ventcase.relief;
