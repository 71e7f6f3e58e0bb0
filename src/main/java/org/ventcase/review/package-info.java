/**
 * The reviewer's cross-check of a relief basis someone else prepared: claimed values
 * ({@link org.ventcase.review.ClaimedValues}) are compared with Ventcase's own calculation of the
 * same case ({@link org.ventcase.review.Review#run}), quantity by quantity, with a tolerance per
 * quantity, a verdict (agrees / check / disagrees), cause hints for each difference and the range
 * the result takes between equations of state and density bases. A domain package: no JSON, no
 * printing, no PDF; it returns a {@link org.ventcase.review.ReviewResult} that the command line,
 * the review PDF and a user interface show.
 */
package org.ventcase.review;
