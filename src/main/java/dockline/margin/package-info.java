/**
 * Margins of a mission: the highest reserve floor and the lowest starting charge that can still be
 * guaranteed, by bisection over the threshold solver and by the charging route's minimum-credit pass
 * (both figures from one pass; the key and column keep the name "fixpoint": it computes the least
 * fixpoint of the same equations), plus the smallest changes that make a mission guaranteed.
 * Entry points: {@link dockline.margin.Margins#compute} and {@link dockline.margin.Suggestions#find}.
 */
package dockline.margin;
