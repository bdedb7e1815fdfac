import { screen, waitFor, within } from '@testing-library/react';

import { demoInput, makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';
import type { DesignInput, UpdateDesignInput } from '@/types/design-api';

const DESIGN_ID = 41;
const NAME = 'CHW pump P-4 skid';

// The whole design page in jsdom with typing: more than the default 5 s on a busy machine. A harness limit, not a speed check.
vi.setConfig({ testTimeout: 20_000 });

/** The demo input with the pump drained to 240 kg and steel of 5000 N/mm under A (invented figures). */
function savedInput(): DesignInput {
  const input = demoInput();
  input.components[0]!.altMassKg = 240;
  input.mountPoints[0]!.supportStiffnessNPerMm = 5000;
  return input;
}

async function openDesign() {
  const fake = installFakeApi();
  serveDesign(fake, makeDesign({ id: DESIGN_ID, name: NAME, input: savedInput() }));
  const rendered = renderApp({ signedInAs: 'engineer', path: `/designs/${DESIGN_ID}` });
  await screen.findByRole('heading', { name: NAME, level: 1 });
  return { ...rendered, fake };
}

describe('Design page — second mass and support stiffness', () => {
  it('shows the saved values, and saves what is typed, leaving empty boxes out', async () => {
    const { user, fake } = await openDesign();
    const equipment = screen.getByRole('table', { name: 'Equipment' });
    expect(within(equipment).getByRole('columnheader', { name: 'Second mass (kg, optional)' })).toBeInTheDocument();
    expect(within(equipment).getByLabelText('Second mass of Pump')).toHaveValue('240');
    expect(within(equipment).getByLabelText('Second mass of Motor')).toHaveValue('');
    expect(screen.getByTestId('second-mass-help')).toHaveTextContent('drained, empty or without its liquid; the verdict covers both');

    await user.click(screen.getByRole('tab', { name: 'Mount layout' }));
    const points = screen.getByRole('table', { name: 'Mount points' });
    expect(within(points).getByRole('columnheader', { name: 'Support stiffness (N/mm, optional)' })).toBeInTheDocument();
    expect(within(points).getByLabelText('Support stiffness under point A')).toHaveValue('5000');
    expect(screen.getByTestId('support-stiffness-help')).toHaveTextContent(
      'stiffness of the floor or steel under the point; leave it empty for a rigid floor',
    );
    await user.type(within(points).getByLabelText('Support stiffness under point B'), '8000');
    await user.clear(within(points).getByLabelText('Support stiffness under point A'));

    await user.click(screen.getByRole('tab', { name: 'Equipment' }));
    await user.clear(screen.getByLabelText('Second mass of Pump'));
    await user.type(screen.getByLabelText('Second mass of Motor'), '430');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    const body = fake.calls('put', `/designs/${DESIGN_ID}`)[0]!.body as UpdateDesignInput;
    const expected = demoInput();
    expected.components[1]!.altMassKg = 430;
    expected.mountPoints[1]!.supportStiffnessNPerMm = 8000;
    expect(body.input).toEqual(expected);
    expect(body.input!.components[0]).not.toHaveProperty('altMassKg');
    expect(body.input!.mountPoints[0]).not.toHaveProperty('supportStiffnessNPerMm');
  });

  it('explains a second mass that is not positive in words and sends nothing', async () => {
    const { user, fake } = await openDesign();
    const alt = screen.getByLabelText('Second mass of Pump');
    await user.clear(alt);
    await user.type(alt, '0');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const problems = await screen.findByText('Some input needs attention before it can be saved');
    expect(problems.closest('.bp6-callout')).toHaveTextContent('Equipment, row 1 (Pump): The second mass must be more than 0');
    expect(screen.getByLabelText('Second mass of Pump')).toHaveAttribute('aria-invalid', 'true');
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(0);
  });
});
