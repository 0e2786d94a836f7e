/**
 * The marks of the sections in the bottom bar: simple line drawings of our own on a 24-unit grid, drawn
 * in the colour of the label beside them.
 */
import Svg, { Circle, Line, Path, Rect } from 'react-native-svg';
import type { SectionKey } from './sections';

export type IconKey = SectionKey | 'more';

interface IconProps {
  name: IconKey;
  color: string;
  size?: number;
}

export function SectionIcon({ name, color, size = 24 }: IconProps) {
  const line = { stroke: color, strokeWidth: 1.7, strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const, fill: 'none' };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" aria-hidden testID={`icon-${name}`}>
      {name === 'library' ? (
        // Three volumes on a shelf, the last leaning.
        <>
          <Rect x={3.5} y={4} width={4} height={16} rx={0.6} {...line} />
          <Rect x={9} y={6} width={4} height={14} rx={0.6} {...line} />
          <Path d="M14.6 7.4 L18.4 6.3 L21.6 18.6 L17.8 19.7 Z" {...line} />
          <Line x1={2.5} y1={20.5} x2={21.5} y2={20.5} {...line} />
        </>
      ) : null}
      {name === 'check' ? (
        // A page of claims under a reading glass.
        <>
          <Path d="M14 3.5 H5.5 V20.5 H11" {...line} />
          <Line x1={8} y1={8} x2={13} y2={8} {...line} />
          <Line x1={8} y1={11.5} x2={11} y2={11.5} {...line} />
          <Circle cx={15.5} cy={14.5} r={4} {...line} />
          <Line x1={18.5} y1={17.5} x2={21} y2={20} {...line} />
        </>
      ) : null}
      {name === 'checks' ? (
        // A beam on a fulcrum with a pan at each end: the kit of checks.
        <>
          <Line x1={12} y1={5} x2={12} y2={19} {...line} />
          <Line x1={4} y1={7} x2={20} y2={7} {...line} />
          <Path d="M4 7 L1.8 13 H6.2 Z" {...line} />
          <Path d="M20 7 L17.8 13 H22.2 Z" {...line} />
          <Line x1={8} y1={19.5} x2={16} y2={19.5} {...line} />
        </>
      ) : null}
      {name === 'desk' ? (
        // A pen over a line of writing.
        <>
          <Path d="M5 16.5 L15.8 5.7 L18.3 8.2 L7.5 19 L4.5 19.5 Z" {...line} />
          <Line x1={13.8} y1={7.7} x2={16.3} y2={10.2} {...line} />
          <Line x1={12} y1={20} x2={20} y2={20} {...line} />
        </>
      ) : null}
      {name === 'queue' ? (
        // Items waiting in a stack of trays.
        <>
          <Rect x={4} y={4} width={16} height={4} rx={1} {...line} />
          <Rect x={4} y={10} width={16} height={4} rx={1} {...line} />
          <Rect x={4} y={16} width={16} height={4} rx={1} {...line} />
        </>
      ) : null}
      {name === 'admin' ? (
        // Three sliders: the settings of the place.
        <>
          <Line x1={4} y1={6} x2={20} y2={6} {...line} />
          <Line x1={4} y1={12} x2={20} y2={12} {...line} />
          <Line x1={4} y1={18} x2={20} y2={18} {...line} />
          <Circle cx={9} cy={6} r={2} {...line} fill={color} />
          <Circle cx={15} cy={12} r={2} {...line} fill={color} />
          <Circle cx={7} cy={18} r={2} {...line} fill={color} />
        </>
      ) : null}
      {name === 'account' ? (
        // A head and shoulders.
        <>
          <Circle cx={12} cy={8.5} r={3.8} {...line} />
          <Path d="M4.5 20 C5.5 15.5 8.5 13.8 12 13.8 C15.5 13.8 18.5 15.5 19.5 20" {...line} />
        </>
      ) : null}
      {name === 'more' ? (
        // Three dots: the other sections.
        <>
          <Circle cx={5.5} cy={12} r={1.6} {...line} fill={color} />
          <Circle cx={12} cy={12} r={1.6} {...line} fill={color} />
          <Circle cx={18.5} cy={12} r={1.6} {...line} fill={color} />
        </>
      ) : null}
    </Svg>
  );
}
