package dockline.report;

import java.util.List;

/**
 * The battery chart of one run as a standalone SVG document (drawn here, no library): the level at each
 * step as a line, the reserve floor as a dashed red line, the capacity as the top of the chart, and the
 * lowest level marked. The levels are whole energy units; the axis is labelled in Wh.
 *
 * <p>Cost: O(steps).
 */
final class BatterySvg {

    static final int WIDTH = 720;
    static final int HEIGHT = 240;
    private static final int LEFT = 64;
    private static final int RIGHT = 16;
    private static final int TOP = 16;
    private static final int BOTTOM = 40;

    private BatterySvg() {
    }

    /**
     * The chart.
     *
     * @param levels        battery level per step (units), start first; at least one
     * @param capacityUnits the top of the chart
     * @param floorUnits    the reserve floor
     * @param wh            formats units as Wh
     * @param loopStart     first step of a repeating loop, or -1
     */
    static String svg(List<Integer> levels, int capacityUnits, int floorUnits, java.util.function.IntFunction<String> wh,
                      int loopStart) {
        int n = levels.size();
        int top = Math.max(1, Math.max(capacityUnits, levels.stream().mapToInt(Integer::intValue).max().orElse(1)));
        double w = WIDTH - LEFT - RIGHT;
        double h = HEIGHT - TOP - BOTTOM;
        StringBuilder sb = new StringBuilder();
        sb.append("<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"").append(WIDTH).append("\" height=\"")
                .append(HEIGHT).append("\" viewBox=\"0 0 ").append(WIDTH).append(' ').append(HEIGHT)
                .append("\" font-family=\"sans-serif\" font-size=\"11\">");
        sb.append("<rect x=\"0\" y=\"0\" width=\"").append(WIDTH).append("\" height=\"").append(HEIGHT)
                .append("\" fill=\"#ffffff\"/>");
        sb.append("<rect x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"").append(fmt(w))
                .append("\" height=\"").append(fmt(h)).append("\" fill=\"#f7f6f2\" stroke=\"#999999\"/>");
        // grid and labels at 0, 25, 50, 75, 100 % of the top
        for (int i = 0; i <= 4; i++) {
            int u = (int) ((long) top * i / 4);
            double y = TOP + h - h * u / top;
            sb.append("<line x1=\"").append(LEFT).append("\" x2=\"").append(fmt(LEFT + w)).append("\" y1=\"")
                    .append(fmt(y)).append("\" y2=\"").append(fmt(y)).append("\" stroke=\"#dddddd\"/>");
            sb.append("<text x=\"").append(LEFT - 4).append("\" y=\"").append(fmt(y + 4))
                    .append("\" text-anchor=\"end\">").append(Html.escape(wh.apply(u))).append("</text>");
        }
        double fy = TOP + h - h * floorUnits / top;
        if (loopStart >= 0 && n > 1) {
            double lx = LEFT + w * loopStart / (n - 1);
            sb.append("<rect x=\"").append(fmt(lx)).append("\" y=\"").append(TOP).append("\" width=\"")
                    .append(fmt(LEFT + w - lx)).append("\" height=\"").append(fmt(h))
                    .append("\" fill=\"#e4ecf7\" opacity=\"0.7\"/>");
            sb.append("<text x=\"").append(fmt(lx + 4)).append("\" y=\"").append(TOP + 12)
                    .append("\">loop (repeats)</text>");
        }
        sb.append("<line x1=\"").append(LEFT).append("\" x2=\"").append(fmt(LEFT + w)).append("\" y1=\"").append(fmt(fy))
                .append("\" y2=\"").append(fmt(fy)).append("\" stroke=\"#c0392b\" stroke-width=\"1.5\""
                        + " stroke-dasharray=\"6 4\"/>");
        sb.append("<text x=\"").append(fmt(LEFT + w - 4)).append("\" y=\"").append(fmt(fy - 4))
                .append("\" text-anchor=\"end\" fill=\"#c0392b\">reserve floor ").append(Html.escape(wh.apply(floorUnits)))
                .append("</text>");
        StringBuilder pts = new StringBuilder();
        int min = Integer.MAX_VALUE;
        int minAt = 0;
        for (int i = 0; i < n; i++) {
            double x = n == 1 ? LEFT + w / 2 : LEFT + w * i / (n - 1);
            double y = TOP + h - h * levels.get(i) / top;
            pts.append(pts.length() == 0 ? "" : " ").append(fmt(x)).append(',').append(fmt(y));
            if (levels.get(i) < min) {
                min = levels.get(i);
                minAt = i;
            }
        }
        sb.append("<polyline points=\"").append(pts).append("\" fill=\"none\" stroke=\"#1f5f8b\" stroke-width=\"2\"/>");
        double mx = n == 1 ? LEFT + w / 2 : LEFT + w * minAt / (n - 1);
        double my = TOP + h - h * min / top;
        sb.append("<circle cx=\"").append(fmt(mx)).append("\" cy=\"").append(fmt(my))
                .append("\" r=\"4\" fill=\"#1f5f8b\"/>");
        sb.append("<text x=\"").append(fmt(Math.min(mx + 6, LEFT + w - 120))).append("\" y=\"").append(fmt(my + 14))
                .append("\">lowest ").append(Html.escape(wh.apply(min))).append(" (step ").append(minAt).append(")</text>");
        sb.append("<text x=\"").append(fmt(LEFT + w / 2)).append("\" y=\"").append(HEIGHT - 10)
                .append("\" text-anchor=\"middle\">step (0 to ").append(n - 1).append(")</text>");
        sb.append("</svg>");
        return sb.toString();
    }

    private static String fmt(double v) {
        return String.format(java.util.Locale.ROOT, "%.1f", v);
    }
}
