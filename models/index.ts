import 'server-only';
import { sequelize } from '@/lib/db';
import { Company, initCompany } from './company';
import { User, initUser } from './user';
import { Crew, CrewMember, initCrew } from './crew';
import { Customer, initCustomer } from './customer';
import { AccessPoint, Segment, Site, initSite } from './site';
import { Job, Repair, initJob } from './job';
import { ChecklistTemplate, Packer, ResinKit, ResinSystem, initMaterials } from './materials';
import { Install, InstallEvent, initInstall } from './install';
import { Attachment, AuditEntry, Review, initRecords } from './records';
import { Invoice, InvoiceLine, PaymentEvent, initInvoice } from './invoice';
import { ReportLink, ReportSend, initReportLink, initReportSend } from './report-send';

// Initialise once per process (the module may be evaluated again by dev hot reload).
const initialised = globalThis as unknown as { setlineModelsReady?: boolean };
if (!initialised.setlineModelsReady || !Company.sequelize) {
  for (const init of [initCompany, initUser, initCrew, initCustomer, initSite, initJob, initMaterials, initInstall, initRecords, initInvoice, initReportSend, initReportLink]) {
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
  sequelize, Company, User, Crew, CrewMember, Customer, Site, AccessPoint, Segment, Job, Repair,
  ResinSystem, ResinKit, Packer, ChecklistTemplate, Install, InstallEvent, Attachment, Review, AuditEntry, Invoice, InvoiceLine, PaymentEvent, ReportSend, ReportLink,
};
