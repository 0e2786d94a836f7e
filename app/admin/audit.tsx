import { deferred } from '@/components/lazy/deferred';

const AuditScreen = deferred('AuditScreen');

export default AuditScreen;
