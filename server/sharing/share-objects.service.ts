import type { ShareObjectType } from '../../shared/schemas/share-link.ts';
import { setupRevisionShare } from './setup-share.service.ts';
import type { ShareableKind } from './shareable-kind.ts';
import { studyShare } from './study-share.service.ts';

/** Kinds that can be shared today; a study joins by adding its entry. */
export const shareableKinds: Partial<Record<ShareObjectType, ShareableKind>> = { setup_revision: setupRevisionShare, study: studyShare };
