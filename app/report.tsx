import { ReportSightingScreen } from '@/components/submissions/ReportSightingScreen';

export default ReportSightingScreen;
