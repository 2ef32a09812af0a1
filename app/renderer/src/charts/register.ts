/** Registers exactly the Chart.js parts the plots use (tree-shaken build). */
import {
  Chart,
  Filler,
  LinearScale,
  LineController,
  LineElement,
  LogarithmicScale,
  PointElement,
  ScatterController,
  Tooltip,
} from 'chart.js';

let done = false;

export function registerChartParts(): void {
  if (done) return;
  Chart.register(
    ScatterController,
    LineController,
    PointElement,
    LineElement,
    LinearScale,
    LogarithmicScale,
    Filler,
    Tooltip,
  );
  done = true;
}
