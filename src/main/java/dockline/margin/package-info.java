/**
 * Margins of a mission: the highest reserve floor and the lowest starting charge that can still be
 * guaranteed, by bisection over the threshold solver and by a minimum-credit fixpoint over energy
 * levels, plus the smallest changes that make a mission guaranteed.
 * Entry points: {@link dockline.margin.Margins#compute} and {@link dockline.margin.Suggestions#find}.
 */
package dockline.margin;
