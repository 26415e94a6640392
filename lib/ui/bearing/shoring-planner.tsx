import { useDeferredValue, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiError } from '@/lib/api/client';
import { useShoringSave } from '@/lib/hooks/use-shoring-save';
import { spacing } from '@/lib/theme';
import { Button } from '@/lib/ui/button';
import { Card } from '@/lib/ui/card';
import { ChoiceGroup } from '@/lib/ui/choice-group';
import { Notice } from '@/lib/ui/notice';
import { TextField } from '@/lib/ui/text-field';
import { jsonEqual } from '@/lib/ui/json-equal';
import type { MemberCheckInput } from '@/shared/schemas/calc/member';
import type { ShoringSurface } from '@/shared/schemas/calc/shoring';
import {
  shoringResultSchema,
  type ShoringPlanBodyInput,
  type ShoringRecord,
} from '@/shared/schemas/shoring-plans';
import { liveShoring } from './live-shoring';
import { ShoringResult } from './shoring-result';

const SURFACES: { value: ShoringSurface; label: string; description: string }[] = [
  {
    value: 'floor-framing-perpendicular',
    label: 'Floor, across the joists',
    description: 'The bottom plate crosses the floor joists below',
  },
  {
    value: 'floor-framing-parallel',
    label: 'Floor, along the joists',
    description: 'The bottom plate runs on one joist or between them',
  },
  { value: 'slab-on-grade', label: 'Slab on grade', description: 'Concrete on the ground' },
  { value: 'basement-slab', label: 'Basement slab', description: 'Usually a slab on fill, not a footing' },
  { value: 'ground', label: 'Bare ground', description: 'A crawl space or outside' },
];

type Form = {
  layout: 'one-side' | 'both-sides';
  spanA: string;
  spanB: string;
  setback: string;
  method: 'stud-walls' | 'rented-shores';
  capacity: string;
  studSizeId: '2x4' | '2x6';
  materialId: string;
  spacing: string;
  height: string;
  standsOn: ShoringSurface;
};

const num = (text: string) => (text.trim() === '' ? undefined : Number(text.replace(',', '.')));

function formOf(saved: ShoringRecord | null): Form {
  const i = saved?.input;
  return {
    layout: i?.layout ?? 'both-sides',
    spanA: i?.joistSpanAFt?.toString() ?? '',
    spanB: i?.joistSpanBFt?.toString() ?? '',
    setback: (i?.setbackFt ?? 2).toString(),
    method: i?.method ?? 'stud-walls',
    capacity: i?.shoreRatedCapacityLb?.toString() ?? '',
    studSizeId: i?.studs.studSizeId === '2x6' ? '2x6' : '2x4',
    materialId: i?.studs.materialId ?? 'sawn-spruce-pine-fir-no1-no2',
    spacing: (i?.studs.studSpacingIn ?? 16).toString(),
    height: (i?.studs.heightFt ?? 8).toString(),
    standsOn: i?.standsOn ?? 'floor-framing-perpendicular',
  };
}

function bodyOf(form: Form): ShoringPlanBodyInput {
  return {
    layout: form.layout,
    joistSpanAFt: num(form.spanA),
    joistSpanBFt: form.layout === 'both-sides' ? num(form.spanB) : undefined,
    setbackFt: num(form.setback),
    method: form.method,
    shoreRatedCapacityLb: form.method === 'rented-shores' ? num(form.capacity) : undefined,
    studs: {
      materialId: form.materialId,
      studSizeId: form.studSizeId,
      studSpacingIn: num(form.spacing) ?? 16,
      heightFt: num(form.height) ?? 8,
      weakAxisBracing: 'mid-height-blocking',
    },
    standsOn: form.standsOn,
  };
}

/**
 * The temporary shoring planner of a member: layout, studs or rented shores, what the walls stand on. The
 * plan is computed on the device as the person types (the engine the server runs); a save stores the
 * server's own result, which then shows, and the screen says so if the two differ.
 */
