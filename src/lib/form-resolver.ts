// The resolver every form uses: the shared zod schema, with validation problems in plain sentences
// (shared/plain-messages.ts installs its error map when this module loads, with the first form's
// chunk, so the first page carries neither the map nor the labels).
import '../../shared/plain-messages';

export { zodResolver as formResolver } from '@hookform/resolvers/zod';
