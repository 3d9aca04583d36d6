-- AlterTable
ALTER TABLE "Site" ADD COLUMN     "cleaningCostCents" INTEGER NOT NULL DEFAULT 3000000,
ADD COLUMN     "cleaningOutageDays" DOUBLE PRECISION NOT NULL DEFAULT 5,
ADD COLUMN     "lostProductionCentsPerDay" INTEGER NOT NULL DEFAULT 0;

-- CreateTable
CREATE TABLE "PlanSettings" (
    "siteId" INTEGER NOT NULL,
    "crewCapacity" INTEGER NOT NULL DEFAULT 2,
    "horizonWeeks" INTEGER NOT NULL DEFAULT 52,
    "deadlineQuantile" TEXT NOT NULL DEFAULT 'p10',
    "minimumDaysBetweenCleanings" INTEGER NOT NULL DEFAULT 90,
    "timeLimitSeconds" INTEGER NOT NULL DEFAULT 30,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL,
    "updatedBy" TEXT NOT NULL DEFAULT '',

    CONSTRAINT "PlanSettings_pkey" PRIMARY KEY ("siteId")
);

-- CreateTable
CREATE TABLE "CalendarWindow" (
    "id" SERIAL NOT NULL,
    "siteId" INTEGER NOT NULL,
    "kind" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "startDate" DATE NOT NULL,
    "endDate" DATE NOT NULL,
    "createdBy" TEXT NOT NULL DEFAULT '',
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "CalendarWindow_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ExclusionGroup" (
    "id" SERIAL NOT NULL,
    "siteId" INTEGER NOT NULL,
    "name" TEXT NOT NULL,

    CONSTRAINT "ExclusionGroup_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ExclusionGroupMember" (
    "groupId" INTEGER NOT NULL,
    "assetId" INTEGER NOT NULL,

    CONSTRAINT "ExclusionGroupMember_pkey" PRIMARY KEY ("groupId","assetId")
);

-- CreateTable
CREATE TABLE "CleaningBooking" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "weekStart" DATE NOT NULL,
    "origin" TEXT NOT NULL,
    "planRunId" INTEGER,
    "note" TEXT NOT NULL DEFAULT '',
    "createdBy" TEXT NOT NULL DEFAULT '',
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "CleaningBooking_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "PlanRun" (
    "id" SERIAL NOT NULL,
    "siteId" INTEGER NOT NULL,
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "createdBy" TEXT NOT NULL DEFAULT '',
    "kind" TEXT NOT NULL,
    "horizonStart" DATE NOT NULL,
    "weeks" INTEGER NOT NULL,
    "inputs" JSONB NOT NULL,
    "status" TEXT NOT NULL,
    "solverStatus" TEXT NOT NULL,
    "gap" DOUBLE PRECISION,
    "solveSeconds" DOUBLE PRECISION NOT NULL,
    "planCost" DOUBLE PRECISION NOT NULL,
    "noCleaningCost" DOUBLE PRECISION NOT NULL,
    "saving" DOUBLE PRECISION NOT NULL,
    "result" JSONB NOT NULL,
    "previousRunId" INTEGER,
    "comparison" JSONB,

    CONSTRAINT "PlanRun_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "user" (
    "id" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "email" TEXT NOT NULL,
    "emailVerified" BOOLEAN NOT NULL DEFAULT false,
    "image" TEXT,
    "role" TEXT NOT NULL DEFAULT 'viewer',
    "unitSystem" TEXT NOT NULL DEFAULT 'si',
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "user_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "session" (
    "id" TEXT NOT NULL,
    "expiresAt" TIMESTAMPTZ(3) NOT NULL,
    "token" TEXT NOT NULL,
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL,
    "ipAddress" TEXT,
    "userAgent" TEXT,
    "userId" TEXT NOT NULL,

    CONSTRAINT "session_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "account" (
    "id" TEXT NOT NULL,
    "accountId" TEXT NOT NULL,
    "providerId" TEXT NOT NULL,
    "userId" TEXT NOT NULL,
    "accessToken" TEXT,
    "refreshToken" TEXT,
    "idToken" TEXT,
    "accessTokenExpiresAt" TIMESTAMPTZ(3),
    "refreshTokenExpiresAt" TIMESTAMPTZ(3),
    "scope" TEXT,
    "password" TEXT,
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL,

    CONSTRAINT "account_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "verification" (
    "id" TEXT NOT NULL,
    "identifier" TEXT NOT NULL,
    "value" TEXT NOT NULL,
    "expiresAt" TIMESTAMPTZ(3) NOT NULL,
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "verification_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "AuditEvent" (
    "id" SERIAL NOT NULL,
    "at" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "userId" TEXT,
    "actor" TEXT NOT NULL,
    "action" TEXT NOT NULL,
    "entity" TEXT NOT NULL,
    "entityId" TEXT NOT NULL,
    "summary" TEXT NOT NULL,
    "details" JSONB NOT NULL DEFAULT '{}',

    CONSTRAINT "AuditEvent_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "CalendarWindow_siteId_startDate_idx" ON "CalendarWindow"("siteId", "startDate");

-- CreateIndex
CREATE UNIQUE INDEX "ExclusionGroup_siteId_name_key" ON "ExclusionGroup"("siteId", "name");

-- CreateIndex
CREATE UNIQUE INDEX "CleaningBooking_assetId_weekStart_key" ON "CleaningBooking"("assetId", "weekStart");

-- CreateIndex
CREATE INDEX "PlanRun_siteId_createdAt_idx" ON "PlanRun"("siteId", "createdAt");

-- CreateIndex
CREATE UNIQUE INDEX "user_email_key" ON "user"("email");

-- CreateIndex
CREATE UNIQUE INDEX "session_token_key" ON "session"("token");

-- CreateIndex
CREATE INDEX "session_userId_idx" ON "session"("userId");

-- CreateIndex
CREATE INDEX "account_userId_idx" ON "account"("userId");

-- CreateIndex
CREATE INDEX "verification_identifier_idx" ON "verification"("identifier");

-- CreateIndex
CREATE INDEX "AuditEvent_at_idx" ON "AuditEvent"("at");

-- CreateIndex
CREATE INDEX "AuditEvent_entity_entityId_idx" ON "AuditEvent"("entity", "entityId");

-- AddForeignKey
ALTER TABLE "PlanSettings" ADD CONSTRAINT "PlanSettings_siteId_fkey" FOREIGN KEY ("siteId") REFERENCES "Site"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CalendarWindow" ADD CONSTRAINT "CalendarWindow_siteId_fkey" FOREIGN KEY ("siteId") REFERENCES "Site"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ExclusionGroup" ADD CONSTRAINT "ExclusionGroup_siteId_fkey" FOREIGN KEY ("siteId") REFERENCES "Site"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ExclusionGroupMember" ADD CONSTRAINT "ExclusionGroupMember_groupId_fkey" FOREIGN KEY ("groupId") REFERENCES "ExclusionGroup"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ExclusionGroupMember" ADD CONSTRAINT "ExclusionGroupMember_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "CleaningBooking" ADD CONSTRAINT "CleaningBooking_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "PlanRun" ADD CONSTRAINT "PlanRun_siteId_fkey" FOREIGN KEY ("siteId") REFERENCES "Site"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "session" ADD CONSTRAINT "session_userId_fkey" FOREIGN KEY ("userId") REFERENCES "user"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "account" ADD CONSTRAINT "account_userId_fkey" FOREIGN KEY ("userId") REFERENCES "user"("id") ON DELETE CASCADE ON UPDATE CASCADE;

