import { may, PERMISSIONS, type Role } from '@tracewright/shared';

/** Who may open the deviation, trend and dashboard pages (the API checks again on every call). */
export const QUALITY_READERS = PERMISSIONS.readQuality;

/** Only quality staff assign, comment, disposition, close, sign off runs and curate trends. */
export const canWriteQuality = (role: Role): boolean => may(role, 'decideQuality');
