import { Alert, Button, Callout, Tab, Tabs, Tag } from '@blueprintjs/core';
import { FloppyDiskIcon, LockIcon, RefreshIcon, UndoIcon } from '@blueprintjs/icons';
import { DESIGN_SECTIONS } from '@tacet/vibration';
import { Form, Formik, useFormikContext, type FormikHelpers, type FormikProps } from 'formik';
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { useBlocker } from 'react-router-dom';

import { PageHeader } from '@/components/page-header';
import { SafetyCautions } from '@/components/safety-cautions';
import { errorMessage, formFailure } from '@/lib/api-errors';
import { useUser, type SessionUser } from '@/lib/auth';
import { canDesign } from '@/lib/authorization';
import { formatDateTime } from '@/lib/dates';
import { useUnits } from '@/lib/units';
import type { Candidate, Design } from '@/types/design-api';

import { useSupplierOptions } from '../api/get-supplier-options';
import { isEditConflict, useUpdateDesign } from '../api/update-design';
import { useDesignFigures, type DesignFigures } from '../hooks/use-design-figures';
import {
  describeErrors,
  designFormSchema,
  sectionsWithErrors,
  serverErrorsToForm,
  toDesignInput,
  toFormValues,
  type DesignFormValues,
} from '../schemas/design-form';
import { CriteriaPanel } from './criteria-panel';
import { DesignStatusTag } from './design-status-tag';
import { EquipmentPanel } from './equipment-panel';
import { KeyFigures } from './key-figures';
import { MountLayoutPanel } from './mount-layout-panel';
import { OperatingPanel } from './operating-panel';
import { RestraintPanel } from './restraint-panel';

export const CONFLICT_MESSAGE = 'This design was changed by someone else; reload it';

/** What the selection part of the page (composed by the route) gets from the design. */
export interface DesignSelectionContext {
  design: Design;
  /** Live figures of the current, possibly unsaved, input. */
  figures: DesignFigures;
  /** The user may run a selection (engineer, admin). */
  canRun: boolean;
  /** The user may choose a candidate and save (author or admin, draft only). */
  canEdit: boolean;
  /** The input differs from the saved one. */
  dirty: boolean;
  /**
   * Saves unsaved input first; resolves with the saved design, or null when it could not be
   * saved (the reasons are shown on the page).
   */
  saveIfNeeded: () => Promise<Design | null>;
  /** Records a candidate as the chosen mounts (PUT with the version). */
  choose: (candidate: Candidate) => Promise<boolean>;
  choosing: boolean;
}

export type DesignTab = 'equipment' | 'layout' | 'running' | 'requirements' | 'restraint' | 'selection' | 'measured';

export interface DesignWorkspaceProps {
  design: Design;
  /** Fetches the design again (after a conflict); resolves with the fresh design. */
  onReload: () => Promise<Design | undefined>;
  renderSelection: (context: DesignSelectionContext) => ReactNode;
  /** The tab shown first. */
  initialTab?: DesignTab;
  /**
   * Shown under the page header, e.g. the check-and-release panel (composed by the route); it
   * gets whether there are unsaved edits and a way to save them first.
   */
  renderReview?: (context: DesignReviewContext) => ReactNode;
  /** The "Measured" tab (as-built tap tests), composed by the route for released and superseded designs. */
  renderMeasured?: () => ReactNode;
}

/** What the review part of the page gets from the workspace. */
export type DesignReviewContext = Pick<DesignSelectionContext, 'dirty' | 'saveIfNeeded'>;

/** Why the signed-in user cannot change this design, or null when they can. */
export function readOnlyReason(design: Design, user: SessionUser): string | null {
  if (!canDesign(user.role)) return 'You can read this design; only engineers and administrators change designs.';
  if (design.status !== 'draft') {
    return design.status === 'in_review'
      ? 'This revision is in check, so it cannot be changed now.'
      : 'Released designs are frozen; a change starts a new revision.';
  }
  if (user.role !== 'admin' && design.author.id !== user.id) {
    return `Only the author (${design.author.name}) or an administrator can change this draft.`;
  }
  return null;
}

function TabTitle({ text, problems }: { text: string; problems: boolean }) {
  return (
    <span className="tc-tab-title">
      {text}
      {problems ? (
        <Tag minimal round intent="danger" className="tc-tab-badge" aria-label="has problems">
          !
        </Tag>
      ) : null}
    </span>
  );
}

