-- CreateSchema
CREATE SCHEMA IF NOT EXISTS "public";

-- CreateTable
CREATE TABLE "Site" (
    "id" SERIAL NOT NULL,
    "code" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "timeZone" TEXT NOT NULL,
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Site_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "ProcessUnit" (
    "id" SERIAL NOT NULL,
    "siteId" INTEGER NOT NULL,
    "code" TEXT NOT NULL,
    "name" TEXT NOT NULL,

    CONSTRAINT "ProcessUnit_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Asset" (
    "id" SERIAL NOT NULL,
    "tag" TEXT NOT NULL,
    "name" TEXT NOT NULL,
    "unitId" INTEGER NOT NULL,
    "service" TEXT NOT NULL,
    "arrangementKind" TEXT NOT NULL,
    "shells" INTEGER NOT NULL DEFAULT 1,
    "tubePasses" INTEGER NOT NULL DEFAULT 2,
    "mixedStream" TEXT,
    "areaM2" DOUBLE PRECISION NOT NULL,
    "hotStreamName" TEXT NOT NULL,
    "hotCpKind" TEXT NOT NULL,
    "hotCpIntercept" DOUBLE PRECISION NOT NULL,
    "hotCpSlope" DOUBLE PRECISION NOT NULL DEFAULT 0,
    "coldStreamName" TEXT NOT NULL,
    "coldCpKind" TEXT NOT NULL,
    "coldCpIntercept" DOUBLE PRECISION NOT NULL,
    "coldCpSlope" DOUBLE PRECISION NOT NULL DEFAULT 0,
    "designDutyW" DOUBLE PRECISION NOT NULL,
    "designUWPerM2K" DOUBLE PRECISION NOT NULL,
    "designFoulingM2KPerW" DOUBLE PRECISION NOT NULL,
    "refHotInletK" DOUBLE PRECISION NOT NULL,
    "refColdInletK" DOUBLE PRECISION NOT NULL,
    "refHotFlowKgPerS" DOUBLE PRECISION NOT NULL,
    "refColdFlowKgPerS" DOUBLE PRECISION NOT NULL,
    "dutyThresholdW" DOUBLE PRECISION NOT NULL,
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "updatedAt" TIMESTAMPTZ(3) NOT NULL,

    CONSTRAINT "Asset_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Instrument" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "role" TEXT NOT NULL,
    "tag" TEXT NOT NULL,
    "standardUncertainty" DOUBLE PRECISION NOT NULL,

    CONSTRAINT "Instrument_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "Reading" (
    "assetId" INTEGER NOT NULL,
    "time" TIMESTAMPTZ(3) NOT NULL,
    "hotInK" DOUBLE PRECISION,
    "hotOutK" DOUBLE PRECISION,
    "coldInK" DOUBLE PRECISION,
    "coldOutK" DOUBLE PRECISION,
    "hotFlowKgPerS" DOUBLE PRECISION,
    "coldFlowKgPerS" DOUBLE PRECISION,

    CONSTRAINT "Reading_pkey" PRIMARY KEY ("assetId","time")
);

-- CreateTable
CREATE TABLE "Cleaning" (
    "id" SERIAL NOT NULL,
    "assetId" INTEGER NOT NULL,
    "date" TIMESTAMPTZ(3) NOT NULL,
    "method" TEXT NOT NULL,
    "costCents" INTEGER,
    "notes" TEXT NOT NULL DEFAULT '',
    "createdAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,

    CONSTRAINT "Cleaning_pkey" PRIMARY KEY ("id")
);

-- CreateTable
CREATE TABLE "DemoTruth" (
    "assetId" INTEGER NOT NULL,
    "truth" JSONB NOT NULL,

    CONSTRAINT "DemoTruth_pkey" PRIMARY KEY ("assetId")
);

-- CreateIndex
CREATE UNIQUE INDEX "Site_code_key" ON "Site"("code");

-- CreateIndex
CREATE UNIQUE INDEX "ProcessUnit_siteId_code_key" ON "ProcessUnit"("siteId", "code");

-- CreateIndex
CREATE UNIQUE INDEX "Asset_tag_key" ON "Asset"("tag");

-- CreateIndex
CREATE UNIQUE INDEX "Instrument_assetId_role_key" ON "Instrument"("assetId", "role");

-- CreateIndex
CREATE INDEX "Cleaning_assetId_date_idx" ON "Cleaning"("assetId", "date");

-- AddForeignKey
ALTER TABLE "ProcessUnit" ADD CONSTRAINT "ProcessUnit_siteId_fkey" FOREIGN KEY ("siteId") REFERENCES "Site"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Asset" ADD CONSTRAINT "Asset_unitId_fkey" FOREIGN KEY ("unitId") REFERENCES "ProcessUnit"("id") ON DELETE RESTRICT ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Instrument" ADD CONSTRAINT "Instrument_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Reading" ADD CONSTRAINT "Reading_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "Cleaning" ADD CONSTRAINT "Cleaning_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

-- AddForeignKey
ALTER TABLE "DemoTruth" ADD CONSTRAINT "DemoTruth_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

