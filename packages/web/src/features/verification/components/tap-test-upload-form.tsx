import { Button, Callout, FileInput, FormGroup, HTMLSelect, HTMLTable, NumericInput, TextArea } from '@blueprintjs/core';
import { UploadIcon } from '@blueprintjs/icons';
import { useState } from 'react';

import { errorMessage } from '@/lib/api-errors';

import { useUploadVerification, type UploadOutcome } from '../api/upload-verification';
import type { FrfQuantity, Verification, VerificationKind } from '../types';

const KIND_OPTIONS: Array<{ value: VerificationKind; label: string }> = [
  { value: 'impact', label: 'Raw hammer record (time_s, force_n, acceleration_m_s2)' },
  { value: 'frf', label: 'Measured FRF (frequency_hz with real, imag or magnitude, phase_deg)' },
];

const QUANTITY_OPTIONS: Array<{ value: FrfQuantity; label: string }> = [
  { value: 'accelerance', label: 'Accelerance, (m/s²)/N' },
  { value: 'mobility', label: 'Mobility, (m/s)/N' },
  { value: 'receptance', label: 'Receptance, m/N' },
];

/** The default tolerance on the natural frequency (common practice), as the server's. */
export const DEFAULT_TOLERANCE_PCT = 10;

export interface TapTestUploadFormProps {
  designId: number;
  onRecorded: (verification: Verification) => void;
}

/**
 * Upload of a tap-test file: what it holds, the tolerance on the natural frequency and a note on
 * where it was measured. A refused file shows every problem as row, column and message.
 */
export function TapTestUploadForm({ designId, onRecorded }: TapTestUploadFormProps) {
  const upload = useUploadVerification();
  const [file, setFile] = useState<File | null>(null);
  const [kind, setKind] = useState<VerificationKind>('impact');
  const [quantity, setQuantity] = useState<FrfQuantity>('accelerance');
  const [tolerance, setTolerance] = useState<number>(DEFAULT_TOLERANCE_PCT);
  const [note, setNote] = useState('');
  const [outcome, setOutcome] = useState<UploadOutcome | null>(null);
  const [failure, setFailure] = useState<string | null>(null);

  const toleranceValid = Number.isFinite(tolerance) && tolerance >= 1 && tolerance <= 50;

  const submit = async () => {
    if (!file || !toleranceValid) return;
    setFailure(null);
    setOutcome(null);
    try {
      const result = await upload.mutateAsync({
        designId,
        file,
        kind,
        quantity: kind === 'frf' ? quantity : undefined,
        tolerancePct: tolerance,
        note,
      });
      setOutcome(result);
      if (result.status === 201) {
        setFile(null);
        setNote('');
        onRecorded(result.verification);
      }
    } catch (error) {
      setFailure(errorMessage(error));
    }
  };

  return (
    // not a <form>: the design page is one form already (its own Save), and forms do not nest
    <div className="tc-tap-upload" role="group" aria-label="Upload a tap test">
      <h3 className="tc-section-title">Add a measurement</h3>
      <p className="tc-muted">
        Hit the installed machine with an instrumented hammer near its centre of gravity and record the force and the response (machine
        stopped, several hits). Upload the raw record or the FRF your analyser computed: Tacet identifies the natural frequency and the
        damping and compares them with this design.
      </p>
      <div className="tc-tap-upload-grid">
        <FormGroup label="File (CSV)" labelFor="tap-test-file">
          <FileInput
            fill
            text={file ? file.name : 'Choose a CSV file…'}
            buttonText="Browse"
            inputProps={{ id: 'tap-test-file', accept: '.csv,.txt,text/csv', 'aria-label': 'Measurement file' }}
            onInputChange={(event) => setFile((event.target as HTMLInputElement).files?.[0] ?? null)}
          />
        </FormGroup>
        <FormGroup label="The file holds" labelFor="tap-test-kind">
          <HTMLSelect id="tap-test-kind" fill value={kind} onChange={(event) => setKind(event.currentTarget.value as VerificationKind)}>
            {KIND_OPTIONS.map((option) => (
              <option key={option.value} value={option.value}>
                {option.label}
              </option>
            ))}
          </HTMLSelect>
        </FormGroup>
        {kind === 'frf' ? (
          <FormGroup label="Quantity (SI)" labelFor="tap-test-quantity">
            <HTMLSelect
              id="tap-test-quantity"
              fill
              value={quantity}
              onChange={(event) => setQuantity(event.currentTarget.value as FrfQuantity)}
            >
              {QUANTITY_OPTIONS.map((option) => (
                <option key={option.value} value={option.value}>
                  {option.label}
                </option>
              ))}
            </HTMLSelect>
          </FormGroup>
        ) : null}
        <FormGroup
          label="Tolerance on the natural frequency (± %)"
          labelFor="tap-test-tolerance"
          helperText={toleranceValid ? `Default ±${DEFAULT_TOLERANCE_PCT} %, common practice` : 'Give 1 to 50 %'}
          intent={toleranceValid ? 'none' : 'danger'}
        >
          <NumericInput
            id="tap-test-tolerance"
            min={1}
            max={50}
            stepSize={1}
            value={Number.isFinite(tolerance) ? tolerance : ''}
            onValueChange={(value) => setTolerance(value)}
          />
        </FormGroup>
      </div>
      <FormGroup label="Where and how it was measured (optional)" labelFor="tap-test-note">
        <TextArea
          id="tap-test-note"
          fill
          maxLength={500}
          value={note}
          placeholder="e.g. hammer on the frame above the centre of gravity, accelerometer vertical at corner A"
          onChange={(event) => setNote(event.currentTarget.value)}
        />
      </FormGroup>
      <Button
        type="button"
        intent="primary"
        icon={<UploadIcon />}
        text="Upload and compare"
        disabled={!file || !toleranceValid}
        loading={upload.isPending}
        onClick={() => void submit()}
      />
      {failure ? (
        <Callout intent="danger" role="alert" className="tc-note" title="Not recorded">
          {failure}
        </Callout>
      ) : null}
      {outcome?.status === 422 ? (
        <Callout intent="danger" role="alert" className="tc-note" title={`${outcome.fileName} was not recorded`}>
          <p>{outcome.message}</p>
          <HTMLTable compact striped aria-label="Problems in the file">
            <thead>
              <tr>
                <th>Row</th>
                <th>Column</th>
                <th>Problem</th>
              </tr>
            </thead>
            <tbody>
              {outcome.problems.map((problem, i) => (
                <tr key={i}>
                  <td>{problem.row === 0 ? 'whole file' : problem.row}</td>
                  <td>{problem.column || '—'}</td>
                  <td>{problem.message}</td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        </Callout>
      ) : null}
    </div>
  );
}