export function ShoringPlanner({
  jobId,
  memberId,
  member,
  saved,
}: {
  jobId: string;
  memberId: string;
  member: MemberCheckInput;
  saved: ShoringRecord | null;
}) {
  const saveShoring = useShoringSave(jobId, memberId, saved);
  const [waiting, setWaiting] = useState(false);
  const [form, setForm] = useState<Form>(() => formOf(saved));
  const [record, setRecord] = useState(saved);
  const [savedForm, setSavedForm] = useState<Form | null>(() => (saved ? formOf(saved) : null));
  const [problem, setProblem] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState(false);
  const set =
    <K extends keyof Form>(key: K) =>
    (value: Form[K]) =>
      setForm((f) => ({ ...f, [key]: value }));
  const deferred = useDeferredValue(form);
  const live = useMemo(() => liveShoring(member, bodyOf(deferred)), [member, deferred]);
  const showSaved = record !== null && savedForm !== null && jsonEqual(form, savedForm);
  const differs = useMemo(
    () =>
      showSaved && live.ok && !jsonEqual(shoringResultSchema.parse(live.result), record.result)
        ? `This device computes a different plan from the one saved (engine ${record.engineVersion} on the server). The server's saved plan is shown.`
        : null,
    [showSaved, live, record],
  );
  const fields = { ...(live.ok ? {} : live.errors), ...(problem?.fields ?? {}) };

  const plan = async () => {
    setBusy(true);
    try {
      const next = await saveShoring(bodyOf(form));
      if (next) {
        setRecord(next);
        setSavedForm(form);
      }
      setWaiting(next === null);
      setProblem(null);
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      setProblem(error);
    } finally {
      setBusy(false);
    }
  };

  return (
    <View style={styles.wrap}>
      <Card title="Temporary walls">
        <ChoiceGroup
          label="Where"
          choices={[
            { value: 'both-sides', label: 'Both sides of the wall' },
            { value: 'one-side', label: 'One side' },
          ]}
          value={form.layout}
          onChange={set('layout')}
          testID="shoring-layout"
        />
        <View style={styles.grid}>
          <View style={styles.cell}>
            <TextField
              label="Joist span, side A"
              unit="ft"
              value={form.spanA}
              onChangeText={set('spanA')}
              errors={fields.joistSpanAFt}
              testID="shoring-span-a"
            />
          </View>
          {form.layout === 'both-sides' ? (
            <View style={styles.cell}>
              <TextField
                label="Joist span, side B"
                unit="ft"
                value={form.spanB}
                onChangeText={set('spanB')}
                errors={fields.joistSpanBFt}
                testID="shoring-span-b"
              />
            </View>
          ) : null}
          <View style={styles.cell}>
            <TextField
              label="Setback from the wall"
              unit="ft"
              hint="2 to 3 ft is usual."
              value={form.setback}
              onChangeText={set('setback')}
              errors={fields.setbackFt}
              testID="shoring-setback"
            />
          </View>
        </View>
        <ChoiceGroup
          label="Built from"
          choices={[
            { value: 'stud-walls', label: 'Stud walls' },
            { value: 'rented-shores', label: 'Rented adjustable shores' },
          ]}
          value={form.method}
          onChange={set('method')}
          testID="shoring-method"
        />
        {form.method === 'rented-shores' ? (
          <TextField
            label="Rated capacity of one shore"
            hint="Read it off the shore for the height you extend it to."
            unit="lb"
            value={form.capacity}
            onChangeText={set('capacity')}
            errors={fields.shoreRatedCapacityLb}
            testID="shoring-capacity"
          />
        ) : null}
        <ChoiceGroup
          label="Studs"
          choices={[
            { value: '2x4', label: '2x4' },
            { value: '2x6', label: '2x6' },
          ]}
          value={form.studSizeId}
          onChange={set('studSizeId')}
          testID="shoring-stud-size"
        />
        <ChoiceGroup
          label="Stud lumber"
          choices={[
            { value: 'sawn-spruce-pine-fir-no1-no2', label: 'Spruce-Pine-Fir No.1/No.2' },
            { value: 'sawn-douglas-fir-larch-no2', label: 'Douglas Fir-Larch No.2' },
          ]}
          value={form.materialId}
          onChange={set('materialId')}
        />
        <View style={styles.grid}>
          <View style={styles.cell}>
            <TextField
              label="Stud spacing"
              unit="in"
              value={form.spacing}
              onChangeText={set('spacing')}
              errors={fields['studs.studSpacingIn']}
              testID="shoring-spacing"
            />
          </View>
          <View style={styles.cell}>
            <TextField
              label="Floor to ceiling"
              unit="ft"
              value={form.height}
              onChangeText={set('height')}
              errors={fields['studs.heightFt']}
              testID="shoring-height"
            />
          </View>
        </View>
        <ChoiceGroup
          label="The walls stand on"
          choices={SURFACES}
          value={form.standsOn}
          onChange={set('standsOn')}
          testID="shoring-stands-on"
        />
        {problem ? (
          <Notice tone="error" testID="shoring-problem">
            {`Nothing was saved: ${problem.message}`}
          </Notice>
        ) : null}
        <Button
          label="Save the plan"
          icon="check"
          busy={busy}
          onPress={() => void plan()}
          testID="shoring-save"
        />
      </Card>
      {waiting ? (
        <Notice tone="info" title="Saved on this device only" testID="shoring-waiting">
          No signal: the plan is sent when there is, and the server works out the walls from the member’s
          saved loads. The plan below is this device’s until then.
        </Notice>
      ) : null}
      {showSaved ? (
        <>
          <Notice tone="success" title="Saved" testID="shoring-status">
            The plan shown is the server’s.
          </Notice>
          {differs ? (
            <Notice tone="warning" title="Device and server differ" testID="shoring-differs">
              {differs}
            </Notice>
          ) : null}
          <ShoringResult result={record.result} input={record.input} />
        </>
      ) : live.ok ? (
        <>
          <Notice tone="info" title="Not saved yet" testID="shoring-status">
            Computed on this device as you type. Save the plan to keep it on the member.
          </Notice>
          <ShoringResult result={live.result} input={live.body} />
        </>
      ) : (
        <Notice tone="info" title="No plan yet" testID="shoring-status">
          Fix the fields marked above to see the plan.
        </Notice>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 160 },
});
