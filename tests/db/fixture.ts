// One company with a job that touches every table, for the cascade tests.
import type { Db } from "@/db";
import * as s from "@/db/schema";

export async function buildCompany(db: Db, slug: string) {
  const [company] = await db.insert(s.companies).values({ name: `Co ${slug}`, slug }).returning();
  const user = async (role: s.Role, name: string) =>
    (
      await db
        .insert(s.users)
        .values({ companyId: company.id, email: `${name}@${slug}.example`, name, role })
        .returning()
    )[0];
  const owner = await user("owner", "owner");
  const auditor = await user("auditor", "auditor");
  const installer = await user("installer", "installer");
  const homeowner = await user("homeowner", "homeowner");
  const [client] = await db
    .insert(s.clients)
    .values({ companyId: company.id, userId: homeowner.id, name: "Client" })
    .returning();
  const [house] = await db
    .insert(s.houses)
    .values({
      companyId: company.id,
      clientId: client.id,
      street: "1 Test Row",
      city: "Testville",
      state: "NJ",
      postalCode: "07000",
      yearBuilt: 1930,
      stories: 2,
      conditionedAreaFt2: 1500,
      volumeFt3: 12000,
      bedrooms: 3,
      foundation: "basement",
    })
    .returning();
  const [job] = await db
    .insert(s.jobs)
    .values({ companyId: company.id, number: 1, houseId: house.id, clientId: client.id, title: "Job", auditorId: auditor.id, createdById: owner.id })
    .returning();
  await db.insert(s.jobCrew).values({ jobId: job.id, userId: installer.id });
  await db.insert(s.jobStageEvents).values({ jobId: job.id, toStage: "intake", byUserId: owner.id });
  await db.insert(s.heatingSystems).values({ jobId: job.id, fuel: "gas", efficiency: 0.8, fuelPriceCentsPerUnit: 140, label: "Furnace" });
  const [assembly] = await db.insert(s.assemblies).values({ companyId: company.id, name: "Wall", kind: "wall" }).returning();
  await db.insert(s.assemblyLayers).values({ assemblyId: assembly.id, position: 0, materialKey: "test-material" });
  const [jobAssembly] = await db
    .insert(s.assemblies)
    .values({ companyId: company.id, jobId: job.id, name: "North wall as found", kind: "wall" })
    .returning();
  const [wall] = await db
    .insert(s.surfaces)
    .values({ jobId: job.id, label: "North wall", kind: "wall", orientation: "N", grossAreaFt2: 300, existingAssemblyId: assembly.id, proposedAssemblyId: jobAssembly.id })
    .returning();
  const [window] = await db
    .insert(s.surfaces)
    .values({ jobId: job.id, label: "Window", kind: "window", orientation: "N", grossAreaFt2: 15, parentSurfaceId: wall.id })
    .returning();
  await db.insert(s.leakageTests).values({ jobId: job.id, phase: "test-in", cfm50: 3000, testedAt: new Date(), recordedById: auditor.id });
  const [item] = await db
    .insert(s.priceBookItems)
    .values({ companyId: company.id, code: "BAG", name: "Bag", kind: "material", unit: "bag", unitPriceCents: 1500 })
    .returning();
  const [upgrade] = await db
    .insert(s.upgrades)
    .values({ jobId: job.id, type: "dense-pack-walls", lifeYears: 30, priceBookItemId: item.id, params: { surfaceIds: [wall.id] } })
    .returning();
  const [proposal] = await db.insert(s.proposals).values({ jobId: job.id, taxRatePpm: 0 }).returning();
  await db.insert(s.proposalLineItems).values({
    proposalId: proposal.id,
    position: 0,
    priceBookItemId: item.id,
    upgradeId: upgrade.id,
    description: "Cellulose",
    quantity: 10,
    unit: "bag",
    unitPriceCents: 1500,
    totalCents: 15000,
  });
  const [log] = await db
    .insert(s.crewLogEntries)
    .values({ jobId: job.id, surfaceId: wall.id, userId: installer.id, clientRequestId: crypto.randomUUID(), loggedAt: new Date() })
    .returning();
  await db.insert(s.safetyAcknowledgements).values({ jobId: job.id, userId: installer.id, cautionKeys: ["dust"] });
  await db.insert(s.photos).values({
    companyId: company.id,
    jobId: job.id,
    surfaceId: wall.id,
    crewLogEntryId: log.id,
    tag: "before",
    storageKey: `${slug}/${crypto.randomUUID()}.jpg`,
    contentType: "image/jpeg",
    bytes: 1000,
    uploadedById: installer.id,
  });
  await db.insert(s.mailOutbox).values({ companyId: company.id, to: "c@example.test", subject: "Hi", text: "Hi", kind: "test", relatedJobId: job.id });
  await db.insert(s.authTokens).values({ userId: homeowner.id, purpose: "invite", tokenHash: crypto.randomUUID(), expiresAt: new Date() });
  await db.insert(s.activityLog).values({ companyId: company.id, userId: auditor.id, action: "job.create", entityType: "job", entityId: job.id });
  return { company, owner, auditor, installer, homeowner, client, house, job, assembly, jobAssembly, wall, window, item, upgrade, proposal };
}

export async function issueProposal(db: Db, f: Awaited<ReturnType<typeof buildCompany>>) {
  const [doc] = await db
    .insert(s.issuedDocuments)
    .values({
      companyId: f.company.id,
      jobId: f.job.id,
      kind: "proposal",
      version: 1,
      snapshot: { total: 15000 },
      contentHash: "abc",
      issuedById: f.auditor.id,
      proposalId: f.proposal.id,
    })
    .returning();
  await db.insert(s.acceptances).values({ issuedDocumentId: doc.id, name: "Client", documentHash: "abc", userId: f.homeowner.id });
  return doc;
}
