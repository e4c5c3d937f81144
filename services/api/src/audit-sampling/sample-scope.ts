import { ROLE_SCOPE } from '@tallyloom/core';
import type { WhereOptions } from 'sequelize';
import type { Actor } from '../common/access/actor';

/**
 * Samples a person may see. Samples are drawn network-wide by auditors and read by auditors and
 * admins, all of whom see the whole network; a narrower role (none holds the sampling policies
 * today) sees none rather than samples whose items it might not be allowed to know about.
 */
export function sampleScope(actor: Actor): WhereOptions {
  return ROLE_SCOPE[actor.role] === 'network' ? {} : { id: -1 };
}
