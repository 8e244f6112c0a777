import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  Tooltip,
} from 'chart.js';

/**
 * Registers only the Chart.js parts the result panels draw (bar and line charts on category and
 * linear axes, with tooltips and a legend), so the bundle carries no unused chart types.
 * Import this module from a panel before rendering a react-chartjs-2 chart; it is idempotent.
 */
Chart.register(
  BarController,
  BarElement,
  LineController,
  LineElement,
  PointElement,
  CategoryScale,
  LinearScale,
  Tooltip,
  Legend,
);

export { Chart };
