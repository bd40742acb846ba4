import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { NODE_KIND_LABELS, type SurveyView } from '@/db/requests/survey';
import { space } from '@/constants/theme';
import type { SurveyCheck } from '@/generators/survey/types';
import type { surveyWrites } from '@/hooks/use-survey';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Heading, Small } from '@/components/ui/text';
import { nodesOf } from './drawing-marks';
import { EditableRow } from './editable-row';
import { NodeForm } from './node-form';
import { RunForm } from './run-form';
import { SettingsForm } from './settings-form';
import { TerminatorForm } from './terminator-form';

type Writes = ReturnType<typeof surveyWrites>;
type Props = { view: SurveyView; canEdit: boolean; writes: Writes };

const flagging = (checks: SurveyCheck[]) => checks.filter((c) => c.severity !== 'note');

/** The network as wired, to edit: settings, cable runs, points and terminators. */
export function WiringEditor({ view, canEdit, writes, wide }: Props & { wide: boolean }) {
  return (
    <View style={[styles.wrap, wide && styles.wide]} testID="wiring-editor">
      <View style={wide ? styles.main : styles.wrap}>
        <RunsSection view={view} canEdit={canEdit} writes={writes} />
      </View>
      <View style={wide ? styles.side : styles.wrap}>
        <TerminatorsSection view={view} canEdit={canEdit} writes={writes} />
        {canEdit ? (
          <Card>
            <Heading>Settings</Heading>
            <SettingsForm settings={view.settings} nodes={view.nodes} onSubmit={(v) => writes.updateSettings(v)} />
          </Card>
        ) : null}
        <NodesSection view={view} canEdit={canEdit} writes={writes} />
      </View>
    </View>
  );
}

function Section({ title, hint, addLabel, testID, canEdit, form, children }: {
  title: string; hint: string; addLabel: string; testID: string; canEdit: boolean; form: (done: () => void) => ReactNode; children: ReactNode;
}) {
  const [adding, setAdding] = useState(false);
  return (
    <View style={styles.section} testID={testID}>
      <View style={styles.sectionHead}>
        <View style={{ flexShrink: 1 }}>
          <Heading>{title}</Heading>
          <Small>{hint}</Small>
        </View>
        {canEdit ? <Button compact variant={adding ? 'secondary' : 'primary'} label={adding ? 'Close' : addLabel} testID={`${testID}-add`} onPress={() => setAdding(!adding)} /> : null}
      </View>
      {adding ? <Card>{form(() => setAdding(false))}</Card> : null}
      {children}
    </View>
  );
}

function RunsSection({ view, canEdit, writes }: Props) {
  const label = new Map(view.nodes.map((n) => [n.id, n.label]));
  const checks = flagging(view.result.checks);
  const result = new Map(view.result.runs.map((r) => [r.runId, r]));
  return (
    <Section
      title="Cable runs"
      hint="Lengths in feet; wall wiring must not reverse the pair, an adapter cord does."
      addLabel="Add a run"
      testID="runs"
      canEdit={canEdit}
      form={(done) => <RunForm nodes={view.nodes} submitLabel="Add run" testID="run-new" onSubmit={async (v, confirmed) => { await writes.createRun({ ...v, confirmed }); done(); }} />}
    >
      {view.runs.map((r) => {
        const res = result.get(r.ref);
        return (
          <EditableRow
            key={r.id}
            testID={`run-${r.ref}`}
            title={`${r.ref}: ${label.get(r.fromNodeId)} → ${label.get(r.toNodeId)}`}
            details={[
              `${r.lengthFt} ft · ${r.gauge} AWG · ${res?.kind === 'cord' ? 'cord' : 'wall wiring'} · ${r.reverses ? 'reverses the pair' : 'straight through'} · ` +
                (res?.loopOhms != null ? `loop ${res.loopOhms.toFixed(2)} Ω` : 'loop unknown'),
            ]}
            flags={checks.filter((c) => c.runIds.includes(r.ref))}
            canEdit={canEdit}
            editor={(done) => (
              <RunForm
                initial={r}
                nodes={view.nodes}
                submitLabel="Save run"
                testID={`run-edit-${r.ref}`}
                onSubmit={async (v, confirmed) => {
                  await writes.updateRun(r.id, { ...v, confirmed, version: r.version });
                  done();
                }}
              />
            )}
            onDelete={() => writes.deleteRun(r.id, r.version)}
          />
        );
      })}
    </Section>
  );
}

