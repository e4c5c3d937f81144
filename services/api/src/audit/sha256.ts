import { createHash } from 'node:crypto';
import type { Sha256Hex } from '@tallyloom/core';

/** The hash the audit chain uses: hex SHA-256 of the text's UTF-8 bytes. */
export const sha256Hex: Sha256Hex = (text) =>
  createHash('sha256').update(text, 'utf8').digest('hex');
