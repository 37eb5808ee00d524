// The hooks the sync router runs after each applied push (see after-apply.ts). Add yours with one line.
import type { AppDeps } from '../../app-deps';
import { notificationsAfterApply } from '../notifications/notify-after-apply';
import type { AfterApplyHook } from './after-apply';

export const AFTER_APPLY_HOOKS: ((deps: AppDeps) => AfterApplyHook)[] = [notificationsAfterApply];
