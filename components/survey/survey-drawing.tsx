import { useEffect, useMemo, useRef, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, G, Line, Polygon, Polyline, Rect, Text as SvgText } from 'react-native-svg';
import type { SurveyView } from '@/db/requests/survey';
import { colors, fonts, space } from '@/constants/theme';
import type { SurveyCheck } from '@/generators/survey/types';
import { flagLabel, type DrawingMarks, type Highlight, type Selection } from './drawing-marks';
import { shortLabel } from './format';
import { Button } from '@/components/ui/button';

type Props = { view: SurveyView; marks: DrawingMarks; highlight: Highlight; onSelect: (s: Selection) => void; width: number };

const NODE_R = 12;

type Point = { x: number; y: number };

/**
 * The network as drawn by layoutSurvey: runs with their lengths, points by kind, terminators. A flagged
 * run or point (named by an error or a warning) is dashed, carries a "!" badge and the check's slug;
 * checks on the network as a whole are flagged in a row above, outside the sideways scroll. Pressing a part selects it.
 */
export function SurveyDrawing({ view, marks, highlight, onSelect, width }: Props) {
  const pos = useMemo(() => new Map(view.drawing.nodes.map((n) => [n.id, { x: n.x, y: n.y }])), [view.drawing]);
  const size = { w: Math.max(view.drawing.size.width, 420), h: view.drawing.size.height + 30 };
  // Full size keeps the labels readable and scrolls sideways; "whole network" shrinks it to fit.
  const [whole, setWhole] = useState(false);
  const fit = Math.min(1, width / size.w);
  const scale = whole ? fit : Math.max(0.85, fit);
  const scroller = useRef<ScrollView>(null);

  // Bring the highlighted parts into view when a check is chosen, and the flagged ones at first.
  useEffect(() => {
    const runs = highlight.runs.size + highlight.nodes.size > 0 ? highlight.runs : new Set(marks.runs.keys());
    const nodes = highlight.runs.size + highlight.nodes.size > 0 ? highlight.nodes : new Set(marks.nodes.keys());
    const xs = [...nodes].map((id) => pos.get(id)?.x)
      .concat([...runs].map((ref) => runMid(view, pos, ref)?.x))
      .filter((x): x is number => x !== undefined);
    if (xs.length === 0) return;
    // After layout: a scroll asked for before the content is measured is lost.
    const timer = setTimeout(() => scroller.current?.scrollTo({ x: Math.max(0, Math.min(...xs) * scale - 80), animated: true }), 60);
    return () => clearTimeout(timer);
  }, [highlight, marks, pos, scale, view]);

  return (
    <View style={styles.wrap} testID="survey-drawing">
      {fit < 0.85 ? (
        <View style={styles.bar}>
          <Button compact variant="secondary" label={whole ? 'Full size' : 'Whole network'} testID="survey-drawing-fit" onPress={() => setWhole(!whole)} />
          <Text style={styles.legendItem}>{whole ? 'Shrunk to fit.' : 'Scroll sideways to see the whole network.'}</Text>
        </View>
      ) : null}
      {marks.networkWide.length > 0 ? (
        <View style={styles.bar}>
          {marks.networkWide.map((f) => (
            <NetworkFlag key={f.index} check={f.check} selected={highlight.checks.has(f.index)} onPress={() => onSelect({ kind: 'check', index: f.index })} />
          ))}
        </View>
      ) : null}
      <ScrollView horizontal ref={scroller} contentContainerStyle={{ width: size.w * scale }}>
        <Svg width={size.w * scale} height={size.h * scale} viewBox={`0 0 ${size.w} ${size.h}`} accessibilityLabel="Drawing of the network">
          <Rect x={0} y={0} width={size.w} height={size.h} fill={colors.surface} />
          {view.input.runs.map((r) => {
            const a = pos.get(r.from);
            const b = pos.get(r.to);
            if (!a || !b) return null;
            return <RunMark key={r.id} id={r.id} a={a} b={b} lengthFt={r.lengthFt} cord={view.result.runs.find((x) => x.runId === r.id)?.kind === 'cord'} flags={marks.runs.get(r.id)} selected={highlight.runs.has(r.id)} onPress={() => onSelect({ kind: 'run', ref: r.id })} />;
          })}
          {view.input.nodes.map((n) => {
            const p = pos.get(n.id);
            if (!p) return null;
            const terminators = view.input.terminators.filter((t) => t.nodeId === n.id);
            return <NodeMark key={n.id} id={n.id} kind={n.kind} label={n.label} p={p} terminators={terminators.map((t) => t.ohms)} flags={marks.nodes.get(n.id)} selected={highlight.nodes.has(n.id)} onPress={() => onSelect({ kind: 'node', ref: n.id })} />;
          })}
          <Badges view={view} marks={marks} pos={pos} onSelect={onSelect} />
        </Svg>
      </ScrollView>
      <Legend />
    </View>
  );
}

