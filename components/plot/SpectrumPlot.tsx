import { useMemo, useState } from 'react';
import { StyleSheet, Text, View, type GestureResponderEvent, type LayoutChangeEvent } from 'react-native';
import Svg, { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { useTheme } from '../../hooks/useTheme';
import type { ThemeColours } from '../../constants/theme';
import { Button } from '../ui/Button';
import { decimate, niceTicks, tickDecimals, xExtent, yExtent, type Range } from './plotMath';

export interface PlotTrace {
  key: string;
  label: string;
  colour: keyof ThemeColours;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  width?: number;
  dashed?: boolean;
}

export interface SpectrumPlotProps {
  traces: PlotTrace[];
  /** Accessible name of the plot. */
  label: string;
  height?: number;
  /** ppm span of the whole view (default: the traces' own extent), e.g. to draw two entries alike. */
  domain?: Range | null;
}

const PAD = { left: 8, right: 8, top: 8, bottom: 26 };

/**
 * Our spectrum drawing: ppm decreasing to the right as spectra are drawn in the trade; drag across
 * the plot to zoom into a region, "Whole spectrum" to go back.
 */
export function SpectrumPlot({ traces, label, height = 260, domain = null }: SpectrumPlotProps) {
  const t = useTheme();
  const [width, setWidth] = useState(0);
  const full = useMemo(() => domain ?? xExtent(traces.map((tr) => tr.x)), [traces, domain]);
  const [zoom, setZoom] = useState<Range | null>(null);
  const [drag, setDrag] = useState<{ a: number; b: number } | null>(null);
  const range = zoom ?? full;
  const plotW = Math.max(0, width - PAD.left - PAD.right);
  const plotH = height - PAD.top - PAD.bottom;

  const drawn = useMemo(() => {
    if (!range || plotW <= 0) return null;
    const yr = yExtent(traces, range);
    const yPx = (v: number) => PAD.top + plotH - ((v - yr.lo) / (yr.hi - yr.lo)) * plotH;
    const paths = traces.map((tr) => {
      const pts = decimate(tr.x, tr.y, range, plotW);
      let d = '';
      pts.forEach(([px, v], i) => (d += `${i ? 'L' : 'M'}${(PAD.left + px).toFixed(1)} ${yPx(v).toFixed(1)}`));
      return { tr, d };
    });
    const ticks = niceTicks(range.lo, range.hi, Math.max(2, Math.round(plotW / 70)));
    return { paths, ticks, decimals: tickDecimals(ticks), zeroY: yPx(0) };
  }, [traces, range, plotW, plotH]);

  const toPpm = (px: number) => (range ? range.hi - ((px - PAD.left) / plotW) * (range.hi - range.lo) : 0);
  const clampX = (e: GestureResponderEvent) => Math.min(PAD.left + plotW, Math.max(PAD.left, e.nativeEvent.locationX));

  const onRelease = () => {
    if (drag && Math.abs(drag.b - drag.a) > 6) {
      const p1 = toPpm(drag.a);
      const p2 = toPpm(drag.b);
      setZoom({ lo: Math.min(p1, p2), hi: Math.max(p1, p2) });
    }
    setDrag(null);
  };

  return (
    <View style={styles.wrap}>
      <View
        accessibilityRole="image"
        accessibilityLabel={label}
        style={[styles.plot, { height, backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.md }]}
        onLayout={(e: LayoutChangeEvent) => setWidth(e.nativeEvent.layout.width)}
      >
        {drawn && range ? (
          <Svg width={width} height={height}>
            <Line x1={PAD.left} x2={PAD.left + plotW} y1={drawn.zeroY} y2={drawn.zeroY} stroke={t.colours.border} strokeWidth={1} />
            {drawn.paths.map(({ tr, d }) => (
              <Path key={tr.key} d={d} stroke={t.colours[tr.colour]} strokeWidth={tr.width ?? 1.2} fill="none" strokeDasharray={tr.dashed ? '4 3' : undefined} />
            ))}
            <G>
              <Line x1={PAD.left} x2={PAD.left + plotW} y1={PAD.top + plotH} y2={PAD.top + plotH} stroke={t.colours.textMuted} strokeWidth={1} />
              {drawn.ticks.map((v) => {
                const x = PAD.left + ((range.hi - v) / (range.hi - range.lo)) * plotW;
                return (
                  <G key={v}>
                    <Line x1={x} x2={x} y1={PAD.top + plotH} y2={PAD.top + plotH + 4} stroke={t.colours.textMuted} />
                    <SvgText x={x} y={PAD.top + plotH + 17} fontSize={11} fill={t.colours.textMuted} textAnchor="middle">
                      {v.toFixed(drawn.decimals)}
                    </SvgText>
                  </G>
                );
              })}
            </G>
            {drag ? <Rect x={Math.min(drag.a, drag.b)} y={PAD.top} width={Math.abs(drag.b - drag.a)} height={plotH} fill={t.colours.plotSelect} /> : null}
          </Svg>
        ) : null}
        <View
          style={StyleSheet.absoluteFill}
          onStartShouldSetResponder={() => true}
          onMoveShouldSetResponder={() => true}
          onResponderGrant={(e) => {
            const x = clampX(e);
            setDrag({ a: x, b: x });
          }}
          onResponderMove={(e) => {
            const x = clampX(e);
            setDrag((d) => (d ? { ...d, b: x } : d));
          }}
          onResponderRelease={onRelease}
          onResponderTerminate={() => setDrag(null)}
        />
      </View>
      <View style={styles.row}>
        <Text accessibilityLabel="Visible range" style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
          {range ? `δ ${range.hi.toFixed(2)} → ${range.lo.toFixed(2)} ppm` : 'nothing to draw'}
          {zoom ? '' : ' · drag across the plot to zoom'}
        </Text>
        {zoom ? <Button label="Whole spectrum" variant="quiet" onPress={() => setZoom(null)} /> : null}
      </View>
      <View style={styles.legend}>
        {traces.map((tr) => (
          <View key={tr.key} style={styles.legendItem}>
            <View style={[styles.swatch, { backgroundColor: t.colours[tr.colour] }]} />
            <Text numberOfLines={1} style={[styles.small, { color: t.colours.text, fontFamily: t.fonts.regular }]}>
              {tr.label}
            </Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 6, width: '100%' },
  plot: { width: '100%', borderWidth: 1, overflow: 'hidden', cursor: 'crosshair' } as never,
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: 8 },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: 10 },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: 5, maxWidth: '100%' },
  swatch: { width: 12, height: 3, borderRadius: 1 },
  small: { fontSize: 12 },
});