/** Warns before leaving the page (in the app or the browser) with unsaved input. */
function UnsavedChangesGuard({ dirty }: { dirty: boolean }) {
  const blocker = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (!dirty) return undefined;
    const warn = (event: BeforeUnloadEvent) => event.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);
  return (
    <Alert
      isOpen={blocker.state === 'blocked'}
      intent="warning"
      confirmButtonText="Leave without saving"
      cancelButtonText="Stay"
      onConfirm={() => blocker.proceed?.()}
      onCancel={() => blocker.reset?.()}
    >
      <p>This design has unsaved changes. Leave the page and lose them?</p>
    </Alert>
  );
}

/** What the page-level state hands to the editor inside Formik. */
interface EditorProps {
  /** The design as loaded into the form: its version is the one a save sends. */
  base: Design;
  /** A newer version is on the server than the one being edited. */
  newer: boolean;
  readOnlyText: string | null;
  canRun: boolean;
  tab: DesignTab;
  onTab: (tab: DesignTab) => void;
  conflict: boolean;
  failure: string | null;
  /** The chosen mounts a save just cleared (their label), until dismissed. */
  clearedChoice: string | null;
  onDismissClearedChoice: () => void;
  reloading: boolean;
  choosing: boolean;
  onReload: (formik: FormikProps<DesignFormValues>) => Promise<void>;
  onChoose: (candidate: Candidate, formik: FormikProps<DesignFormValues>) => Promise<boolean>;
  renderSelection: DesignWorkspaceProps['renderSelection'];
  renderReview?: DesignWorkspaceProps['renderReview'];
  renderMeasured?: DesignWorkspaceProps['renderMeasured'];
}

