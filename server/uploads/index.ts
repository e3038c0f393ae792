// What other parts of the server may use from this domain; everything else stays inside it.
export { singleTextUpload, uploadedText, uploadedTextBytes } from './single-upload.middleware.ts';
export { textUploads, uploadedTextsBytes } from './text-uploads.middleware.ts';
export { withinUploadQuota } from './upload-quota.middleware.ts';
export { WORKSPACE_UPLOAD_QUOTA_BYTES } from './upload-quota.service.ts';
