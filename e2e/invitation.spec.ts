import { expect, test } from '@playwright/test';
import { linkIn, uniqueEmail, waitForMail } from './support/mailbox';

test('sign up, found a workspace, invite a reviewer who joins read-only', async ({ browser }) => {
  const ownerEmail = uniqueEmail('owner');
  const reviewerEmail = uniqueEmail('reviewer');
  const workspaceName = `Pilot line ${Date.now().toString(36)}`;

  const ownerContext = await browser.newContext();
  const owner = await ownerContext.newPage();
  await owner.goto('/sign-up');
  await owner.getByTestId('signup-name').fill('Marit Solberg');
  await owner.getByTestId('signup-email').fill(ownerEmail);
  await owner.getByTestId('signup-password').fill('pilot-line-owner-42');
  await owner.getByTestId('signup-password-confirm').fill('pilot-line-owner-42');
  await owner.getByTestId('signup-submit').click();

  await expect(owner).toHaveURL(/\/workspaces\/new/);
  await owner.getByTestId('workspace-name').fill(workspaceName);
  await owner.getByTestId('workspace-submit').click();
  await expect(owner).toHaveURL(/\/circuits/);

  await owner.getByTestId('new-circuit').click();
  await owner.getByTestId('new-circuit-title').fill('Pallet stop — first draft');
  await owner.getByTestId('new-circuit-submit').click();
  await expect(owner.getByTestId('circuit-row')).toHaveCount(1);

  await owner.goto('/workspace/members');
  await owner.getByTestId('invite-email').fill(reviewerEmail);
  await owner.getByTestId('invite-role').selectOption('reviewer');
  await owner.getByTestId('invite-submit').click();
  await expect(owner.getByText(reviewerEmail).first()).toBeVisible();

  // The owner reads the invitation in the local catcher through the Mailbox page.
  await owner.goto('/mailbox');
  await owner.getByTestId('mailbox-message').filter({ hasText: reviewerEmail }).first().click();
  const link = owner.getByTestId('mailbox-body').locator('a[href*="/invitations/accept"]');
  await expect(link).toBeVisible();
  const href = await link.getAttribute('href');
  expect(href).toBe(linkIn(await waitForMail(reviewerEmail, /invited you/), '/invitations/accept'));
  await owner.screenshot({ path: 'test-results/screens/mailbox-1440.png', fullPage: true });

  const reviewerContext = await browser.newContext();
  const reviewer = await reviewerContext.newPage();
  await reviewer.goto(href!);
  await expect(reviewer.getByText(workspaceName).first()).toBeVisible();
  await reviewer.getByTestId('invite-name').fill('Jonas Ebbe');
  await reviewer.getByTestId('invite-password').fill('pilot-line-review-7');
  await reviewer.getByTestId('invite-accept').click();

  await expect(reviewer).toHaveURL(/\/circuits/);
  await expect(reviewer.getByTestId('circuit-row')).toHaveCount(1);
  await expect(reviewer.getByText('Pallet stop — first draft')).toBeVisible();
  await expect(reviewer.getByTestId('new-circuit')).toHaveCount(0);
  await reviewer.screenshot({ path: 'test-results/screens/reviewer-circuits-1440.png', fullPage: true });

  const write = await reviewer.request.post('/api/circuits', { data: { title: 'Sneaky edit' } });
  expect(write.status()).toBe(403);
  expect(await write.json()).toMatchObject({ error: { code: 'forbidden:circuit' } });

  await ownerContext.close();
  await reviewerContext.close();
});
