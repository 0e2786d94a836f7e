import { SynonymsScreen } from '@/components/desk/SynonymsScreen';

export default SynonymsScreen;
