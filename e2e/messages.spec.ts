import { expect, freshPage, test } from './support/test';
import { BUYER, GROWER, signInAs } from './support/accounts';

test('a buyer asks the grower about a lot from its page; the grower reads it in the inbox and answers', async ({ browser }) => {
  test.setTimeout(120_000);
  const question = `Can a semi reach the barn? (${Date.now().toString(36)})`;

  // A listed lot of the demo grower's farm (README: grower@ runs Larkspur Bend Farm).
  const buyerPage = await freshPage(browser);
  const listed = await (await buyerPage.request.get('/api/lots?pageSize=100')).json();
  const lot = (listed.items as { id: number; farmName: string }[]).find((l) => l.farmName === 'Larkspur Bend Farm')!;
  await signInAs(buyerPage, BUYER);
  await buyerPage.goto(`/hay/${lot.id}`);
  const ask = buyerPage.getByRole('region', { name: 'Ask the grower' });
  await ask.getByLabel('Your question').fill(question);
  await ask.getByRole('button', { name: 'Send to the grower' }).click();
  await expect(ask.getByRole('list', { name: 'Messages' })).toContainText(question);

  const growerPage = await freshPage(browser);
  await signInAs(growerPage, GROWER);
  await growerPage.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Messages' }).click();
  const conversation = growerPage.getByRole('list', { name: 'Conversations' }).getByRole('link').filter({ hasText: question });
  await conversation.first().click();
  await expect(growerPage.getByRole('list', { name: 'Messages' })).toContainText(question);
  await growerPage.getByLabel('Your answer').fill('Yes, the yard takes a 53 ft trailer.');
  await growerPage.getByRole('button', { name: 'Send' }).click();
  await expect(growerPage.getByRole('list', { name: 'Messages' })).toContainText('53 ft trailer');

  await buyerPage.reload();
  await expect(buyerPage.getByRole('region', { name: 'Ask the grower' })).toContainText('53 ft trailer');
});