function DesignEditor(props: EditorProps) {
  const {
    base,
    newer,
    readOnlyText,
    canRun,
    tab,
    onTab,
    conflict,
    failure,
    clearedChoice,
    reloading,
    choosing,
    renderSelection,
    renderReview,
    renderMeasured,
  } = props;
  const readOnly = readOnlyText !== null;
  const formik = useFormikContext<DesignFormValues>();
  const { values, errors, dirty, submitCount, resetForm, isSubmitting } = formik;
  const units = useUnits();
  const figures = useDesignFigures(values, units);
  const suppliers = useSupplierOptions();
  const problems = useMemo(() => sectionsWithErrors(errors), [errors]);
  const problemList = useMemo(() => (submitCount > 0 ? describeErrors(errors, values) : []), [submitCount, errors, values]);

  // The latest state for the callbacks handed to the selection panel (stable identities),
  // updated once the render is committed, before any event can call them.
  const latest = useRef({ formik, base, onChoose: props.onChoose });
  useLayoutEffect(() => {
    latest.current = { formik, base, onChoose: props.onChoose };
  });

  const saveIfNeeded = useCallback(async (): Promise<Design | null> => {
    const current = latest.current;
    if (!current.formik.dirty) return current.base;
    const saved = (await current.formik.submitForm()) as Design | null | undefined;
    return saved ?? null;
  }, []);
  const choose = useCallback((candidate: Candidate) => latest.current.onChoose(candidate, latest.current.formik), []);

  const context: DesignSelectionContext = {
    design: base,
    figures,
    canRun,
    canEdit: !readOnly,
    dirty,
    saveIfNeeded,
    choose,
    choosing,
  };

  const supplierList = suppliers.isError ? null : suppliers.data;
  // The routes' render props only hand saveIfNeeded and choose to event handlers (they never call
  // them while rendering), which the compiler's ref check cannot see through a function call.
  // eslint-disable-next-line react-hooks/refs -- see above: the callbacks read the ref in events only
  const review = renderReview?.({ dirty, saveIfNeeded });
  // eslint-disable-next-line react-hooks/refs -- see above
  const selection = renderSelection(context);

  return (
    <Form noValidate aria-label="Design input">
      <PageHeader
        title={base.name}
        description={
          <span className="tc-design-meta">
            <span>Revision {base.revision}</span>
            <DesignStatusTag status={base.status} />
            <span aria-hidden="true">·</span>
            <span>by {base.author.name}</span>
            <span aria-hidden="true">·</span>
            <span>updated {formatDateTime(base.updatedAt)}</span>
          </span>
        }
        actions={
          readOnly ? (
            <Tag minimal large icon={<LockIcon />} className="tc-readonly-tag">
              Read only
            </Tag>
          ) : (
            <div className="tc-save-actions">
              {dirty ? (
                <Tag minimal intent="warning" className="tc-dirty-tag">
                  Unsaved changes
                </Tag>
              ) : (
                <span className="tc-muted tc-saved-note">All changes saved</span>
              )}
              {dirty && base.chosen ? (
                <span className="tc-muted tc-save-consequence" data-testid="save-clears-choice">
                  Saving clears the chosen mounts
                </span>
              ) : null}
              {dirty ? (
                <Button icon={<UndoIcon />} text="Discard" variant="minimal" onClick={() => resetForm()} disabled={isSubmitting} />
              ) : null}
              <Button
                type="submit"
                intent="primary"
                icon={<FloppyDiskIcon />}
                text="Save"
                disabled={!dirty || choosing}
                loading={isSubmitting}
              />
            </div>
          )
        }
      />
      {review}
      {readOnlyText ? (
        <Callout icon={<LockIcon />} className="tc-note" title="Read only">
          {readOnlyText}
        </Callout>
      ) : null}
      {conflict || newer ? (
        <Callout intent="warning" title={CONFLICT_MESSAGE} role="alert" className="tc-note">
          <p>
            {conflict
              ? 'Your changes were not saved: someone else saved this design since you opened it.'
              : 'Someone else saved a newer version of this design since you opened it.'}{' '}
            Reloading shows their version{dirty ? ' and discards your unsaved edits' : ''}.
          </p>
          <Button icon={<RefreshIcon />} intent="warning" text="Reload" loading={reloading} onClick={() => void props.onReload(formik)} />
        </Callout>
      ) : null}
      {clearedChoice ? (
        <Callout intent="warning" role="status" className="tc-note" title="The chosen mounts were cleared" data-testid="choice-cleared">
          <p>
            Saving the changed input cleared the choice of {clearedChoice}: its loads and figures were worked out for the earlier input.
            Find mounts again and choose from the new results.
          </p>
          <div className="tc-callout-actions">
            {tab !== 'selection' ? <Button text="Go to Mount selection" onClick={() => onTab('selection')} /> : null}
            <Button variant="minimal" text="Dismiss" onClick={props.onDismissClearedChoice} />
          </div>
        </Callout>
      ) : null}
      {failure ? (
        <Callout intent="danger" role="alert" className="tc-note" title="Not saved">
          {failure}
        </Callout>
      ) : null}
      {problemList.length > 0 ? (
        <Callout intent="danger" title="Some input needs attention before it can be saved" role="alert" className="tc-note">
          <ul className="tc-problem-list">
            {problemList.map((problem) => (
              <li key={problem}>{problem}</li>
            ))}
          </ul>
        </Callout>
      ) : null}
      <KeyFigures figures={figures} chosen={base.chosen} units={units} />
      <Tabs
        id="design-sections"
        selectedTabId={tab}
        onChange={(id) => onTab(id as DesignTab)}
        size="large"
        animate={false}
        className="tc-design-tabs"
      >
        <Tab
          id="equipment"
          title={<TabTitle text={DESIGN_SECTIONS.equipment} problems={problems.has('components')} />}
          panel={<EquipmentPanel readOnly={readOnly} figures={figures} />}
        />
        <Tab
          id="layout"
          title={<TabTitle text={DESIGN_SECTIONS.layout} problems={problems.has('mountPoints')} />}
          panel={<MountLayoutPanel readOnly={readOnly} figures={figures} />}
        />
        <Tab
          id="running"
          title={<TabTitle text={DESIGN_SECTIONS.running} problems={problems.has('operating')} />}
          panel={<OperatingPanel readOnly={readOnly} figures={figures} />}
        />
        <Tab
          id="requirements"
          title={<TabTitle text={DESIGN_SECTIONS.requirements} problems={problems.has('criteria')} />}
          panel={<CriteriaPanel readOnly={readOnly} suppliers={supplierList} />}
        />
        <Tab
          id="restraint"
          title={<TabTitle text={DESIGN_SECTIONS.restraint} problems={problems.has('restraint')} />}
          panel={<RestraintPanel readOnly={readOnly} figures={figures} />}
        />
        <Tab id="selection" title={<TabTitle text={DESIGN_SECTIONS.selection} problems={false} />} panel={<>{selection}</>} />
        {renderMeasured ? (
          <Tab id="measured" title={<TabTitle text={DESIGN_SECTIONS.measured} problems={false} />} panel={<>{renderMeasured()}</>} />
        ) : null}
      </Tabs>
      {/* The selection tab shows the same cautions beside its results. */}
      {tab === 'selection' ? null : (
        <div className="tc-design-cautions">
          <SafetyCautions restraint={values.restraint.enabled} />
        </div>
      )}
      {readOnly ? null : <UnsavedChangesGuard dirty={dirty} />}
    </Form>
  );
}

