/**
 * chart.js with only the parts the app's line charts use registered, plus one small plugin of ours that
 * writes a label at the right-hand end of a line (the notch number on the effort chart). Loaded on demand:
 * in the chart worker, or on the page where a canvas cannot be handed to a worker.
 */
import { Chart, Filler, LinearScale, LineController, LineElement, PointElement, type Plugin } from "chart.js";

/** Draws `dataset.endLabel` just right of each line's last point. */
const endLabels: Plugin<"line"> = {
  id: "tautEndLabels",
  afterDatasetsDraw(chart) {
    const ctx = chart.ctx;
    chart.data.datasets.forEach((ds, i) => {
      const label = (ds as { endLabel?: string }).endLabel;
      if (!label || !chart.isDatasetVisible(i)) return;
      const last = chart.getDatasetMeta(i).data.at(-1);
      if (!last) return;
      ctx.save();
      ctx.fillStyle = String(ds.borderColor);
      ctx.font = "bold 13px system-ui, sans-serif";
      ctx.textBaseline = "middle";
      ctx.fillText(label, last.x + 5, last.y);
      ctx.restore();
    });
  },
};

Chart.register(LineController, LineElement, PointElement, LinearScale, Filler, endLabels);

export { Chart };
