import { Initial1796140000000 } from './1796140000000-Initial';
import { SheetUpdates1796150000000 } from './1796150000000-SheetUpdates';
import { CheckAndApproval1796163000000 } from './1796163000000-CheckAndApproval';
import { TemplatesAndMaterials1796165000000 } from './1796165000000-TemplatesAndMaterials';
import { RevisionFrozenMaterials1796166000000 } from './1796166000000-RevisionFrozenMaterials';
import { RecordGuards1796171100000 } from './1796171100000-RecordGuards';

/** Every migration in order, listed explicitly (no glob loading under tsx or Vitest). */
export const MIGRATIONS = [Initial1796140000000, SheetUpdates1796150000000, CheckAndApproval1796163000000, TemplatesAndMaterials1796165000000, RevisionFrozenMaterials1796166000000, RecordGuards1796171100000];
