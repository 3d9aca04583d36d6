-- AlterTable
ALTER TABLE "Site" ADD COLUMN     "co2KgPerGJ" DOUBLE PRECISION NOT NULL DEFAULT 56.1,
ADD COLUMN     "co2PriceCentsPerTonne" INTEGER NOT NULL DEFAULT 8000,
ADD COLUMN     "currency" TEXT NOT NULL DEFAULT 'EUR',
ADD COLUMN     "fuelPriceCentsPerGJ" INTEGER NOT NULL DEFAULT 800,
ADD COLUMN     "furnaceEfficiency" DOUBLE PRECISION NOT NULL DEFAULT 0.85;

-- AlterTable
ALTER TABLE "Asset" ADD COLUMN     "cleaningCostCents" INTEGER,
ADD COLUMN     "cleaningOutageDays" DOUBLE PRECISION,
ADD COLUMN     "co2KgPerGJ" DOUBLE PRECISION,
ADD COLUMN     "co2PriceCentsPerTonne" INTEGER,
ADD COLUMN     "fuelPriceCentsPerGJ" INTEGER,
ADD COLUMN     "furnaceEfficiency" DOUBLE PRECISION,
ADD COLUMN     "lostProductionCentsPerDay" INTEGER,
ADD COLUMN     "minimumOutletK" DOUBLE PRECISION,
ADD COLUMN     "minimumOutletStream" TEXT,
ADD COLUMN     "notes" TEXT NOT NULL DEFAULT '';

-- AlterTable
ALTER TABLE "Reading" ADD COLUMN     "coldPressureDropPa" DOUBLE PRECISION,
ADD COLUMN     "hotPressureDropPa" DOUBLE PRECISION,
ADD COLUMN     "importBatchId" INTEGER;

-- CreateTable
CREATE TABLE "AssetRevision" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "changedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "changedBy" TEXT NOT NULL,
    "action" TEXT NOT NULL,
    "changes" JSONB NOT NULL,

    CONSTRAINT "AssetRevision_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ColumnMapping" (
    "assetId" INTEGER NOT NULL,
    "mapping" JSONB NOT NULL,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL,

    CONSTRAINT "ColumnMapping_pkey" PRIMARY KEY ("assetId")
);

-- CreateTable
CREATE TABLE "ImportBatch" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "source" TEXT NOT NULL,
    "fileName" TEXT NOT NULL,
    "fileBytes" BIGINT NOT NULL DEFAULT 0,
    "startedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "finishedAt" TIMESTAMPTZ(3),
    "status" TEXT NOT NULL,
    "options" JSONB NOT NULL,
    "rowsRead" INTEGER NOT NULL DEFAULT 0,
    "rowsNew" INTEGER NOT NULL DEFAULT 0,
    "rowsChanged" INTEGER NOT NULL DEFAULT 0,
    "rowsUnchanged" INTEGER NOT NULL DEFAULT 0,
    "rowsRejected" INTEGER NOT NULL DEFAULT 0,
    "firstTime" TIMESTAMPTZ(3),
    "lastTime" TIMESTAMPTZ(3),
    "rejects" JSONB NOT NULL DEFAULT '[]',
    "error" TEXT,
    "createdBy" TEXT NOT NULL DEFAULT '',

    CONSTRAINT "ImportBatch_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "OperatingPeriod" (
    "assetId" INTEGER NOT NULL,
    "start" TIMESTAMPTZ(3) NOT NULL,
    "lengthS" INTEGER NOT NULL,
    "samplesTotal" INTEGER NOT NULL,
    "samplesUsed" INTEGER NOT NULL,
    "excluded" JSONB NOT NULL,
    "usable" BOOLEAN NOT NULL,
    "reason" TEXT,
    "hotInK" DOUBLE PRECISION,
    "hotOutK" DOUBLE PRECISION,
    "coldInK" DOUBLE PRECISION,
    "coldOutK" DOUBLE PRECISION,
    "hotFlowKgPerS" DOUBLE PRECISION,
    "coldFlowKgPerS" DOUBLE PRECISION,
    "hotDutyW" DOUBLE PRECISION,
    "coldDutyW" DOUBLE PRECISION,
    "closure" DOUBLE PRECISION,
    "recHotInK" DOUBLE PRECISION,
    "recHotOutK" DOUBLE PRECISION,
    "recColdInK" DOUBLE PRECISION,
    "recColdOutK" DOUBLE PRECISION,
    "recHotFlowKgPerS" DOUBLE PRECISION,
    "recColdFlowKgPerS" DOUBLE PRECISION,
    "recDutyW" DOUBLE PRECISION,
    "globalTest" DOUBLE PRECISION,
    "globalTestCritical" DOUBLE PRECISION,
    "suspectRole" TEXT,

    CONSTRAINT "OperatingPeriod_pkey" PRIMARY KEY ("assetId","lengthS","start")
);

-- CreateTable
CREATE TABLE "InstrumentAlert" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "role" TEXT NOT NULL,
    "instrumentTag" TEXT NOT NULL,
    "kind" TEXT NOT NULL,
    "start" TIMESTAMPTZ(3) NOT NULL,
    "end" TIMESTAMPTZ(3),
    "size" DOUBLE PRECISION NOT NULL,
    "sizeUnit" TEXT NOT NULL,
    "evidence" TEXT NOT NULL,
    "detectedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "acknowledgedAt" TIMESTAMPTZ(3),
    "acknowledgedBy" TEXT,
    "note" TEXT NOT NULL DEFAULT '',

    CONSTRAINT "InstrumentAlert_pkey" PRIMARY KEY ("id")
);

-- CreateIndex
CREATE INDEX "AssetRevision_assetId_changedAt_idx" ON "AssetRevision"("assetId", "changedAt");

-- CreateIndex
CREATE INDEX "ImportBatch_assetId_startedAt_idx" ON "ImportBatch"("assetId", "startedAt");

-- CreateIndex
CREATE INDEX "InstrumentAlert_assetId_acknowledgedAt_idx" ON "InstrumentAlert"("assetId", "acknowledgedAt");

-- CreateIndex
CREATE UNIQUE INDEX "InstrumentAlert_assetId_role_kind_start_key" ON "InstrumentAlert"("assetId", "role", "kind", "start");

-- AddForeignKey
ALTER TABLE "AssetRevision" ADD CONSTRAINT "AssetRevision_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ColumnMapping" ADD CONSTRAINT "ColumnMapping_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "ImportBatch" ADD CONSTRAINT "ImportBatch_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "OperatingPeriod" ADD CONSTRAINT "OperatingPeriod_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "InstrumentAlert" ADD CONSTRAINT "InstrumentAlert_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

