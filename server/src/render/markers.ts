/** Marker outlines as path data, so shape (not only colour) tells series apart. */
import { px } from './svgText';

export type MarkerShape = 'circle' | 'up' | 'down' | 'diamond' | 'square';

export function markerPath(shape: MarkerShape, x: number, y: number, r: number): string {
  switch (shape) {
    case 'up':
      return `M${px(x)},${px(y - r)}L${px(x + r)},${px(y + r * 0.8)}H${px(x - r)}Z`;
    case 'down':
      return `M${px(x)},${px(y + r)}L${px(x + r)},${px(y - r * 0.8)}H${px(x - r)}Z`;
    case 'diamond':
      return `M${px(x)},${px(y - r)}L${px(x + r)},${px(y)}L${px(x)},${px(y + r)}L${px(x - r)},${px(y)}Z`;
    case 'square':
      return `M${px(x - r * 0.8)},${px(y - r * 0.8)}h${px(r * 1.6)}v${px(r * 1.6)}h${px(-r * 1.6)}Z`;
    default:
      // Two arcs make a circle in path form.
      return `M${px(x - r)},${px(y)}a${px(r)},${px(r)} 0 1,0 ${px(2 * r)},0a${px(r)},${px(r)} 0 1,0 ${px(-2 * r)},0Z`;
  }
}