/**
 * The design page body: header with save, key figures, the input tabs and the selection tab
 * (rendered by the route). Everything shown is recomputed in the browser as the user types.
 * A save sends the version the form was loaded from, so a concurrent change answers 409.
 */
export function DesignWorkspace({
  design,
  onReload,
  renderSelection,
  initialTab = 'equipment',
  renderReview,
  renderMeasured,
}: DesignWorkspaceProps) {
  const user = useUser();
  const units = useUnits();
  const updateDesign = useUpdateDesign();
  const [tab, setTab] = useState<DesignTab>(initialTab === 'measured' && !renderMeasured ? 'equipment' : initialTab);
  const [base, setBase] = useState<Design>(design);
  const [conflict, setConflict] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const [clearedChoice, setClearedChoice] = useState<string | null>(null);
  const [reloading, setReloading] = useState(false);
  const [choosing, setChoosing] = useState(false);

  const readOnlyText = readOnlyReason(base, user);
  const initialValues = useMemo(() => toFormValues(base.input, units), [base.input, units]);
  const schema = useMemo(() => designFormSchema(units), [units]);
  const newer = design.id === base.id && design.version > base.version;

  const fail = (error: unknown) => {
    // 409 also answers a frozen or in-review design and a duplicate name: those are said as they are.
    if (isEditConflict(error) && !/frozen|in check|already exists/i.test(errorMessage(error))) setConflict(true);
    else setFailure(errorMessage(error));
  };

  const save = async (values: DesignFormValues, helpers: FormikHelpers<DesignFormValues>): Promise<Design | null> => {
    setFailure(null);
    const input = toDesignInput(values, units);
    if (!input) {
      setFailure('Some input is incomplete. Fill in every required value, then save again.');
      return null;
    }
    try {
      const saved = await updateDesign.mutateAsync({ designId: base.id, version: base.version, input });
      // the server clears the choice when the input changed: say so rather than let it vanish
      setClearedChoice(base.chosen && !saved.chosen ? base.chosen.label : null);
      setBase(saved);
      setConflict(false);
      helpers.resetForm({ values: toFormValues(saved.input, units) });
      return saved;
    } catch (error) {
      // Problems the server found go to their fields, one message each (the list above the tabs names them);
      // the general message says only what has no field on the form.
      const onForm = (field: string) => (Object.keys(serverErrorsToForm([{ field, message: field }])).length > 0 ? field : undefined);
      const { fields, general } = formFailure(error, onForm);
      const placed = serverErrorsToForm(Object.entries(fields).map(([field, message]) => ({ field, message })));
      if (Object.keys(placed).length > 0) {
        helpers.setErrors(placed);
        setFailure(general ?? 'The server did not accept some input; the fields are marked.');
      } else fail(error);
      return null;
    }
  };

  const choose = async (candidate: Candidate, formik: FormikProps<DesignFormValues>): Promise<boolean> => {
    if (formik.dirty) {
      setFailure('Save or discard the changed input before choosing mounts.');
      return false;
    }
    setFailure(null);
    setChoosing(true);
    try {
      const chosen =
        candidate.kind === 'series' && candidate.seriesId ? { chosenSeriesId: candidate.seriesId } : { chosenMountId: candidate.mountId };
      const saved = await updateDesign.mutateAsync({ designId: base.id, version: base.version, ...chosen });
      setClearedChoice(null);
      setBase(saved);
      setConflict(false);
      return true;
    } catch (error) {
      fail(error);
      return false;
    } finally {
      setChoosing(false);
    }
  };

  const reload = async (formik: FormikProps<DesignFormValues>) => {
    setReloading(true);
    try {
      const fresh = await onReload();
      if (fresh) {
        setBase(fresh);
        formik.resetForm({ values: toFormValues(fresh.input, units) });
      }
      setConflict(false);
      setFailure(null);
    } catch (error) {
      setFailure(errorMessage(error));
    } finally {
      setReloading(false);
    }
  };

  return (
    <Formik<DesignFormValues> key={`${base.id}:${units.system}`} initialValues={initialValues} validationSchema={schema} onSubmit={save}>
      <DesignEditor
        base={base}
        newer={newer}
        readOnlyText={readOnlyText}
        canRun={canDesign(user.role)}
        tab={tab}
        onTab={setTab}
        conflict={conflict}
        failure={failure}
        clearedChoice={clearedChoice}
        onDismissClearedChoice={() => setClearedChoice(null)}
        reloading={reloading}
        choosing={choosing}
        onReload={reload}
        onChoose={choose}
        renderSelection={renderSelection}
        renderReview={renderReview}
        renderMeasured={renderMeasured}
      />
    </Formik>
  );
}
