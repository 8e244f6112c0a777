import { ApiError } from '../../api/client';

/** The API's member errors, said in the words a farm owner needs. */
export function memberErrorMessage(error: unknown): string | null {
  if (!error) return null;
  if (error instanceof ApiError) {
    if (error.status === 409 && /owner/i.test(error.message)) {
      return 'A farm needs at least one owner: make someone else an owner before demoting or removing the last one.';
    }
    if (error.status === 400 && /already a member/i.test(error.message)) {
      return 'That person is already a member of this farm. Change their role in the table instead.';
    }
    if (error.status === 403) return 'Only the farm’s owners can manage its members.';
    return error.message;
  }
  return error instanceof Error ? error.message : 'Something went wrong.';
}

export function ownerCount(members: { role: string }[]): number {
  return members.filter((member) => member.role === 'owner').length;
}
