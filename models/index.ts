import 'server-only';
import { sequelize } from '@/lib/data/db';
import { Company, initCompany } from './company';
import { User, initUser } from './user';
import { Crew, initCrew } from './crew';
import { CrewMember, initCrewMember } from './crew-member';
import { Customer, initCustomer } from './customer';
import { Site, initSite } from './site';
import { AccessPoint, initAccessPoint } from './access-point';
import { Segment, initSegment } from './segment';
import { Job, initJob } from './job';
import { Repair, initRepair } from './repair';
import { ResinSystem, initResinSystem } from './resin-system';
import { ResinKit, initResinKit } from './resin-kit';
import { Packer, initPacker } from './packer';
import { ChecklistTemplate, initChecklistTemplate } from './checklist-template';
import { Install, initInstall } from './install';
import { InstallEvent, initInstallEvent } from './install-event';
import { Attachment, initAttachment } from './attachment';
import { Review, initReview } from './review';
import { AuditEntry, initAuditEntry } from './audit-entry';
import { Invoice, initInvoice } from './invoice';
import { InvoiceLine, initInvoiceLine } from './invoice-line';
import { PaymentEvent, initPaymentEvent } from './payment-event';
import { ReportSend, initReportSend } from './report-send';
import { ReportLink, initReportLink } from './report-link';

// Initialise once per process (the module may be evaluated again by dev hot reload).
const initialised = globalThis as unknown as { setlineModelsReady?: boolean };
if (!initialised.setlineModelsReady || !Company.sequelize) {
  const inits = [
    initCompany,
    initUser,
    initCrew,
    initCrewMember,
    initCustomer,
    initSite,
    initAccessPoint,
    initSegment,
    initJob,
    initRepair,
    initResinSystem,
    initResinKit,
    initPacker,
    initChecklistTemplate,
    initInstall,
    initInstallEvent,
    initAttachment,
    initReview,
    initAuditEntry,
    initInvoice,
    initInvoiceLine,
    initPaymentEvent,
    initReportSend,
    initReportLink,
  ];
  for (const init of inits) {
    init(sequelize);
  }
  associate();
  initialised.setlineModelsReady = true;
}

function associate() {
  Company.hasMany(User, { foreignKey: 'companyId', as: 'users' });
  User.belongsTo(Company, { foreignKey: 'companyId', as: 'company' });

  Crew.belongsToMany(User, { through: CrewMember, foreignKey: 'crewId', otherKey: 'userId', as: 'members' });
  User.belongsToMany(Crew, { through: CrewMember, foreignKey: 'userId', otherKey: 'crewId', as: 'crews' });
  CrewMember.belongsTo(Crew, { foreignKey: 'crewId', as: 'crew' });
  CrewMember.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  Customer.hasMany(Site, { foreignKey: 'customerId', as: 'sites' });
  Site.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Site.hasMany(AccessPoint, { foreignKey: 'siteId', as: 'accessPoints' });
  AccessPoint.belongsTo(Site, { foreignKey: 'siteId', as: 'site' });
  Site.hasMany(Segment, { foreignKey: 'siteId', as: 'segments' });
  Segment.belongsTo(Site, { foreignKey: 'siteId', as: 'site' });
  Segment.belongsTo(AccessPoint, { foreignKey: 'fromAccessPointId', as: 'fromAccessPoint' });
  Segment.belongsTo(AccessPoint, { foreignKey: 'toAccessPointId', as: 'toAccessPoint' });

  Job.belongsTo(Customer, { foreignKey: 'customerId', as: 'customer' });
  Job.belongsTo(Site, { foreignKey: 'siteId', as: 'site' });
  Job.belongsTo(Crew, { foreignKey: 'crewId', as: 'crew' });
  Job.hasMany(Repair, { foreignKey: 'jobId', as: 'repairs' });
  Repair.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  Repair.belongsTo(Segment, { foreignKey: 'segmentId', as: 'segment' });
  Repair.belongsTo(AccessPoint, { foreignKey: 'fromAccessPointId', as: 'fromAccessPoint' });
  Repair.hasMany(Install, { foreignKey: 'repairId', as: 'installs' });

  ResinSystem.hasMany(ResinKit, { foreignKey: 'resinSystemId', as: 'kits' });
  ResinKit.belongsTo(ResinSystem, { foreignKey: 'resinSystemId', as: 'resinSystem' });

  Install.belongsTo(Repair, { foreignKey: 'repairId', as: 'repair' });
  Install.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  Install.belongsTo(Crew, { foreignKey: 'crewId', as: 'crew' });
  Install.belongsTo(ResinSystem, { foreignKey: 'resinSystemId', as: 'resinSystem' });
  Install.belongsTo(ResinKit, { foreignKey: 'resinKitId', as: 'resinKit' });
  Install.belongsTo(Packer, { foreignKey: 'packerId', as: 'packer' });
  Install.belongsTo(ChecklistTemplate, { foreignKey: 'checklistTemplateId', as: 'checklistTemplate' });
  Install.belongsTo(User, { foreignKey: 'signedOffById', as: 'signedOffBy' });
  Install.hasMany(InstallEvent, { foreignKey: 'installId', as: 'events' });
  Install.hasMany(Review, { foreignKey: 'installId', as: 'reviews' });
  Install.hasMany(Attachment, { foreignKey: 'installId', as: 'attachments' });
  InstallEvent.belongsTo(Install, { foreignKey: 'installId', as: 'install' });
  InstallEvent.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  InstallEvent.belongsTo(InstallEvent, { foreignKey: 'correctsEventId', as: 'corrects' });
  Review.belongsTo(User, { foreignKey: 'reviewerId', as: 'reviewer' });
  AuditEntry.belongsTo(User, { foreignKey: 'userId', as: 'user' });

  Job.hasMany(Invoice, { foreignKey: 'jobId', as: 'invoices' });
  Invoice.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  Invoice.hasMany(InvoiceLine, { foreignKey: 'invoiceId', as: 'lines' });
  InvoiceLine.belongsTo(Invoice, { foreignKey: 'invoiceId', as: 'invoice' });
  InvoiceLine.belongsTo(Repair, { foreignKey: 'repairId', as: 'repair' });
  Invoice.hasMany(PaymentEvent, { foreignKey: 'invoiceId', as: 'paymentEvents' });
  Attachment.belongsTo(User, { foreignKey: 'uploadedById', as: 'uploadedBy' });
  Attachment.belongsTo(Install, { foreignKey: 'installId', as: 'install' });
  Attachment.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  ReportSend.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
  ReportSend.belongsTo(User, { foreignKey: 'sentById', as: 'sentBy' });
  ReportSend.belongsTo(ReportLink, { foreignKey: 'linkId', as: 'link' });
  ReportLink.belongsTo(Job, { foreignKey: 'jobId', as: 'job' });
}

export {
  sequelize,
  Company,
  User,
  Crew,
  CrewMember,
  Customer,
  Site,
  AccessPoint,
  Segment,
  Job,
  Repair,
  ResinSystem,
  ResinKit,
  Packer,
  ChecklistTemplate,
  Install,
  InstallEvent,
  Attachment,
  Review,
  AuditEntry,
  Invoice,
  InvoiceLine,
  PaymentEvent,
  ReportSend,
  ReportLink,
};
