import { expect, test } from "@playwright/test";
import { DEMO, signInThroughPage, uniqueEmail } from "./support/accounts";
import { linkTo, waitForMail } from "./support/mail";

const shot = (name: string) => ({ path: `tests/e2e/screenshots/${name}.png`, fullPage: true });

test("an owner invites a planner, who follows the mailed link and joins the organisation", async ({ page, browser }) => {
  const email = uniqueEmail("juno");
  await signInThroughPage(page, DEMO.owner.email);
  await page.goto("/organisation");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Role", { exact: true }).selectOption("planner");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText(`Invitation sent to ${email}.`)).toBeVisible();
  const invitations = page.locator("section").filter({ has: page.getByRole("heading", { name: "Invitations" }) });
  const row = invitations.getByRole("row").filter({ hasText: email });
  await expect(row).toContainText("Waiting");
  await page.screenshot(shot("organisation-owner"));

  const mail = await waitForMail(email, /You are invited to Tallowmere Tag-Along Tours/);
  const invitee = await browser.newContext();
  const guest = await invitee.newPage();
  await guest.goto(linkTo(mail, "/invite"));
  await expect(guest.getByText(`invited ${email} to join ${DEMO.teamName} as a planner`)).toBeVisible();
  await guest.screenshot(shot("invitation-accept"));
  await guest.getByLabel("Your name").fill("Juno Fairweather");
  await guest.getByLabel("Password", { exact: true }).fill("ridge line after rain");
  await guest.getByRole("button", { name: "Create account and join" }).click();
  await expect(guest).toHaveURL(/\/organisation$/);
  await expect(guest.getByRole("heading", { level: 1 })).toHaveText(DEMO.teamName);
  await expect(guest.getByTestId("active-role")).toHaveText("Your role: planner");
  await expect(guest.getByRole("row").filter({ hasText: "Juno Fairweather" })).toContainText("Planner");
  await guest.screenshot(shot("organisation-new-planner"));

  // The link is single-use.
  const again = await browser.newContext();
  const second = await again.newPage();
  await second.goto(linkTo(mail, "/invite"));
  await expect(second.getByText("This invitation has already been used.")).toBeVisible();
  await invitee.close();
  await again.close();

  await page.reload();
  await expect(row).toContainText("Accepted");
  await expect(page.locator("section").filter({ has: page.getByRole("heading", { name: "Members" }) })).toContainText("Juno Fairweather");
});
