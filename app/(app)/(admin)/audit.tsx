import { AuditScreen } from '@/components/audit/audit-screen';

export default AuditScreen;
