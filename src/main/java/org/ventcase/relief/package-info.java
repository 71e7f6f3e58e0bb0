/**
 * Relief scenarios and their loads as pure formulas: relieving pressure from MAWP and the
 * allowable accumulation, wetted-vessel fire heat input with environment factors, gas-filled
 * vessel fire, hydraulic (thermal) expansion and the near-critical latent-heat guard. SI inside
 * (Pa absolute unless a name says gauge, K, kg/s, m2, W, kg/kmol); the standards' customary-unit
 * equations are evaluated inside each class with the conversion stated. No thermodynamics and no
 * I/O besides the class-path resources. Imports only {@code java.*}, {@code org.ventcase.common}
 * and {@code org.ventcase.units}.
 *
 * <p>Sources are API Std 520 Part I, API Std 521 / ISO 23251, ASME BPVC VIII-1 and NFPA 30 /
 * API Std 2000, as summarised and status-tagged in the project's REFERENCES.md.
 */
package org.ventcase.relief;
