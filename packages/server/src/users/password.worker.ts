import bcrypt from 'bcryptjs';

/** One bcrypt job, run in a worker thread of PasswordService's pool. */
export type PasswordTask = { op: 'hash'; password: string; cost: number } | { op: 'compare'; password: string; hash: string };

export default function runPasswordTask(task: PasswordTask): string | boolean {
  return task.op === 'hash' ? bcrypt.hashSync(task.password, task.cost) : bcrypt.compareSync(task.password, task.hash);
}
