/**
 * Vessel geometry, no thermodynamics: horizontal and vertical cylinders with flat, hemispherical,
 * ellipsoidal, torispherical or conical heads, and spheres. For a liquid level measured from the
 * lowest inside point it gives the liquid and vapour volumes, the wetted inside area, the inverse
 * level from volume, and the fire-exposed wetted area of API Std 521 / ISO 23251.
 *
 * <p>Entry points: {@link org.ventcase.vessel.Vessel} (factories {@code horizontal},
 * {@code vertical}, {@code sphere}), {@link org.ventcase.vessel.Head},
 * {@link org.ventcase.vessel.Level}, {@link org.ventcase.vessel.FireExposure} and
 * {@link org.ventcase.vessel.FireExposedArea}.
 *
 * <p>Methods: closed forms of solids and surfaces of revolution wherever they exist (circular
 * segments, spherical caps and zones, tori, spheroids, cones); adaptive Gauss-Legendre quadrature
 * (Commons Math, relative accuracy 1e-12) for the partial volume and wetted area of torispherical
 * and conical heads, and the partial wetted area of ellipsoidal heads, on horizontal vessels.
 * SI throughout (m, m2, m3). Imports only {@code java.*}, Commons Math and
 * {@code org.ventcase.common}.
 */
package org.ventcase.vessel;
