// The app's icons: path data from the Material Design Icons set (@mdi/js, Apache-2.0), drawn by
// MUI's SvgIcon. One package file instead of a package of one file per icon: @mui/icons-material
// unpacked 43,000 files (half of a fresh install's) for the 13 icons used here. A named import
// keeps only the paths used in the built bundle. In development and tests createSvgIcon's name
// gives each icon the data-testid "<name>Icon", as the icons package did.
import {
  mdiAccountCircle,
  mdiChartLine,
  mdiChevronDown,
  mdiClose,
  mdiContentSave,
  mdiDeleteOutline,
  mdiDownload,
  mdiFileUploadOutline,
  mdiPaperclip,
  mdiPencil,
  mdiPlus,
  mdiPrinter,
  mdiSend,
} from '@mdi/js';
import { createSvgIcon } from '@mui/material/utils';

export const AccountCircleIcon = createSvgIcon(<path d={mdiAccountCircle} />, 'AccountCircle');
export const AddIcon = createSvgIcon(<path d={mdiPlus} />, 'Add');
export const AttachFileIcon = createSvgIcon(<path d={mdiPaperclip} />, 'AttachFile');
export const CancelIcon = createSvgIcon(<path d={mdiClose} />, 'Close');
export const DeleteOutlineIcon = createSvgIcon(<path d={mdiDeleteOutline} />, 'DeleteOutlined');
export const DownloadIcon = createSvgIcon(<path d={mdiDownload} />, 'Download');
export const EditIcon = createSvgIcon(<path d={mdiPencil} />, 'Edit');
export const ExpandMoreIcon = createSvgIcon(<path d={mdiChevronDown} />, 'ExpandMore');
export const PrintIcon = createSvgIcon(<path d={mdiPrinter} />, 'Print');
export const SaveIcon = createSvgIcon(<path d={mdiContentSave} />, 'Save');
export const SendIcon = createSvgIcon(<path d={mdiSend} />, 'Send');
export const ShowChartIcon = createSvgIcon(<path d={mdiChartLine} />, 'ShowChart');
export const UploadFileIcon = createSvgIcon(<path d={mdiFileUploadOutline} />, 'UploadFile');
