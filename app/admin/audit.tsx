import { AuditScreen } from '@/components/admin/AuditScreen';

export default AuditScreen;
