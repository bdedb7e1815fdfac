import '@/styles/workspace.css';

import { Button, Callout } from '@blueprintjs/core';
import { ChevronLeftIcon } from '@blueprintjs/icons';
import { Link, useParams } from 'react-router-dom';

import { NotFound } from '@/components/errors/not-found';
import { PageLoader } from '@/components/page-loader';
import { useDesign } from '@/features/designs/api/get-design';
import { DesignPurchasing } from '@/features/purchasing/components/design-purchasing';
import { errorMessage, errorStatus } from '@/lib/api-errors';

/**
 * One design's purchasing view: the design (designs feature) handed to the BOM, documents and
 * requests for quotation (purchasing feature).
 */
export function Component() {
  const designId = Number(useParams().designId);
  const valid = Number.isInteger(designId) && designId > 0;
  const design = useDesign(valid ? designId : 0);

  if (!valid || errorStatus(design.error) === 404) return <NotFound />;
  if (design.isPending) return <PageLoader label="Loading the design" />;
  if (design.isError) {
    return (
      <Callout intent="danger" title="The design could not be loaded">
        <p>{errorMessage(design.error)}</p>
        <Button text="Try again" onClick={() => void design.refetch()} />
      </Callout>
    );
  }
  return (
    <div className="tc-purchase-page">
      <Link to="/purchasing" className="tc-back-link">
        <ChevronLeftIcon /> Purchasing
      </Link>
      <DesignPurchasing design={design.data} />
    </div>
  );
}