function runMid(view: SurveyView, pos: Map<string, Point>, ref: string): Point | undefined {
  const r = view.input.runs.find((x) => x.id === ref);
  const a = r && pos.get(r.from);
  const b = r && pos.get(r.to);
  return a && b ? { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } : undefined;
}

/** Drawn last, so no line crosses a badge: a run's badge names its check, a point's is the "!" alone (its own label names it). */
function Badges({ view, marks, pos, onSelect }: { view: SurveyView; marks: DrawingMarks; pos: Map<string, Point>; onSelect: (s: Selection) => void }) {
  return (
    <G>
      {view.input.runs.map((r) => {
        const flags = marks.runs.get(r.id);
        const a = pos.get(r.from);
        const b = pos.get(r.to);
        if (!flags || !a || !b) return null;
        const { mid, lx } = labelSpot(a, b, `${r.lengthFt} ft`);
        return (
          <G key={r.id} onPress={() => onSelect({ kind: 'run', ref: r.id })}>
            <Badge x={lx + 9} y={mid.y - 20} text={flagLabel(flags)} testID={`drawing-flag-run-${r.id}`} />
          </G>
        );
      })}
      {[...marks.nodes.keys()].map((id) => {
        const p = pos.get(id);
        return p ? <Badge key={id} x={p.x - NODE_R - 6} y={p.y - NODE_R} text="" testID={`drawing-flag-node-${id}`} /> : null;
      })}
    </G>
  );
}

function Badge({ x, y, text, testID }: { x: number; y: number; text: string; testID: string }) {
  const w = 18 + text.length * 6.8;
  return (
    <G testID={testID}>
      {text ? <Rect x={x - 9} y={y - 9} width={w} height={18} rx={9} fill={colors.dangerSoft} stroke={colors.danger} strokeWidth={1} /> : null}
      <Circle cx={x} cy={y} r={7} fill={colors.danger} />
      <SvgText x={x} y={y + 4} fontSize={11} fontFamily={fonts.bold} fill={colors.primaryText} textAnchor="middle">
        !
      </SvgText>
      <SvgText x={x + 11} y={y + 4} fontSize={12} fontFamily={fonts.semibold} fill={colors.danger}>
        {text}
      </SvgText>
    </G>
  );
}

/** Where a run's length label goes: 70% of the way to the lower end, where runs fanning out of a hub are
 * apart; beside a vertical cord, on a slanted wall run. */
function labelSpot(a: Point, b: Point, text: string) {
  const [top, low] = a.y <= b.y ? [a, b] : [b, a];
  const mid = { x: top.x + (low.x - top.x) * 0.7, y: top.y + (low.y - top.y) * 0.7 };
  const tw = text.length * 7 + 8;
  return { mid, tw, lx: a.x === b.x ? mid.x + 6 : mid.x - tw / 2 };
}

function RunMark({ id, a, b, lengthFt, cord, flags, selected, onPress }: {
  id: string; a: Point; b: Point; lengthFt: number; cord: boolean; flags?: SurveyCheck[]; selected: boolean; onPress: () => void;
}) {
  const flagged = !!flags;
  const text = `${lengthFt} ft`;
  const { mid, tw, lx } = labelSpot(a, b, text);
  return (
    <G testID={`drawing-run-${id}`} dataSet={{ flagged: String(flagged), selected: String(selected) }} onPress={onPress} aria-label={`Run ${id}, ${text}${flagged ? `, flagged: ${flags!.map((c) => c.slug).join(', ')}` : ''}`}>
      {selected ? <Line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke={colors.focus} strokeOpacity={0.4} strokeWidth={12} strokeLinecap="round" /> : null}
      <Line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke="transparent" strokeWidth={14} />
      <Line
        x1={a.x} y1={a.y} x2={b.x} y2={b.y}
        stroke={flagged ? colors.danger : cord ? colors.borderStrong : colors.primary}
        strokeWidth={flagged ? 3 : cord ? 1.5 : 2.5}
        strokeDasharray={flagged ? '9 5' : undefined}
      />
      <Rect x={lx} y={mid.y - 8} width={tw} height={16} rx={3} fill={colors.surface} opacity={0.9} />
      <SvgText x={lx + 4} y={mid.y + 4} fontSize={12} fontFamily={selected || flagged ? fonts.bold : fonts.regular} fill={flagged ? colors.danger : colors.text}>
        {text}
      </SvgText>
    </G>
  );
}

function Shape({ kind, p, flagged }: { kind: string; p: Point; flagged: boolean }) {
  const stroke = flagged ? colors.danger : colors.primary;
  const common = { stroke, strokeWidth: flagged ? 2.5 : 2, strokeDasharray: flagged ? '4 3' : undefined };
  if (kind === 'block') return <Rect x={p.x - NODE_R} y={p.y - NODE_R} width={NODE_R * 2} height={NODE_R * 2} fill={colors.primary} {...common} />;
  if (kind === 'splitter') return <Polygon points={`${p.x},${p.y - NODE_R} ${p.x + NODE_R},${p.y} ${p.x},${p.y + NODE_R} ${p.x - NODE_R},${p.y}`} fill={colors.primarySoft} {...common} />;
  if (kind === 'adapter') return <Circle cx={p.x} cy={p.y} r={NODE_R - 1} fill={colors.surface} {...common} />;
  return <Rect x={p.x - NODE_R} y={p.y - NODE_R + 2} width={NODE_R * 2} height={NODE_R * 2 - 4} rx={4} fill={colors.primarySoft} {...common} />;
}

