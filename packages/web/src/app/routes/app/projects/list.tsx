import '@/styles/workspace.css';

import { ProjectsList } from '@/features/projects/components/projects-list';

export function Component() {
  return <ProjectsList />;
}
