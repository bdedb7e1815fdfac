import { Card } from '@blueprintjs/core';

import { PageHeader } from '@/components/page-header';
import { SafetyCautions } from '@/components/safety-cautions';
import { WorkLists } from '@/features/work/components/work-lists';
import { useUser } from '@/lib/auth';
import { areasFor, ROLE_LABELS, type AreaKey, type Role } from '@/lib/authorization';

/** What each area is for, in the words of the role looking at it. */
const AREA_PURPOSE: Record<Exclude<AreaKey, 'overview'>, Partial<Record<Role, string>> & { default: string }> = {
  projects: {
    default: 'Read projects, their designs and the figures behind each choice of mount.',
    admin: 'Every project and design, their revisions and their check and release.',
    engineer:
      'Create projects and designs, describe the machine and its speeds, run a selection and send the design for check — or check a colleague’s.',
    purchaser: 'Find the released designs you will buy mounts for.',
  },
  catalog: {
    default: 'Browse the mounts of every supplier with their rated load, stiffness, damping and temperature range.',
    admin: 'The multi-supplier mount catalog, its suppliers and its CSV imports.',
    catalog_manager: 'Add, edit and retire mounts and suppliers; import the catalog from CSV and export it again.',
  },
  purchasing: {
    default: 'Bills of materials, calculation reports, requests for quotation and order status for released designs.',
  },
  people: {
    default: 'Add people, give each one a role, and deactivate accounts that are no longer needed.',
  },
  outbox: {
    default: 'Read the e-mail Tacet has sent, such as requests for quotation, as the local mail catcher received it.',
  },
};

const ROLE_SUMMARY: Record<Role, string> = {
  admin: 'You can use every area of Tacet and manage who else can.',
  catalog_manager: 'You keep the mount catalog complete and correct for everyone who sizes with it.',
  engineer: 'You size mounts for machines, and check and release other engineers’ designs.',
  purchaser: 'You turn released designs into orders.',
  viewer: 'You can read projects, designs and the catalog.',
};

function firstName(name: string): string {
  return name.trim().split(/\s+/)[0] ?? name;
}

export function Component() {
  const user = useUser();
  const areas = areasFor(user.role).filter((area) => area.key !== 'overview');

  return (
    <>
      <PageHeader
        title={`Welcome, ${firstName(user.name)}`}
        description={
          <>
            Signed in as <strong>{ROLE_LABELS[user.role]}</strong>. {ROLE_SUMMARY[user.role]}
          </>
        }
      />
      {user.role !== 'catalog_manager' ? (
        <section aria-labelledby="tc-overview-work" className="tc-section">
          <h2 id="tc-overview-work" className="tc-section-title">
            Your work
          </h2>
          <WorkLists role={user.role} userId={user.id} />
        </section>
      ) : null}
      <section aria-labelledby="tc-overview-areas" className="tc-section">
        <h2 id="tc-overview-areas" className="tc-section-title">
          Your areas
        </h2>
        <div className="tc-area-grid">
          {areas.map((area) => {
            const purpose = AREA_PURPOSE[area.key as Exclude<AreaKey, 'overview'>];
            return (
              <Card key={area.key} className="tc-area-card">
                <h3 className="tc-area-card-title">{area.label}</h3>
                <p>{purpose[user.role] ?? purpose.default}</p>
              </Card>
            );
          })}
        </div>
      </section>
      <section aria-label="Cautions" className="tc-section">
        <SafetyCautions />
      </section>
    </>
  );
}
