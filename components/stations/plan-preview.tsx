// The live plan for one PC: whether it can go to review, the checks, the boot order before and after,
// the unified diff and the patched files. Nothing here is saved.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/constants/theme';
import type { PlanPreview } from '@/hooks/use-stations';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { Heading, Small } from '@/components/ui/text';
import { PlanDiffs } from '@/components/plans/plan-diffs';
import { BootPreview } from './boot-preview';
import { checkCounts, ChecksList } from './checks-list';
import { FileLines } from './file-lines';

type FileTab = 'autoexec' | 'config';

export function PlanPreviewPanel({ preview, loaderPath }: { preview: PlanPreview; loaderPath?: string }) {
  const { plan } = preview;
  const [tab, setTab] = useState<FileTab>('autoexec');
  const file = tab === 'config' && plan.files.config ? plan.files.config : plan.files.autoexec;
  const final = plan.finalProgram;
  return (
    <View style={styles.wrap} testID="plan-preview">
      {preview.profileError ? (
        <Banner tone="error" title="The profile is not complete" testID="plan-profile-error">
          {`${preview.profileError}. Go back to the step that holds it.`}
        </Banner>
      ) : plan.ok ? (
        <Banner tone="success" title={plan.changed ? 'The plan is ready for review' : 'Nothing to change'} testID="plan-ok">
          {`${checkCounts(plan.checks)}. ${plan.insertedAt ? `The network block goes before line ${plan.insertedAt} of AUTOEXEC.BAT` : 'The startup files already hold the network block'}${final ? `, above the final program ${final.program} (line ${final.line}).` : '.'}`}
        </Banner>
      ) : (
        <Banner tone="error" title="The plan is blocked" testID="plan-blocked">
          {`${checkCounts(plan.checks)}. Fix the errors below before the plan can be sent for review.`}
        </Banner>
      )}
      <Banner tone="caution" title="Before anyone changes this PC" testID="plan-caution">
        Keep a bootable diskette and copies of the original AUTOEXEC.BAT and CONFIG.SYS at hand (common practice): a wrong startup file can stop the PC from starting the way its user expects. The rollout bundle carries an undo file as well.
      </Banner>
      <Card>
        <Heading>Checks</Heading>
        <ChecksList checks={plan.checks} testID="plan-checks" />
      </Card>
      <Card>
        <Heading>Boot order</Heading>
        <Small>What DOS runs at start, in order. The network loader must run before the program that never returns.</Small>
        <BootPreview before={plan.boot.before} after={plan.boot.after} loaderPath={loaderPath} testID="boot" />
      </Card>
      <Card>
        <Heading>Changes</Heading>
        <Small>Lines marked + are added, lines marked - are removed; the numbers are the old and new line numbers. Each changed block says why.</Small>
        <PlanDiffs result={plan} />
      </Card>
      <Card>
        <Heading>Patched files</Heading>
        {plan.files.config ? (
          <Choice<FileTab> label="File" testID="plan-file-tab" value={tab} onChange={setTab} options={[{ value: 'autoexec', label: 'AUTOEXEC.BAT' }, { value: 'config', label: 'CONFIG.SYS' }]} />
        ) : null}
        <Small>{`${file.name}: ${file.afterSize} bytes${file.changed ? ', changed' : ', unchanged'}.`}</Small>
        <FileLines text={file.afterText} testID="plan-file" />
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.lg } });
