/**
 * The case pipeline in domain terms: a {@link org.ventcase.calc.CaseInput} (domain objects only,
 * built by the case-file layer from a validated case) goes through
 * {@link org.ventcase.calc.CaseCalculation#run} to a {@link org.ventcase.calc.CaseResult}: vessel at
 * its level and inventory once, every scenario by its relief class, API 520 sizing, API 526
 * orifices, the governing scenario, warnings tagged with their scenarios, and every trace step.
 * Thin orchestration: the numerics live in relief, inventory, device and thermo.
 */
package org.ventcase.calc;
