import { Empty } from '../../../components/ui/feedback';

export function Component() {
  return <Empty title="This section is being built" />;
}
