-- AlterTable
ALTER TABLE "Cleaning" ADD COLUMN     "createdBy" TEXT NOT NULL DEFAULT '',
ADD COLUMN     "effectiveness" DOUBLE PRECISION,
ADD COLUMN     "endDate" TIMESTAMPTZ(3),
ADD COLUMN     "foulingAfterM2KPerW" DOUBLE PRECISION,
ADD COLUMN     "foulingBeforeM2KPerW" DOUBLE PRECISION;

-- CreateTable
CREATE TABLE "AssetAssessment" (
    "assetId" INTEGER NOT NULL,
    "computedAt" TIMESTAMPTZ(3) NOT NULL DEFAULT CURRENT_TIMESTAMP,
    "asOf" TIMESTAMPTZ(3) NOT NULL,
    "result" JSONB NOT NULL,

    CONSTRAINT "AssetAssessment_pkey" PRIMARY KEY ("assetId")
);

-- AddForeignKey
ALTER TABLE "AssetAssessment" ADD CONSTRAINT "AssetAssessment_assetId_fkey" FOREIGN KEY ("assetId") REFERENCES "Asset"("id") ON DELETE CASCADE ON UPDATE CASCADE;