function NodeMark({ id, kind, label, p, terminators, flags, selected, onPress }: {
  id: string; kind: string; label: string; p: Point; terminators: number[]; flags?: SurveyCheck[]; selected: boolean; onPress: () => void;
}) {
  const flagged = !!flags;
  return (
    <G testID={`drawing-node-${id}`} dataSet={{ flagged: String(flagged), selected: String(selected) }} onPress={onPress} aria-label={`${label}${flagged ? `, flagged: ${flags!.map((c) => c.slug).join(', ')}` : ''}`}>
      {selected ? <Circle cx={p.x} cy={p.y} r={NODE_R + 9} fill={colors.focus} fillOpacity={0.3} /> : null}
      <Shape kind={kind} p={p} flagged={flagged} />
      <Rect x={p.x - 56} y={p.y + NODE_R + 2} width={112} height={16} fill={colors.surface} opacity={0.85} />
      <SvgText x={p.x} y={p.y + NODE_R + 14} fontSize={12} fontFamily={selected ? fonts.bold : fonts.regular} fill={colors.text} textAnchor="middle">
        {shortLabel(label, 15)}
      </SvgText>
      {terminators.map((ohms, i) => (
        <G key={i} testID={`drawing-terminator-${id}`}>
          <Polyline points={resistor(p.x + NODE_R + 2, p.y - 4 + i * 14)} fill="none" stroke={colors.success} strokeWidth={1.6} />
          <SvgText x={p.x + NODE_R + 26} y={p.y + i * 14} fontSize={12} fontFamily={fonts.semibold} fill={colors.success}>
            {`${ohms} Ω`}
          </SvgText>
        </G>
      ))}
    </G>
  );
}

/** A resistor's zigzag, 22 px wide, starting at (x, y). */
function resistor(x: number, y: number): string {
  const pts = [[0, 0], [4, 0], [6, -3], [9, 3], [12, -3], [15, 3], [18, 0], [22, 0]];
  return pts.map(([dx, dy]) => `${x + dx},${y + dy}`).join(' ');
}

/** A check on the network as a whole (no part to put it on): flagged above the drawing, never scrolled away. */
function NetworkFlag({ check, selected, onPress }: { check: SurveyCheck; selected: boolean; onPress: () => void }) {
  return (
    <Pressable
      accessibilityRole="button"
      aria-pressed={selected}
      accessibilityLabel={`Flagged for the whole network: ${check.slug}`}
      testID={`drawing-flag-${check.slug}`}
      {...({ dataSet: { selected: String(selected) } } as object)}
      onPress={onPress}
      style={StyleSheet.flatten([styles.netFlag, selected && styles.netFlagOn])}
    >
      <Text style={styles.netMark}>!</Text>
      <Text style={styles.netText}>{check.slug} · whole network</Text>
    </Pressable>
  );
}

function Legend() {
  return (
    <View style={styles.legend} testID="survey-drawing-legend">
      <Text style={styles.legendItem}>━ wall run (ft)</Text>
      <Text style={styles.legendItem}>─ cord</Text>
      <Text style={[styles.legendItem, styles.flag]}>╍ ! dashed with a badge: flagged</Text>
      <Text style={styles.legendItem}>■ block ▢ jack ◆ splitter ○ adapter</Text>
      <Text style={[styles.legendItem, styles.ok]}>⏦ terminator (Ω)</Text>
      <Text style={styles.legendItem}>Halo: chosen in the checks</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, paddingHorizontal: space.md, paddingTop: space.sm },
  wrap: { gap: space.sm, borderWidth: 1, borderColor: colors.border, borderRadius: 8, overflow: 'hidden', backgroundColor: colors.surface },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingHorizontal: space.md, paddingBottom: space.sm },
  legendItem: { fontFamily: fonts.regular, fontSize: 12, color: colors.textMuted },
  flag: { color: colors.danger },
  ok: { color: colors.success },
  netFlag: {
    flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 36, paddingHorizontal: space.md, borderRadius: 18,
    borderWidth: 2, borderStyle: 'dashed', borderColor: colors.danger, backgroundColor: colors.dangerSoft,
  },
  netFlagOn: { borderStyle: 'solid', borderColor: colors.focus, backgroundColor: '#FFF7F0' },
  netMark: { fontFamily: fonts.bold, fontSize: 13, color: colors.primaryText, backgroundColor: colors.danger, width: 20, height: 20, lineHeight: 20, borderRadius: 10, textAlign: 'center' },
  netText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
});