function TerminatorsSection({ view, canEdit, writes }: Props) {
  const label = new Map(view.nodes.map((n) => [n.id, n.label]));
  const checks = flagging(view.result.checks).filter((c) => c.slug.startsWith('terminator-'));
  return (
    <Section
      title="Terminators"
      hint={view.result.terminatorNeeded ? 'This network is long enough to need one 150 Ω terminator across the pair.' : 'Under 100 ft of wire no terminator is needed.'}
      addLabel="Add a terminator"
      testID="terminators"
      canEdit={canEdit}
      form={(done) => <TerminatorForm nodes={view.nodes} submitLabel="Add terminator" testID="terminator-new" onSubmit={async (v, confirmed) => { await writes.createTerminator({ ...v, confirmed }); done(); }} />}
    >
      {checks.filter((c) => c.nodeIds.length === 0).map((c, i) => (
        <EditableRow key={`c${i}`} testID={`terminators-${c.slug}`} title={c.message} details={[]} flags={[c]} canEdit={false} />
      ))}
      {view.terminators.length === 0 ? <Small>None fitted.</Small> : null}
      {view.terminators.map((t) => (
        <EditableRow
          key={t.id}
          testID={`terminator-${t.ref}`}
          title={`${t.ohms} Ω at ${label.get(t.nodeId) ?? 'an unknown point'}`}
          details={[]}
          flags={checks.filter((c) => view.nodes.some((n) => n.id === t.nodeId && c.nodeIds.includes(n.ref)))}
          canEdit={canEdit}
          editor={(done) => (
            <TerminatorForm initial={t} nodes={view.nodes} submitLabel="Save terminator" testID={`terminator-edit-${t.ref}`} onSubmit={async (v, confirmed) => { await writes.updateTerminator(t.id, { ...v, confirmed, version: t.version }); done(); }} />
          )}
          onDelete={() => writes.deleteTerminator(t.id, t.version)}
        />
      ))}
    </Section>
  );
}

function NodesSection({ view, canEdit, writes }: Props) {
  const checks = flagging(view.result.checks);
  const jackRef = new Map(view.jacks.map((j) => [j.id, j.ref]));
  return (
    <Section
      title="Points of the network"
      hint="The punch-down block, wall jacks, splitters and network adapters the runs join."
      addLabel="Add a point"
      testID="nodes"
      canEdit={canEdit}
      form={(done) => <NodeForm jacks={view.jacks} submitLabel="Add point" testID="node-new" onSubmit={async (v) => { await writes.createNode(v); done(); }} />}
    >
      {view.nodes.map((n) => {
        const self = { id: n.ref, jackId: n.jackId === null ? undefined : jackRef.get(n.jackId) };
        return (
          <EditableRow
            key={n.id}
            testID={`node-${n.ref}`}
            title={`${n.ref}: ${n.label}`}
            details={[NODE_KIND_LABELS[n.kind] + (view.settings.centreNodeId === n.id ? ' · centre of the star' : '')]}
            flags={checks.filter((c) => nodesOf(c, [self]).includes(n.ref))}
            canEdit={canEdit}
            editor={(done) => (
              <NodeForm initial={n} jacks={view.jacks} submitLabel="Save point" testID={`node-edit-${n.ref}`} onSubmit={async (v) => { await writes.updateNode(n.id, { ...v, version: n.version }); done(); }} />
            )}
            onDelete={() => writes.deleteNode(n.id, n.version)}
          />
        );
      })}
    </Section>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xl },
  wide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { flex: 3, gap: space.xl, minWidth: 0 },
  side: { flex: 2, gap: space.xl, minWidth: 0 },
  section: { gap: space.sm },
  sectionHead: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'flex-end', gap: space.sm },
});
