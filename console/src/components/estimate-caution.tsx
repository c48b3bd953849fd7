import { InfoCircledIcon } from '@radix-ui/react-icons';
import { Callout } from '@radix-ui/themes';

// Shown beside every statistical result: the numbers hold only under the model's assumptions.
export function EstimateCaution() {
  return (
    <Callout.Root size="1" variant="surface" color="amber" className="ll-estimate-caution">
      <Callout.Icon>
        <InfoCircledIcon />
      </Callout.Icon>
      <Callout.Text>
        These are estimates that hold only if the model&rsquo;s assumptions do, not financial advice. Apply your
        organisation&rsquo;s model-risk and licensed-practice rules before acting on them.
      </Callout.Text>
    </Callout.Root>
  );
}
